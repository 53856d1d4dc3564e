using DesignCompiler.Analysis.Adjusted;
using DesignCompiler.Numerics;

namespace DesignCompiler.Analysis.Estimates;

/// <summary>Every arm estimated three ways from the records of an adaptive trial: naive, round-stratified and adjusted model.</summary>
public static class ArmEstimates
{
    /// <param name="fit">the adjusted model fitted to the same records.</param>
    /// <param name="roundWeights">the design's weight for every round (see <see cref="RoundStratifiedMean"/>).</param>
    public static IReadOnlyList<ArmEstimateComparison> Compare(IReadOnlyList<PlotRecord> records, AdjustedModelFit fit,
        IReadOnlyDictionary<int, double> roundWeights, double level = 0.95)
    {
        ArgumentNullException.ThrowIfNull(records);
        ArgumentNullException.ThrowIfNull(fit);
        return Enumerable.Range(0, fit.ArmCount)
            .Select(arm => new ArmEstimateComparison(arm,
                NaiveMean.Estimate(records, arm, level),
                RoundStratifiedMean.Estimate(records, arm, roundWeights, level),
                Adjusted(fit, arm, level)))
            .ToArray();
    }

    /// <summary>The adjusted model's posterior mean of the arm and its equal-tailed credible interval.</summary>
    public static ArmEstimate Adjusted(AdjustedModelFit fit, int arm, double level = 0.95)
    {
        ArgumentNullException.ThrowIfNull(fit);
        Level.Check(level);
        int plots = fit.Plots(arm);
        if (fit.ArmMarginal(arm) is not { } marginal)
            return new ArmEstimate(arm, plots, EstimateStatus.Unidentified, null, null, null, null);
        var interval = CredibleInterval.EqualTailed(marginal, level);
        var status = plots == 0 ? EstimateStatus.NoData : EstimateStatus.Estimated;
        return new ArmEstimate(arm, plots, status, marginal.Location, interval.Lower, interval.Upper, marginal.Df);
    }
}
