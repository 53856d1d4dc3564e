using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace DesignCompiler.Numerics;

public static partial class SpecialFunctions
{
    /// <summary>
    /// <see cref="Log1pMinusX"/> in eight lanes, for |x| ≤ ½ (the callers' range): every lane is bit for bit
    /// the scalar result, since each runs the same operations on the same branch of the series.
    /// </summary>
    // Kept out of tiered compilation: a simulation spends its first seconds here, and tiering would run that
    // time in unoptimised code and then compile it again; there is nothing for profile guidance to learn.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static Vector512<double> Log1pMinusXLanes(Vector512<double> x)
    {
        var u = x / (Vector512.Create(2.0) + x);
        var v = u * u;
        var shortSeries = Vector512.LessThan(v, Vector512.Create(4e-4));
        var middleSeries = Vector512.AndNot(Vector512.LessThan(v, Vector512.Create(0.0121)), shortSeries);
        var longSeries = ~(shortSeries | middleSeries);
        var series = Vector512<double>.Zero;
        if (shortSeries.ExtractMostSignificantBits() != 0)
        {
            var s = C(1.0 / 3) + v * (C(1.0 / 5) + v * (C(1.0 / 7) + v * (C(1.0 / 9) + v * (C(1.0 / 11) + v * C(1.0 / 13)))));
            series = Vector512.ConditionalSelect(shortSeries, s, series);
        }
        if (middleSeries.ExtractMostSignificantBits() != 0)
        {
            var s = C(1.0 / 3) + v * (C(1.0 / 5) + v * (C(1.0 / 7) + v * (C(1.0 / 9) + v * (C(1.0 / 11) + v * (C(1.0 / 13)
                + v * (C(1.0 / 15) + v * (C(1.0 / 17) + v * (C(1.0 / 19) + v * (C(1.0 / 21) + v * C(1.0 / 23))))))))));
            series = Vector512.ConditionalSelect(middleSeries, s, series);
        }
        if (longSeries.ExtractMostSignificantBits() != 0)
        {
            var s = Vector512<double>.Zero;
            for (int k = 43; k >= 3; k -= 2) s = s * v + C(1.0 / k);
            series = Vector512.ConditionalSelect(longSeries, s, series);
        }
        return -x * u + C(2.0) * u * v * series;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> C(double value) => Vector512.Create(value);
}
