using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Tests.Simulation;

/// <summary>Robustness scenarios: lost plots, season and block shifts and over-dispersed counts act as written.</summary>
public sealed class FieldEffectsSimulationTests
{
    private static (ReplicationRunner Runner, ScenarioWorld World, ReplicationRecord Record) Runner(string text)
    {
        var design = SimulationFixtures.Design(text);
        var runner = new ReplicationRunner(RoundPlanner.For(design).Planner!);
        return (runner, new ScenarioWorld(design, design.Scenarios[0]), runner.NewRecord());
    }

    [Fact]
    public void Lost_plots_are_sown_but_give_no_result_at_the_stated_rate()
    {
        var (runner, world, record) = Runner("""
            trial "lost plots" {
              seed 5
              rounds 4
              outcome y: bernoulli
              policy equal
              default prior beta(1, 1)
              arm A "a"
              arm B "b"
              plots 20 per round
              scenario "hail" { every arm 0.5 missing 10% missing B 40% }
            }
            """);
        long sownA = 0, sownB = 0, seenA = 0, seenB = 0;
        for (var rep = 0; rep < 500; rep++)
        {
            runner.Run(world, 5, rep, record);
            for (var r = 0; r < 4; r++) { sownA += record.Plots[0, r]; sownB += record.Plots[1, r]; }
            seenA += record.Observations[0];
            seenB += record.Observations[1];
        }
        // Each plot is lost independently: the lost share is binomial, its standard error sqrt(p(1-p)/n) (common practice).
        var lostA = 1 - (double)seenA / sownA;
        var lostB = 1 - (double)seenB / sownB;
        Assert.InRange(lostA, 0.10 - 4 * Math.Sqrt(0.09 / sownA), 0.10 + 4 * Math.Sqrt(0.09 / sownA));
        Assert.InRange(lostB, 0.40 - 4 * Math.Sqrt(0.24 / sownB), 0.40 + 4 * Math.Sqrt(0.24 / sownB));
    }

    [Fact]
    public void Season_and_block_shifts_have_the_stated_spread()
    {
        var design = SimulationFixtures.Design("""
            trial "wet years" {
              seed 6
              rounds 3
              outcome yield "t/ha": normal noise sd 0.5
              default prior normal(mean 5, sd 1)
              arm A "a"
              arm B "b"
              block north plots 4
              block south plots 4
              scenario "drift" { every arm 5 season sd 0.8 block sd 0.3 interaction sd 0.2 }
            }
            """);
        var shifts = new FieldShifts(design);
        var effects = design.Scenarios[0].Effects;
        double sumBlock = 0, sumBlock2 = 0, sumRound = 0, sumRound2 = 0;
        const int trials = 4000;
        for (var rep = 0; rep < trials; rep++)
        {
            shifts.BeginTrial(effects, 6, rep, 99);
            shifts.BeginRound();
            // Arm A in block 0 minus arm A in block 1 is the difference of two block shifts: variance 2·0.3².
            var blockDifference = shifts.Theta(0, 0, 5) - shifts.Theta(0, 1, 5);
            // Arm A in block 0: season + interaction + block, variance 0.8² + 0.2² + 0.3².
            var total = shifts.Theta(0, 0, 5) - 5;
            sumBlock += blockDifference; sumBlock2 += blockDifference * blockDifference;
            sumRound += total; sumRound2 += total * total;
        }
        // Sample variances of normal draws have relative standard error sqrt(2/(n-1)) (common practice); 5 of them.
        var tolerance = 5 * Math.Sqrt(2.0 / (trials - 1));
        var blockVariance = sumBlock2 / trials - Math.Pow(sumBlock / trials, 2);
        var totalVariance = sumRound2 / trials - Math.Pow(sumRound / trials, 2);
        Assert.InRange(blockVariance / (2 * 0.09), 1 - tolerance, 1 + tolerance);
        Assert.InRange(totalVariance / (0.64 + 0.04 + 0.09), 1 - tolerance, 1 + tolerance);
    }

    [Fact]
    public void Shifted_probabilities_stay_probabilities_and_counts_stay_positive()
    {
        var bernoulli = SimulationFixtures.Design("""
            trial "logit" {
              seed 7
              rounds 2
              outcome y: bernoulli
              default prior beta(1, 1)
              arm A "a"
              arm B "b"
              plots 4 per round
              scenario "edge" { A 0.999 B 0.001 season sd 3 }
            }
            """);
        var shifts = new FieldShifts(bernoulli);
        for (var rep = 0; rep < 200; rep++)
        {
            shifts.BeginTrial(bernoulli.Scenarios[0].Effects, 7, rep, 1);
            shifts.BeginRound();
            Assert.InRange(shifts.Theta(0, 0, 0.999), 0.0, 1.0);
            Assert.InRange(shifts.Theta(1, 0, 0.001), 0.0, 1.0);
            Assert.Equal(0.0, shifts.Theta(1, 0, 0.0));
        }
    }

    [Fact]
    public void Gamma_mixed_counts_have_negative_binomial_variance()
    {
        // A Poisson mean mixed by Gamma(k, rate k) gives a negative binomial with mean μ and variance
        // μ + μ²/k (common textbook result, e.g. Hilbe, Negative Binomial Regression, 2011; from memory).
        var (runner, world, record) = Runner("""
            trial "clumped aphids" {
              seed 8
              rounds 1
              outcome aphids: count
              goal minimize
              policy equal
              default prior gamma(shape 2, rate 0.2)
              arm A "a"
              arm B "b"
              plots 200 per round
              scenario "clumped" { every arm 10 dispersion 2 }
            }
            """);
        double sum = 0, sum2 = 0;
        long n = 0;
        var design = runner.Design;
        for (var rep = 0; rep < 40; rep++)
        {
            runner.Run(world, 8, rep, record);
            // The mixed counts keep the scenario's mean: check it on what the runner recorded.
            n += record.Observations[0];
            sum += record.SampleMean[0] * record.Observations[0];
        }
        var mean = sum / n;
        Assert.InRange(mean, 10 - 4 * Math.Sqrt(60.0 / n), 10 + 4 * Math.Sqrt(60.0 / n));

        // Variance from the mixing draw itself, on a stream of its own.
        var shifts = new FieldShifts(design);
        shifts.BeginTrial(design.Scenarios[0].Effects, 8, 0, 3);
        var rng = new DesignCompiler.Randomness.Xoshiro256StarStar(12345);
        for (var i = 0; i < 40_000; i++)
        {
            var y = DesignCompiler.Randomness.Samplers.Poisson(ref rng, shifts.MixCount(0, 10, ref rng));
            sum2 += (y - 10.0) * (y - 10.0);
        }
        var variance = sum2 / 40_000;
        // μ + μ²/k = 10 + 100/2 = 60; the sample variance's standard error is about sqrt(m4 - σ⁴)/sqrt(n) ≈ 1.7 here.
        Assert.InRange(variance, 60 - 8, 60 + 8);
    }
}
