using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace DesignCompiler.Numerics;

internal static partial class RepeatableMath
{
    /// <summary><see cref="Exp"/> in eight lanes, each bit for bit the scalar result.</summary>
    // Kept out of tiered compilation: a simulation spends its first seconds here, and tiering would run that
    // time in unoptimised code and then compile it again; there is nothing for profile guidance to learn.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static Vector512<double> Exp(Vector512<double> x)
    {
        // Out-of-range lanes are computed on a clamped argument and replaced at the end; NaN stays NaN.
        var clamped = Vector512.ConditionalSelect(Vector512.GreaterThan(x, C(710.0)), C(710.0), x);
        clamped = Vector512.ConditionalSelect(Vector512.LessThan(clamped, C(-746.0)), C(-746.0), clamped);
        var shifted = Vector512.FusedMultiplyAdd(clamped, C(InverseLn2), C(RoundingShifter));
        var k = shifted.AsInt64() - C(RoundingShifter).AsInt64();
        var kd = shifted - C(RoundingShifter);
        var r = Vector512.FusedMultiplyAdd(-kd, C(Ln2Low), Vector512.FusedMultiplyAdd(-kd, C(Ln2), clamped));
        var p = Horner(ExpCoefficients, r);
        var half = Vector512.ShiftRightArithmetic(k, 1);
        var result = p * PowerOfTwo(half) * PowerOfTwo(k - half);
        result = Vector512.ConditionalSelect(Vector512.GreaterThan(x, C(OverflowAbove)), C(double.PositiveInfinity), result);
        return Vector512.ConditionalSelect(Vector512.LessThan(x, C(UnderflowBelow)), Vector512<double>.Zero, result);
    }

    /// <summary><see cref="Power(double, int)"/> in eight lanes with one exponent, each bit for bit the scalar result.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector512<double> Power(Vector512<double> x, int n)
    {
        var result = Vector512<double>.One;
        while (true)
        {
            if ((n & 1) != 0) result *= x;
            n >>= 1;
            if (n == 0) return result;
            x *= x;
        }
    }

    /// <summary><see cref="Log"/> in eight lanes, each bit for bit the scalar result.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static Vector512<double> Log(Vector512<double> x)
    {
        var subnormal = Vector512.LessThan(x, C(SmallestNormal));
        var scaled = Vector512.ConditionalSelect(subnormal, x * C(TwoTo54), x);
        var adjust = Vector512.ConditionalSelect(subnormal.AsInt64(), Vector512.Create(54L), Vector512<long>.Zero);
        var bits = scaled.AsInt64();
        var k = Vector512.ShiftRightArithmetic(bits - Vector512.Create(SqrtHalfBits), 52);
        var f = (bits - Vector512.ShiftLeft(k, 52)).AsDouble() - C(1.0);
        var kd = Vector512.ConvertToDouble(k - adjust);
        var result = Vector512.FusedMultiplyAdd(kd, C(Ln2Upper), Log1pReduced(f) + kd * C(Ln2UpperLow));
        result = Vector512.ConditionalSelect(Vector512.Equals(x, C(double.PositiveInfinity)), x, result);
        result = Vector512.ConditionalSelect(Vector512.Equals(x, Vector512<double>.Zero), C(double.NegativeInfinity), result);
        // Negative lanes and NaN: the comparison is false for both.
        return Vector512.ConditionalSelect(Vector512.GreaterThanOrEqual(x, Vector512<double>.Zero), result, C(double.NaN));
    }

    /// <summary><see cref="Log1pSmall"/> in eight lanes.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector512<double> Log1pSmall(Vector512<double> f) => Log1pReduced(f);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> Log1pReduced(Vector512<double> f)
    {
        var s = f / (C(2.0) + f);
        var z = s * s;
        var t = z * Horner(LogCoefficients, z);
        return f - s * (f - t);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> Horner(ReadOnlySpan<double> coefficients, Vector512<double> x)
    {
        var p = C(coefficients[0]);
        for (int i = 1; i < coefficients.Length; i++) p = Vector512.FusedMultiplyAdd(p, x, C(coefficients[i]));
        return p;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> PowerOfTwo(Vector512<long> k) => Vector512.ShiftLeft(k + Vector512.Create(ExponentBias), 52).AsDouble();

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> C(double value) => Vector512.Create(value);
}
