using DesignCompiler.Planning;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Tests.Simulation;

/// <summary>
/// The spread of simulated success rates under equal allocation, against Hoeffding's
/// inequality (W. Hoeffding 1963, J. Amer. Statist. Assoc. 58:13–30; shared/REFERENCES.md §9):
/// for n plots, P(|x̄ − p| ≥ ε) ≤ 2·exp(−2nε²).
/// </summary>
public sealed class HoeffdingTests
{
    private const string Design = """
        trial "Two equal arms" {
          seed 31337
          rounds 1
          outcome ok: bernoulli
          goal maximize
          policy equal
          default prior beta(1, 1)
          arm A "a"
          arm B "b"
          plots 200 per round
          scenario "even" { every arm 0.5 }
        }
        """;

    [Fact]
    public void Success_rates_of_100_plots_stay_within_the_hoeffding_bound_and_match_the_exact_tail()
    {
        var design = SimulationFixtures.Design(Design);
        var runner = new ReplicationRunner(RoundPlanner.For(design).Planner!);
        var world = new ScenarioWorld(design, design.Scenarios[0]);
        var record = runner.NewRecord();
        const int reps = 3000;
        var samples = 0;
        var beyond = new Dictionary<int, int> { [10] = 0, [15] = 0, [20] = 0 };
        var upper = 0;
        for (var i = 0; i < reps; i++)
        {
            runner.Run(world, design.Seed, i, record);
            for (var arm = 0; arm < 2; arm++)
            {
                Assert.Equal(100, record.Observations[arm]);
                // Successes as a whole number, so |x̄ − ½| ≥ ε is decided without rounding.
                var successes = (int)Math.Round(record.SampleMean[arm] * 100);
                samples++;
                foreach (var k in beyond.Keys.ToList()) if (Math.Abs(successes - 50) >= k) beyond[k]++;
                if (successes >= 60) upper++;
            }
        }

        foreach (var (k, count) in beyond)
        {
            var epsilon = k / 100.0;
            var bound = 2 * Math.Exp(-2 * 100 * epsilon * epsilon);
            Assert.True((double)count / samples <= bound, FormattableString.Invariant($"ε = {epsilon}: {count}/{samples} beyond, bound {bound}"));
        }

        // REFERENCES.md §9, HO02 and HO03: exact P(|X̄ − ½| ≥ 0.1) = 0.0568879336 and P(S ≥ 60) = 0.0284439668
        // for Bernoulli(½), n = 100, well below the bound 2e⁻² = 0.2707; the simulation must meet them within 3 SE.
        AssertNear(0.0568879336409808, beyond[10], samples);
        AssertNear(0.0284439668204904, upper, samples);
    }

    private static void AssertNear(double p, int count, int n)
    {
        var se = Math.Sqrt(p * (1 - p) / n);
        var observed = (double)count / n;
        Assert.True(Math.Abs(observed - p) <= 3 * se, FormattableString.Invariant($"observed {observed}, exact {p}, SE {se}"));
    }
}
