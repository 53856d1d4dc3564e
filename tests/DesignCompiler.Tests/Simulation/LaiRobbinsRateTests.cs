using Xunit.Abstractions;

namespace DesignCompiler.Tests.Simulation;

/// <summary>
/// Thompson allocation simulated end to end through <c>simulate</c>'s runner (the real planner, in
/// batches of 10 plots) grows its regret at the Lai–Robbins rate once rounding is randomized.
/// </summary>
public sealed class LaiRobbinsRateTests(ITestOutputHelper output)
{
    // Lai and Robbins (1985): regret ≥ (C + o(1)) ln n, C = Σ Δ / KL(μ, μ*); for (0.9, 0.8), C = 2.2521
    // (shared/REFERENCES.md LR03, computed with mpmath).
    private const double LaiRobbins = 2.25209969852452904904305551715;

    private static string Design(int rounds, string rounding) => $$"""
        trial "two mixes" {
          seed 29
          rounds {{rounds}}
          outcome y: bernoulli
          policy thompson
          rounding {{rounding}}
          default prior beta(1, 1)
          arm A "better"
          arm B "worse"
          plots 10 per round
          scenario "gap" { A 0.9 B 0.8 }
        }
        """;

    [Fact]
    public void Randomized_rounding_regret_grows_like_log_n_near_the_constant()
    {
        // The slope of mean regret against ln n between n = 100 and n = 1,000 plots must lie in
        // [0.5 C, 2 C]: a policy that locks out an arm shows a slope near 0 at first and linear growth
        // later; one that explores too much shows a slope far above C. Batches of 10 plots delay the
        // feedback, which adds a constant, not a slope.
        var short_ = SimulationFixtures.Simulate(SimulationFixtures.Design(Design(10, "randomized")), reps: 400).Scenarios.Single().Regret;
        var long_ = SimulationFixtures.Simulate(SimulationFixtures.Design(Design(100, "randomized")), reps: 400).Scenarios.Single().Regret;
        var slope = (long_.Mean - short_.Mean) / Math.Log(10);
        var slopeError = Math.Sqrt(short_.StandardError * short_.StandardError + long_.StandardError * long_.StandardError) / Math.Log(10);
        output.WriteLine($"regret n=100 {short_.Mean}±{short_.StandardError}, n=1000 {long_.Mean}±{long_.StandardError}, slope {slope}±{slopeError}, C {LaiRobbins}");
        Assert.InRange(slope, 0.5 * LaiRobbins, 2 * LaiRobbins);
    }

    [Fact]
    public void Randomized_rounding_keeps_every_arm_in_play_where_largest_remainder_shuts_one_out()
    {
        // Largest remainder gives an arm no plot once 10·P(best) < 0.5, and with no plot its posterior
        // never moves again: some trials lock on to the worse arm for good. Randomized rounding gives
        // it a plot with probability 10·P(best), so it keeps being checked (common practice: a
        // consistent policy must sample every arm infinitely often, Lai and Robbins 1985).
        var fixedRounding = SimulationFixtures.Simulate(SimulationFixtures.Design(Design(100, "largest-remainder")), reps: 400).Scenarios.Single();
        var randomized = SimulationFixtures.Simulate(SimulationFixtures.Design(Design(100, "randomized")), reps: 400).Scenarios.Single();
        output.WriteLine($"correct selection: largest remainder {fixedRounding.CorrectSelection.Mean}, randomized {randomized.CorrectSelection.Mean}");
        Assert.True(randomized.CorrectSelection.Mean >= fixedRounding.CorrectSelection.Mean,
            $"randomized {randomized.CorrectSelection.Mean} vs largest remainder {fixedRounding.CorrectSelection.Mean}");
        Assert.True(randomized.CorrectSelection.Mean > 0.995, $"randomized rounding picked the better arm in {randomized.CorrectSelection.Mean:P1}");
    }
}
