namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// One step of the separation of variables: the mass of a standard normal between two limits, and the point
/// with a given share u of that mass below it. Both are formed from the tail on the side away from the
/// centre, so an interval far out keeps its relative accuracy (it often is far out for an arm far behind).
/// </summary>
internal static partial class TruncatedNormal
{
    /// <summary>P(lower &lt; Z &lt; upper) and the z in [lower, upper] with P(lower &lt; Z &lt; z) = u · that.</summary>
    public static double Sample(double lower, double upper, double u, out double z)
    {
        double mass;
        if (lower >= 0)
        {
            double above = NormalTail.Upper(lower), beyond = NormalTail.Upper(upper);
            mass = above - beyond;
            z = NormalTail.UpperQuantile(above - u * mass);
        }
        else if (upper <= 0)
        {
            double below = NormalTail.Upper(-upper), beyond = NormalTail.Upper(-lower);
            mass = below - beyond;
            z = -NormalTail.UpperQuantile(beyond + u * mass);
        }
        else
        {
            double belowLower = NormalTail.Upper(-lower), aboveUpper = NormalTail.Upper(upper);
            mass = 1.0 - belowLower - aboveUpper;
            double share = belowLower + u * mass;
            z = share <= 0.5
                ? -NormalTail.UpperQuantile(share)
                : NormalTail.UpperQuantile(aboveUpper + (1.0 - u) * mass);
        }
        z = Math.Clamp(z, lower, upper);
        return mass;
    }

    /// <summary>E[Z | lower &lt; Z &lt; upper], for ordering variables; a limit when the mass underflows.</summary>
    public static double Mean(double lower, double upper)
    {
        double mass = NormalTail.Between(lower, upper);
        if (mass > 0) return (StandardNormal.Pdf(lower) - StandardNormal.Pdf(upper)) / mass;
        if (double.IsFinite(lower)) return lower;
        return double.IsFinite(upper) ? upper : 0.0;
    }
}
