using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// <see cref="Sample"/> and <see cref="NormalTail.Between"/> for eight points at once. Each lane takes the
/// branch the scalar code would take for its limits, with the same operations in the same order, so its
/// mass and point are the scalar ones bit for bit. Lanes whose limits are empty or reversed compute
/// something meaningless; the caller drops them, as the scalar code stops at them.
/// </summary>
internal static partial class TruncatedNormal
{
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector512<double> SampleLanes(Vector512<double> lower, Vector512<double> upper, Vector512<double> u, out Vector512<double> z)
    {
        var one = Vector512.Create(1.0);
        var right = Vector512.GreaterThanOrEqual(lower, Vector512<double>.Zero);             // lower >= 0
        var left = ~right & Vector512.LessThanOrEqual(upper, Vector512<double>.Zero);       // upper <= 0
        var straddle = ~right & ~left;
        // The two tails each branch forms, both at arguments >= 0.
        var first = NormalTail.UpperLanes(Vector512.ConditionalSelect(right, lower, Vector512.ConditionalSelect(left, -upper, -lower)));
        var second = NormalTail.UpperLanes(Vector512.ConditionalSelect(left, -lower, upper));
        var mass = Vector512.ConditionalSelect(straddle, one - first - second, first - second);

        var share = first + u * mass;                                                        // straddling: below the point
        var low = Vector512.LessThanOrEqual(share, Vector512.Create(0.5));
        var argument = Vector512.ConditionalSelect(right, first - u * mass,
            Vector512.ConditionalSelect(left, second + u * mass,
                Vector512.ConditionalSelect(low, share, second + (one - u) * mass)));
        var quantile = NormalTail.UpperQuantileLanes(argument);
        var negative = left | (straddle & low);
        var point = Vector512.ConditionalSelect(negative, -quantile, quantile);
        // Math.Clamp(point, lower, upper) for lower < upper: below lower is lower, above upper is upper, NaN stays.
        z = Vector512.ConditionalSelect(Vector512.LessThan(point, lower), lower,
            Vector512.ConditionalSelect(Vector512.GreaterThan(point, upper), upper, point));
        return mass;
    }

    /// <summary>
    /// <see cref="NormalTail.Between"/> for lanes with lower &lt; upper, and φ at both limits, which the tails
    /// compute on the way (φ is even bit for bit: it depends on z only through z², and z · z = (−z) · (−z)).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector512<double> BetweenLanes(Vector512<double> lower, Vector512<double> upper,
        out Vector512<double> densityLower, out Vector512<double> densityUpper)
    {
        var right = Vector512.GreaterThanOrEqual(lower, Vector512<double>.Zero);
        var left = ~right & Vector512.LessThanOrEqual(upper, Vector512<double>.Zero);
        var straddle = ~right & ~left;
        // lower >= 0: Upper(lower) − Upper(upper); upper <= 0: Upper(−upper) − Upper(−lower);
        // otherwise 1 − Upper(upper) − Upper(−lower).
        var first = NormalTail.UpperLanes(Vector512.ConditionalSelect(right, lower, Vector512.ConditionalSelect(left, -upper, upper)), out var firstDensity);
        var second = NormalTail.UpperLanes(Vector512.ConditionalSelect(right, upper, -lower), out var secondDensity);
        // The first tail is at the lower limit only when lower >= 0; otherwise at ±upper.
        densityLower = Vector512.ConditionalSelect(right, firstDensity, secondDensity);
        densityUpper = Vector512.ConditionalSelect(right, secondDensity, firstDensity);
        return Vector512.ConditionalSelect(straddle, Vector512.Create(1.0) - first - second, first - second);
    }
}
