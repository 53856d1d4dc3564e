using DesignCompiler.Numerics;
using DesignCompiler.Planning;
using DesignCompiler.Planning.Policies;
using DesignCompiler.Randomness;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Policies;

/// <summary>The batched top-two shares against a Monte Carlo run of Russo's (2016) sequential rule.</summary>
public sealed class TopTwoThompsonTests
{
    [Fact]
    public void Shares_match_the_selection_frequencies_of_the_sequential_rule()
    {
        // Russo (2016), top-two Thompson sampling: draw θ from the posterior; with probability β play
        // the leader, otherwise redraw until another arm leads and play that one.
        var design = TestDesigns.FromText("""
            trial "t" {
              seed 1
              rounds 2
              outcome y: bernoulli
              policy top-two thompson beta 0.5
              arm A "a" prior beta(8, 12)
              arm B "b" prior beta(10, 10)
              arm C "c" prior beta(12, 8)
              plots 30 per round
            }
            """);
        IMarginal[] arms = [new BetaMarginal(8, 12), new BetaMarginal(10, 10), new BetaMarginal(12, 8)];
        var best = ProbabilityOfBest.Compute(arms).Probabilities.ToArray();
        var shares = new double[3];
        new TopTwoThompsonPolicy(0.5).TargetShares(
            new PolicyContext(design, 1, 30, [true, true, true], arms, best, new ArmStatistics[3]), shares);
        Assert.Equal(1.0, shares.Sum(), 12);

        var rng = new Xoshiro256StarStar(20261201);
        var counts = new int[3];
        const int draws = 200_000;
        for (var k = 0; k < draws; k++)
        {
            var leader = Leader(arms, ref rng);
            if (rng.NextDouble() < 0.5) { counts[leader]++; continue; }
            int challenger;
            do challenger = Leader(arms, ref rng); while (challenger == leader);
            counts[challenger]++;
        }
        for (var i = 0; i < 3; i++)
        {
            var frequency = (double)counts[i] / draws;
            var se = Math.Sqrt(shares[i] * (1 - shares[i]) / draws);
            Assert.InRange(frequency, shares[i] - 4 * se, shares[i] + 4 * se);
        }
    }

    [Fact]
    public void With_beta_one_it_is_plain_thompson()
    {
        double[] best = [0.1, 0.3, 0.6];
        var shares = new double[3];
        new TopTwoThompsonPolicy(1.0).TargetShares(Context(best), shares);
        Assert.Equal(best, shares);
    }

    [Fact]
    public void A_certain_leader_still_leaves_one_minus_beta_to_the_others()
    {
        // When P(best) is 1 for one arm the redraw can never pick another; its limit is taken as uniform.
        double[] best = [0, 1, 0];
        var shares = new double[3];
        new TopTwoThompsonPolicy(0.5).TargetShares(Context(best), shares);
        Assert.Equal([0.25, 0.5, 0.25], shares);
    }

    private static PolicyContext Context(double[] best)
    {
        var design = TestDesigns.Example("cover-crops.trial");
        IMarginal[] arms = [new BetaMarginal(1, 1), new BetaMarginal(1, 1), new BetaMarginal(1, 1)];
        return new PolicyContext(design, 1, 10, [true, true, true], arms, best, new ArmStatistics[3]);
    }

    private static int Leader(IMarginal[] arms, ref Xoshiro256StarStar rng)
    {
        var leader = 0;
        var top = double.NegativeInfinity;
        for (var i = 0; i < arms.Length; i++)
        {
            var beta = (BetaMarginal)arms[i];
            var draw = Samplers.Beta(ref rng, beta.A, beta.B);
            if (draw > top) { top = draw; leader = i; }
        }
        return leader;
    }
}
