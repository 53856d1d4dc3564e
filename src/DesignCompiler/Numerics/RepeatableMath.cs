using System.Runtime.CompilerServices;
namespace DesignCompiler.Numerics;

/// <summary>
/// e^x and ln x from plain arithmetic and fused multiply-adds, with eight-lane forms
/// (<c>RepeatableMath.Lanes.cs</c>) that give every lane the scalar result bit for bit.
/// </summary>
/// <remarks>
/// <para>
/// The P(best) quadrature evaluates a beta density at every node; its prefactor needs a logarithm and an
/// exponential there, and the runtime's <see cref="Math.Log(double)"/> and <see cref="Math.Exp"/> have no
/// vector form with the same bits. These do, on any machine: a fused multiply-add rounds once whether the
/// hardware or a software fallback does it, so results never depend on the instruction set.
/// </para>
/// <para>
/// Methods (the textbook ones; Muller, <i>Elementary Functions</i>, 3rd ed. 2016, ch. 11; Tang 1989 and
/// 1990 for the reductions): e^x = 2^k e^r with k = round(x/ln 2) and r = x − k ln 2 (ln 2 in two parts),
/// |r| ≤ ½ ln 2, e^r by its Taylor polynomial to degree 13 (truncation below 5e-18 relative);
/// ln x = k ln 2 + ln(1+f) with 1+f in [√½, √2) and ln(1+f) = f − s(f − T), s = f/(2+f),
/// T = Σ_{k=1..11} 2s^(2k)/(2k+1), the atanh series (truncation below 1e-18 relative). Both are within about
/// one unit in the last place of the correctly rounded value (tested against the runtime's functions and
/// 30-digit mpmath values).
/// </para>
/// </remarks>
internal static partial class RepeatableMath
{
    private const double InverseLn2 = 1.4426950408889634;
    private const double Ln2 = 0.6931471805599453;
    private const double Ln2Low = 2.3190468138462996e-17;        // ln 2 − Ln2, for the exponential's reduction
    private const double Ln2Upper = 0.6931471803691238;          // 32 significant bits: k·Ln2Upper is exact
    private const double Ln2UpperLow = 1.9082149292705877e-10;   // ln 2 − Ln2Upper
    private const double RoundingShifter = 6755399441055744.0;   // 1.5·2^52: adding it rounds to an integer
    private const double OverflowAbove = 709.782712893384;       // ln(largest double)
    private const double UnderflowBelow = -745.1332191019412;    // ln(2^−1075): below it e^x rounds to 0
    private const double SmallestNormal = 2.2250738585072014e-308;
    private const double TwoTo54 = 18014398509481984.0;
    private const long SqrtHalfBits = 0x3FE6A09E667F3BCD;        // √½, where the mantissa range starts
    private const long ExponentBias = 1023;

    // e^r's Taylor coefficients 1/n! for n = 13 … 0, highest first.
    private static readonly double[] ExpCoefficients =
    [
        1.6059043836821613e-10, 2.08767569878681e-09, 2.505210838544172e-08, 2.755731922398589e-07,
        2.7557319223985893e-06, 2.48015873015873e-05, 0.0001984126984126984, 0.001388888888888889,
        0.008333333333333333, 0.041666666666666664, 0.16666666666666666, 0.5, 1.0, 1.0,
    ];

    // The atanh series' 2/(2k+1) for k = 11 … 1, highest first.
    private static readonly double[] LogCoefficients =
    [
        0.08695652173913043, 0.09523809523809523, 0.10526315789473684, 0.11764705882352941,
        0.13333333333333333, 0.15384615384615385, 0.18181818181818182, 0.2222222222222222,
        0.2857142857142857, 0.4, 0.6666666666666666,
    ];

    /// <summary>e^x.</summary>
    internal static double Exp(double x)
    {
        if (double.IsNaN(x)) return x;
        if (x > OverflowAbove) return double.PositiveInfinity;
        if (x < UnderflowBelow) return 0.0;
        double shifted = Math.FusedMultiplyAdd(x, InverseLn2, RoundingShifter);
        long k = BitConverter.DoubleToInt64Bits(shifted) - BitConverter.DoubleToInt64Bits(RoundingShifter);
        double kd = shifted - RoundingShifter;
        double r = Math.FusedMultiplyAdd(-kd, Ln2Low, Math.FusedMultiplyAdd(-kd, Ln2, x));
        double p = Horner(ExpCoefficients, r);
        // 2^k in two factors, each a normal double for every k that reaches here (−1075 … 1024).
        long half = k >> 1;
        return p * PowerOfTwo(half) * PowerOfTwo(k - half);
    }

    /// <summary>
    /// x^n for n ≥ 0 by binary powering (square and multiply, from the low bit up): the same on every machine,
    /// where a library pow need not be. As a product of n factors it is within (n−1)·2⁻⁵³ relative (squaring
    /// doubles a relative error), 1e-15 for the tens of identical arms a trial has, 1.1e-13 at a thousand.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double Power(double x, int n)
    {
        double result = 1.0;
        while (true)
        {
            if ((n & 1) != 0) result *= x;
            n >>= 1;
            if (n == 0) return result;
            x *= x;
        }
    }

    /// <summary>ln x.</summary>
    internal static double Log(double x)
    {
        if (!(x > 0)) return x == 0 ? double.NegativeInfinity : double.NaN;
        if (double.IsPositiveInfinity(x)) return x;
        long adjust = 0;
        if (x < SmallestNormal)
        {
            x *= TwoTo54;
            adjust = 54;
        }
        long bits = BitConverter.DoubleToInt64Bits(x);
        long k = (bits - SqrtHalfBits) >> 52;
        double f = BitConverter.Int64BitsToDouble(bits - (k << 52)) - 1.0;
        double kd = k - adjust;
        return Math.FusedMultiplyAdd(kd, Ln2Upper, Log1pReduced(f) + kd * Ln2UpperLow);
    }

    /// <summary>
    /// ln(1 + f) for f exactly as given, |f| ≤ 1 − √½ ≈ 0.29 (1 + f need not be representable): used where
    /// ln(1 − v) is wanted for a small v held exactly, which 1 − v would round.
    /// </summary>
    internal static double Log1pSmall(double f) => Log1pReduced(f);

    /// <summary>√½ − 1 ≤ f &lt; √2 − 1.</summary>
    private static double Log1pReduced(double f)
    {
        double s = f / (2.0 + f);
        double z = s * s;
        double t = z * Horner(LogCoefficients, z);
        return f - s * (f - t);
    }

    // Σ c_i x^(n−1−i) by Horner's rule, one fused multiply-add a step (the lane form takes the same steps).
    private static double Horner(ReadOnlySpan<double> coefficients, double x)
    {
        double p = coefficients[0];
        for (int i = 1; i < coefficients.Length; i++) p = Math.FusedMultiplyAdd(p, x, coefficients[i]);
        return p;
    }

    private static double PowerOfTwo(long k) => BitConverter.Int64BitsToDouble((k + ExponentBias) << 52);
}
