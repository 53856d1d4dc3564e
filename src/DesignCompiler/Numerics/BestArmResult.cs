using System.Collections.Immutable;
using System.Globalization;

namespace DesignCompiler.Numerics;

/// <summary>
/// P(arm i has the largest value) for every arm, the expected loss E[max] − E[arm i] of choosing it,
/// E[max] itself, and an estimate of the absolute error in each probability.
/// </summary>
public sealed record BestArmResult(
    ImmutableArray<double> Probabilities,
    ImmutableArray<double> ExpectedLoss,
    double ExpectedMaximum,
    double ErrorBound)
{
    public override string ToString() => string.Create(
        CultureInfo.InvariantCulture,
        $"P(best) = [{string.Join(", ", Probabilities.Select(p => p.ToString("R", CultureInfo.InvariantCulture)))}], E[max] = {ExpectedMaximum:R}, error ≤ {ErrorBound:R}");
}
