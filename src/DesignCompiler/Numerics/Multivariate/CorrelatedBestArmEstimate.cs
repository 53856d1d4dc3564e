using System.Globalization;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// <see cref="CorrelatedBestArm"/>'s answer with what it cost: the error estimate of E[max] (and so of every
/// expected loss, since μ_i is known exactly), the most points per shift any arm took, how many arms were
/// screened out as far behind, and whether the probabilities' error bound met the accuracy asked.
/// </summary>
public sealed record CorrelatedBestArmEstimate(
    BestArmResult Result,
    double ExpectedMaximumError,
    long PointsPerShift,
    int ScreenedArms,
    bool ReachedAccuracy)
{
    public override string ToString() => string.Create(
        CultureInfo.InvariantCulture,
        $"{Result}; E[max] error ≤ {ExpectedMaximumError:R}; {PointsPerShift} points per shift; {ScreenedArms} screened");
}
