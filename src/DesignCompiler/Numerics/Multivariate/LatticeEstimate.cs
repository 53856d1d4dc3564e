using System.Globalization;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// A probability from the randomised lattice rule with the error it reached (three standard errors over the
/// shifts; 0 when the answer is exact), the points per shift it took, and whether the error met the accuracy asked.
/// </summary>
public sealed record LatticeEstimate(double Value, double Error, long PointsPerShift, bool ReachedAccuracy)
{
    public override string ToString() => string.Create(
        CultureInfo.InvariantCulture, $"{Value:R} ± {Error:R} ({PointsPerShift} points per shift)");
}
