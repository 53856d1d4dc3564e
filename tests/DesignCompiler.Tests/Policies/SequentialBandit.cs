using DesignCompiler.Binding;
using DesignCompiler.Numerics;
using DesignCompiler.Planning;
using DesignCompiler.Planning.Policies;
using DesignCompiler.Randomness;

namespace DesignCompiler.Tests.Policies;

/// <summary>
/// A fully sequential bernoulli bandit (batch size 1) driven by the product's policy classes,
/// for checks against published regret results. Index policies give one plot to one arm. For
/// Thompson the round's share vector is P(best); drawing the one plot from it is exactly
/// Thompson sampling in distribution (the arm whose posterior draw is highest is arm i with
/// probability P(arm i best)), so the check covers the same probabilities the sheets use.
/// </summary>
internal static class SequentialBandit
{
    /// <summary>Mean pseudo-regret Σ_t (μ* − μ_arm(t)) at each checkpoint, averaged over runs.</summary>
    public static double[] MeanRegret(CheckedDesign design, IAllocationPolicy policy, double[] means, int[] checkpoints, int runs, ulong seed, bool sampleFromShares)
    {
        var arms = means.Length;
        var best = means.Max();
        var horizon = checkpoints[^1];
        var sums = new double[checkpoints.Length];
        var available = Enumerable.Repeat(true, arms).ToArray();
        var shares = new double[arms];
        var probability = new double[arms];
        var loss = new double[arms];
        var marginals = new IMarginal[arms];

        for (var run = 0; run < runs; run++)
        {
            var rng = new Xoshiro256StarStar(StreamSeed.Derive(seed, (ulong)run));
            var stats = new ArmStatistics[arms];
            double regret = 0;
            var next = 0;
            for (var t = 1; t <= horizon; t++)
            {
                if (sampleFromShares)
                {
                    for (var i = 0; i < arms; i++)
                        marginals[i] = new BetaMarginal(1 + stats[i].Sum, 1 + stats[i].Count - stats[i].Sum);
                    ProbabilityOfBest.Compute(marginals, probability, loss);
                }
                policy.TargetShares(new PolicyContext(design, t, 1, available, marginals, probability, stats), shares);
                var arm = sampleFromShares ? Draw(shares, ref rng) : Array.IndexOf(shares, shares.Max());
                var reward = rng.NextBernoulli(means[arm]) ? 1.0 : 0.0;
                stats[arm] = stats[arm].Add(reward);
                regret += best - means[arm];
                if (t == checkpoints[next]) sums[next++] += regret;
            }
        }
        return sums.Select(s => s / runs).ToArray();
    }

    private static int Draw(double[] shares, ref Xoshiro256StarStar rng)
    {
        var u = rng.NextDouble() * shares.Sum();
        for (var i = 0; i < shares.Length - 1; i++)
        {
            u -= shares[i];
            if (u < 0) return i;
        }
        return shares.Length - 1;
    }
}
