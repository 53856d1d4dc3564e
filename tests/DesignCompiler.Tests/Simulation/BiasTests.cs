namespace DesignCompiler.Tests.Simulation;

/// <summary>The bias of the naive final mean, on the scale of the arm's true mean θ.</summary>
public sealed class BiasTests
{
    private const string Trays = """
        trial "Trays of 50 seeds" {
          seed 5150
          rounds 2
          outcome emerged "seedlings per tray": binomial of 50
          goal maximize
          policy equal
          default prior beta(8, 2)
          arm LA "lot a"
          arm LB "lot b"
          plots 8 per round
          scenario "apart" { LA 0.80 LB 0.88 }
        }
        """;

    [Fact]
    public void With_a_fixed_allocation_the_naive_mean_is_unbiased_for_the_success_probability()
    {
        // Common practice: the mean of a fixed number of independent draws is unbiased. For a
        // binomial outcome the naive estimate of θ is successes per seed (plot mean / 50).
        var report = SimulationFixtures.Simulate(SimulationFixtures.Design(Trays), reps: 400);
        foreach (var arm in report.Scenarios[0].Arms)
        {
            Assert.Equal(400, arm.Bias.Count);
            Assert.True(Math.Abs(arm.Bias.Mean) <= 3 * arm.Bias.StandardError,
                FormattableString.Invariant($"{arm.Code}: bias {arm.Bias.Mean} ± {arm.Bias.StandardError}"));
            // 8 trays of 50 seeds: the sd of one trial's rate is √(θ(1 − θ)/400) ≈ 0.02, so over 400 trials the SE is ≈ 0.001.
            Assert.InRange(arm.Bias.StandardError, 0.0005, 0.002);
        }
    }
}
