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
        var buffers = new PlanWorkspace.SummaryBuffers(arms);
        var indices = subset.ToArray();
        Compute(values, indices, new MarginalSubset(arms), buffers);
        return new BestArmSummary(buffers.ProbabilityBest, buffers.ExpectedLoss, buffers.ErrorBound, buffers.Leader);
    }

    /// <summary>
    /// The same figures when the arms' values are jointly multivariate t (an adjusted model), by
    /// <see cref="CorrelatedBestArm"/>'s orthant probabilities; its error estimate becomes <see cref="ErrorBound"/>.
    /// </summary>
    public static BestArmSummary OfJoint(Joint joint, IReadOnlyList<IMarginal> values, IReadOnlyList<int> subset)
    {
        var buffers = new PlanWorkspace.SummaryBuffers(values.Count);
        ComputeJoint(joint, values, subset.ToArray(), buffers);
        return new BestArmSummary(buffers.ProbabilityBest, buffers.ExpectedLoss, buffers.ErrorBound, buffers.Leader);
    }

    /// <summary><see cref="OfJoint"/> into reusable buffers.</summary>
    internal static void ComputeJoint(Joint joint, IReadOnlyList<IMarginal> values, ReadOnlySpan<int> subset, PlanWorkspace.SummaryBuffers into)
    {
        var arms = values.Count;
        Array.Clear(into.ProbabilityBest);
        Array.Clear(into.ExpectedLoss);
        into.ErrorBound = 0;
        into.Leader = 0;
        if (subset.Length == 0) return;
        var k = subset.Length;
        var location = new double[k];
        var scale = new double[k, k];
        for (var a = 0; a < k; a++)
        {
            location[a] = joint.Location[subset[a]];
            for (var b = 0; b < k; b++) scale[a, b] = joint.Scale[subset[a], subset[b]];
        }
        var result = CorrelatedBestArm.Compute(location, scale, joint.Df);
        var inSubset = new bool[arms];
        for (var a = 0; a < k; a++)
        {
            inSubset[subset[a]] = true;
            into.ProbabilityBest[subset[a]] = result.Probabilities[a];
            into.ExpectedLoss[subset[a]] = result.ExpectedLoss[a];
        }
        for (var i = 0; i < arms; i++)
            if (!inSubset[i]) into.ExpectedLoss[i] = Math.Max(0, result.ExpectedMaximum - values[i].Mean);
        var leader = subset[0];
        foreach (var i in subset)
            if (into.ProbabilityBest[i] > into.ProbabilityBest[leader]) leader = i;
        into.Leader = leader;
        into.ErrorBound = result.ErrorBound;
    }

    /// <summary>The same into reusable buffers, for the planner's workspace.</summary>
    internal static void Compute(IReadOnlyList<IMarginal> values, ReadOnlySpan<int> subset, MarginalSubset chosen, PlanWorkspace.SummaryBuffers into)
    {
        var arms = values.Count;
        var probability = into.ProbabilityBest;
        var loss = into.ExpectedLoss;
        Array.Clear(probability);
        Array.Clear(loss);
        into.ErrorBound = 0;
        into.Leader = 0;
        if (subset.Length == 0) return;

        chosen.Fill(values, subset);
        Span<double> p = stackalloc double[subset.Length];
        Span<double> l = stackalloc double[subset.Length];
        var error = ProbabilityOfBest.Compute(chosen, p, l, out var expectedMaximum);
        for (var k = 0; k < subset.Length; k++)
        {
            probability[subset[k]] = p[k];
            loss[subset[k]] = l[k];
        }
        for (var i = 0; i < arms; i++)
            if (!subset.Contains(i)) loss[i] = Math.Max(0, expectedMaximum - values[i].Mean);

        var leader = subset[0];
        foreach (var i in subset)
            if (probability[i] > probability[leader]) leader = i;
        into.ErrorBound = error;
        into.Leader = leader;
    }
}
