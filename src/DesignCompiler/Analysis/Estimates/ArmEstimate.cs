namespace DesignCompiler.Analysis.Estimates;

/// <summary>How far an arm estimate goes.</summary>
public enum EstimateStatus
{
    /// <summary>A mean and an interval.</summary>
    Estimated,

    /// <summary>A mean, but too few plots for an interval (one plot, or one plot in every round it was sown).</summary>
    MeanOnly,

    /// <summary>The arm has no recorded plot; under a proper prior the adjusted estimate is then the prior alone.</summary>
    NoData,

    /// <summary>Under the flat prior the data cannot separate the arm's mean from block or round effects, or from nothing at all.</summary>
    Unidentified,
}

/// <summary>
/// One arm's mean estimate with an interval at the requested level: a t confidence interval for the naive and the
/// round-stratified means, an equal-tailed credible interval for the adjusted model. Null where the status says so.
/// </summary>
public sealed record ArmEstimate(int Arm, int Plots, EstimateStatus Status, double? Mean, double? Lower, double? Upper, double? Df);

/// <summary>The three estimates of one arm side by side.</summary>
public sealed record ArmEstimateComparison(int Arm, ArmEstimate Naive, ArmEstimate RoundStratified, ArmEstimate Adjusted);
