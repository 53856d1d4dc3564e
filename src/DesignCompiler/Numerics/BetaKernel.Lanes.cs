using System.Runtime.Intrinsics;

namespace DesignCompiler.Numerics;

internal readonly partial struct BetaKernel
{
    private const int Lanes = 8;

    /// <summary>
    /// <see cref="LogPrefactor"/> at many points, eight at a time where the centred form applies: its series
    /// need only arithmetic, so lanes give the scalar results bit for bit. Points where the form needs a
    /// logarithm, and kernels that are not centred, are done one by one.
    /// </summary>
    internal void LogPrefactorMany(ReadOnlySpan<double> x, ReadOnlySpan<double> y, Span<double> result)
    {
        int n = x.Length, done = 0;
        if (centred && Vector512.IsHardwareAccelerated)
        {
            Span<double> xs = stackalloc double[Lanes], ys = stackalloc double[Lanes], values = stackalloc double[Lanes];
            for (; n - done >= 2; done += Lanes)
            {
                int count = Math.Min(Lanes, n - done);
                for (int l = 0; l < Lanes; l++)
                {
                    xs[l] = x[done + Math.Min(l, count - 1)];
                    ys[l] = y[done + Math.Min(l, count - 1)];
                }
                ulong series = CentredLanes(Vector512.Create((ReadOnlySpan<double>)xs), Vector512.Create((ReadOnlySpan<double>)ys), values);
                for (int l = 0; l < count; l++)
                    result[done + l] = (series & (1UL << l)) != 0 ? values[l] : LogPrefactor(xs[l], ys[l]);
            }
        }
        for (int j = done; j < n; j++) result[j] = LogPrefactor(x[j], y[j]);
    }

    // The centred branch of LogPrefactor in lanes; returns the lanes whose two series arguments are within ½,
    // the only ones whose values are valid.
    private ulong CentredLanes(Vector512<double> x, Vector512<double> y, Span<double> values)
    {
        var half = Vector512.Create(0.5);
        var gap = Vector512.Create(roundingGap);
        var d = Vector512.ConditionalSelect(Vector512.LessThanOrEqual(x, half), x - Vector512.Create(mean), (Vector512.Create(meanComplement) - y) + gap);
        var tx = d / Vector512.Create(mean);
        var ty = (gap - d) / Vector512.Create(meanComplement);
        var valid = Vector512.LessThanOrEqual(Vector512.Abs(tx), half) & Vector512.LessThanOrEqual(Vector512.Abs(ty), half);
        var lx = SpecialFunctions.Log1pMinusXLanes(tx);
        var ly = SpecialFunctions.Log1pMinusXLanes(ty);
        var sum = Vector512.Create(A) * lx + Vector512.Create(B) * ly + d * Vector512.Create(linearSlope) + Vector512.Create(logConstant);
        sum.CopyTo(values);
        return valid.ExtractMostSignificantBits();
    }
}
