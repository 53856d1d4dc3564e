using DesignCompiler.Numerics;
using DesignCompiler.Numerics.Multivariate;
using DesignCompiler.Syntax;

namespace DesignCompiler.Planning;

/// <summary>
/// Probability of being best and expected loss for every arm, computed among a subset of
/// the arms (those still in the trial, or those that may be sown this round). Arms outside
/// the subset have probability 0; their expected loss is still measured against the best of
/// the subset, so a dropped arm's line on a sheet still says how far behind it is.
/// </summary>
public sealed class BestArmSummary
{
    private BestArmSummary(double[] probabilityBest, double[] expectedLoss, double errorBound, int leader)
    {
        ProbabilityBest = probabilityBest;
        ExpectedLoss = expectedLoss;
        ErrorBound = errorBound;
        Leader = leader;
    }

    public double[] ProbabilityBest { get; }
    public double[] ExpectedLoss { get; }
    public double ErrorBound { get; }

    /// <summary>The arm most likely to be best (the lowest index among exact ties).</summary>
    public int Leader { get; }

    public double Metric(CriterionMetric metric, int arm) =>
        metric == CriterionMetric.Best ? ProbabilityBest[arm] : ExpectedLoss[arm];

    public static BestArmSummary Of(IReadOnlyList<IMarginal> values, IReadOnlyList<int> subset)
    {
        var arms = values.Count;
        var probability = new double[arms];
        var loss = new double[arms];
        if (subset.Count == 0) return new BestArmSummary(probability, loss, 0, 0);

        var chosen = subset.Select(i => values[i]).ToList();
        return From(ProbabilityOfBest.Compute(chosen), values, subset);
    }

    /// <summary>
    /// The same figures when the arms' values are jointly multivariate t (an adjusted model), by
    /// <see cref="CorrelatedBestArm"/>'s orthant probabilities; its error estimate becomes <see cref="ErrorBound"/>.
    /// </summary>
    public static BestArmSummary OfJoint(Joint joint, IReadOnlyList<IMarginal> values, IReadOnlyList<int> subset)
    {
        if (subset.Count == 0) return new BestArmSummary(new double[values.Count], new double[values.Count], 0, 0);
        var k = subset.Count;
        var location = new double[k];
        var scale = new double[k, k];
        for (var a = 0; a < k; a++)
        {
            location[a] = joint.Location[subset[a]];
            for (var b = 0; b < k; b++) scale[a, b] = joint.Scale[subset[a], subset[b]];
        }
        return From(CorrelatedBestArm.Compute(location, scale, joint.Df), values, subset);
    }

    private static BestArmSummary From(BestArmResult result, IReadOnlyList<IMarginal> values, IReadOnlyList<int> subset)
    {
        var arms = values.Count;
        var probability = new double[arms];
        var loss = new double[arms];
        for (var k = 0; k < subset.Count; k++)
        {
            probability[subset[k]] = result.Probabilities[k];
            loss[subset[k]] = result.ExpectedLoss[k];
        }
        for (var i = 0; i < arms; i++)
            if (!subset.Contains(i)) loss[i] = Math.Max(0, result.ExpectedMaximum - values[i].Mean);

        var leader = subset[0];
        foreach (var i in subset)
            if (probability[i] > probability[leader]) leader = i;
        return new BestArmSummary(probability, loss, result.ErrorBound, leader);
    }
}
