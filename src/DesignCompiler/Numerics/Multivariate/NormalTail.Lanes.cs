using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// The tail and its quantile at eight arguments at once, for eight lattice points evaluated side by side. Each
/// lane runs exactly the scalar steps: the same piece, the same Clenshaw recurrence (a shorter series padded
/// with zeros at its top, where the recurrence stays at +0 until its first real term), and the repeatable
/// exp and log (<see cref="RepeatableMath"/>), whose lane forms have the scalar bits, so every lane is bit for
/// bit the scalar value.
/// </summary>
internal static partial class NormalTail
{
    internal const int Lanes = 8;

    private static readonly Vector512<double>[] MillsTerms = Transpose([Mills0.ToArray(), Mills1.ToArray(), Mills2.ToArray(), Mills3.ToArray()]);
    private static readonly Vector512<double> MillsFrom = Vector512.Create(0.0, 0.25, 0.5, 0.75, 0, 0, 0, 0);
    private static readonly Vector512<double> MillsTo = Vector512.Create(0.25, 0.5, 0.75, 1.0, 1, 1, 1, 1);

    private static readonly Vector512<double>[] QuantileTerms = Transpose([
        Quantile0.ToArray(), Quantile1.ToArray(), Quantile2.ToArray(), Quantile3.ToArray(),
        Quantile4.ToArray(), Quantile5.ToArray(), Quantile6.ToArray(), Quantile7.ToArray(),
    ]);
    private static readonly Vector512<double> QuantileFrom = Vector512.Create(CentreT, 2.0, 3.0, 4.5, 6.0, 9.0, 12.0, 20.0);
    private static readonly Vector512<double> QuantileTo = Vector512.Create(2.0, 3.0, 4.5, 6.0, 9.0, 12.0, 20.0, 39.0);

    /// <summary><see cref="Upper"/> for z ≥ 0 (or NaN) in every lane.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector512<double> UpperLanes(Vector512<double> z) => UpperLanes(z, out _);

    /// <summary><see cref="UpperLanes(Vector512{double})"/>, and φ(z) on the way (the scalar <see cref="StandardNormal.Pdf"/>'s bits).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector512<double> UpperLanes(Vector512<double> z, out Vector512<double> density)
    {
        density = DensityLanes(z);
        var u = Vector512.Create(Shift) / (z + Vector512.Create(Shift));
        // The scalar branches: u <= 1/4 is piece 0, … , anything else (NaN too) piece 3.
        var piece = Vector512.Create(3L)
            + Vector512.LessThanOrEqual(u, Vector512.Create(0.25)).AsInt64()
            + Vector512.LessThanOrEqual(u, Vector512.Create(0.5)).AsInt64()
            + Vector512.LessThanOrEqual(u, Vector512.Create(0.75)).AsInt64();
        var mills = Clenshaw(MillsTerms, piece, u, MillsFrom, MillsTo);
        var value = density * mills / (z + Vector512.Create(Shift));
        return Vector512.ConditionalSelect(Vector512.GreaterThan(z, Vector512.Create(Underflow)), Vector512<double>.Zero, value);
    }

    /// <summary><see cref="UpperQuantile"/> in every lane.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector512<double> UpperQuantileLanes(Vector512<double> q)
    {
        var t = Vector512.Sqrt(Vector512.Create(-2.0) * RepeatableMath.Log(q));
        var piece = Vector512.Create(7L);
        for (int k = 0; k < 7; k++)
            piece += Vector512.LessThanOrEqual(t, Vector512.Create(QuantileTo[k])).AsInt64();
        var z = Clenshaw(QuantileTerms, piece, t, QuantileFrom, QuantileTo);
        // The first piece is kept at or above 0 as Math.Max(z, 0.0) keeps it: NaN stays, -0 and below become +0.
        var first = Vector512.Equals(piece, Vector512<long>.Zero).AsDouble();
        var keep = Vector512.GreaterThan(z, Vector512<double>.Zero) | ~Vector512.Equals(z, z);
        z = Vector512.ConditionalSelect(first & ~keep, Vector512<double>.Zero, z);
        z = Vector512.ConditionalSelect(Vector512.GreaterThanOrEqual(q, Vector512.Create(0.5)), Vector512<double>.Zero, z);
        return Vector512.ConditionalSelect(~Vector512.GreaterThan(q, Vector512<double>.Zero), Vector512.Create(double.PositiveInfinity), z);
    }

    /// <summary>The scalar <c>Chebyshev(c, t, a, b)</c> of each lane's piece.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> Clenshaw(Vector512<double>[] terms, Vector512<long> piece, Vector512<double> t,
        Vector512<double> from, Vector512<double> to)
    {
        var a = Avx512F.PermuteVar8x64(from, piece);
        var b = Avx512F.PermuteVar8x64(to, piece);
        var x = (Vector512.Create(2.0) * t - a - b) / (b - a);
        x = Vector512.ConditionalSelect(Vector512.LessThan(x, Vector512.Create(-1.0)), Vector512.Create(-1.0),
            Vector512.ConditionalSelect(Vector512.GreaterThan(x, Vector512.Create(1.0)), Vector512.Create(1.0), x));
        var twoX = Vector512.Create(2.0) * x;
        var b1 = Vector512<double>.Zero;
        var b2 = Vector512<double>.Zero;
        for (int j = terms.Length - 1; j >= 1; j--)
        {
            var b0 = Vector512.FusedMultiplyAdd(twoX, b1, Avx512F.PermuteVar8x64(terms[j], piece) - b2);
            b2 = b1;
            b1 = b0;
        }
        return Vector512.FusedMultiplyAdd(x, b1, Avx512F.PermuteVar8x64(terms[0], piece) - b2);
    }

    /// <summary><see cref="Density"/> in every lane.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Vector512<double> DensityLanes(Vector512<double> z)
    {
        var hi = z * z;
        var lo = Vector512.FusedMultiplyAdd(z, z, -hi);
        var value = Vector512.Create(InvSqrtTwoPi) * (RepeatableMath.Exp(Vector512.Create(-0.5) * hi) * (Vector512.Create(1.0) - Vector512.Create(0.5) * lo));
        return Vector512.ConditionalSelect(Vector512.Equals(hi, Vector512.Create(double.PositiveInfinity)), Vector512<double>.Zero, value);
    }

    /// <summary>Term j of every piece in one register, piece p in lane p; a piece's missing top terms are 0.</summary>
    private static Vector512<double>[] Transpose(double[][] pieces)
    {
        int width = pieces.Max(p => p.Length);
        var terms = new Vector512<double>[width];
        Span<double> lane = stackalloc double[Lanes];
        for (int j = 0; j < width; j++)
        {
            lane.Clear();
            for (int p = 0; p < pieces.Length; p++) lane[p] = j < pieces[p].Length ? pieces[p][j] : 0.0;
            terms[j] = Vector512.Create((ReadOnlySpan<double>)lane);
        }
        return terms;
    }
}
