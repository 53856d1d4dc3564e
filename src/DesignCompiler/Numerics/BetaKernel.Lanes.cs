using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace DesignCompiler.Numerics;

internal readonly partial struct BetaKernel
{
    private const int Lanes = 8;

    /// <summary>
    /// e^<see cref="LogPrefactor"/> at many points, and the density prefactor/(x·y), eight at a time: the
    /// series, logarithms and exponential all have lane forms that give the scalar results bit for bit.
    /// <paramref name="logX"/> and <paramref name="logY"/> are ln x and ln y as <see cref="LogsMany"/> gives
    /// them, or empty to have them computed here. Points with x or y outside (0, 1) get values the caller
    /// must not use.
    /// </summary>
    // Kept out of tiered compilation: a simulation spends its first seconds here, and tiering would run that
    // time in unoptimised code and then compile it again; there is nothing for profile guidance to learn.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    [SkipLocalsInit]
    internal void PrefactorMany(
        ReadOnlySpan<double> x, ReadOnlySpan<double> y, ReadOnlySpan<double> logX, ReadOnlySpan<double> logY,
        Span<double> prefactor, Span<double> density)
    {
        int n = x.Length, done = 0;
        bool known = !logX.IsEmpty;
        if (Vector512.IsHardwareAccelerated)
        {
            Span<double> spill = stackalloc double[Lanes];
            for (; n - done >= 2; done += Lanes)
            {
                int count = Math.Min(Lanes, n - done);
                var xv = LoadPadded(x, done, count);
                var yv = LoadPadded(y, done, count);
                Vector512<double> logs;
                if (form == Form.Centred) logs = CentredLanes(xv, yv);
                else if (known) logs = FromLogsLanes(LoadPadded(logX, done, count), LoadPadded(logY, done, count));
                else logs = FromLogsLanes(LogOfLanes(xv, yv), LogOfLanes(yv, xv));
                var values = RepeatableMath.Exp(logs);
                Store(values, prefactor, done, count, spill);
                Store(values / (xv * yv), density, done, count, spill);
            }
        }
        for (int j = done; j < n; j++)
        {
            double logPrefactor = form == Form.Centred || !known ? LogPrefactor(x[j], y[j]) : LogPrefactorFromLogs(logX[j], logY[j]);
            prefactor[j] = RepeatableMath.Exp(logPrefactor);
            density[j] = prefactor[j] / (x[j] * y[j]);
        }
    }

    private static readonly Vector512<long> LaneIndices = Vector512.Create(0L, 1, 2, 3, 4, 5, 6, 7);

    // Eight values from start; a short group is padded with its last value (the padding's results are dropped).
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> LoadPadded(ReadOnlySpan<double> values, int start, int count) =>
        count == Lanes ? Vector512.Create(values.Slice(start, Lanes)) : LoadShort(values, start, count);

    [SkipLocalsInit]
    private static Vector512<double> LoadShort(ReadOnlySpan<double> values, int start, int count)
    {
        if (Avx512F.IsSupported && start + count >= Lanes)
        {
            // The eight values ending with the group's last, moved down into place, the last one repeated
            // above them: one permutation instead of a gather lane by lane (a panel's third group is short).
            var window = Vector512.Create(values.Slice(start + count - Lanes, Lanes));
            var index = Vector512.Min(LaneIndices + Vector512.Create((long)(Lanes - count)), Vector512.Create((long)(Lanes - 1)));
            return Avx512F.PermuteVar8x64(window, index);
        }
        Span<double> lanes = stackalloc double[Lanes];
        for (int l = 0; l < Lanes; l++) lanes[l] = values[start + Math.Min(l, count - 1)];
        return Vector512.Create((ReadOnlySpan<double>)lanes);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Store(Vector512<double> values, Span<double> into, int start, int count, Span<double> spill)
    {
        if (count == Lanes)
        {
            values.CopyTo(into.Slice(start, Lanes));
            return;
        }
        values.CopyTo(spill);
        spill[..count].CopyTo(into.Slice(start, count));
    }

    /// <summary>ln x and ln y at every point as <see cref="LogPrefactor"/> takes them, to be shared between arms.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void LogsMany(ReadOnlySpan<double> x, ReadOnlySpan<double> y, Span<double> logX, Span<double> logY)
    {
        int n = x.Length, done = 0;
        if (Vector512.IsHardwareAccelerated)
        {
            for (; n - done >= Lanes; done += Lanes)
            {
                var xv = Vector512.Create(x.Slice(done, Lanes));
                var yv = Vector512.Create(y.Slice(done, Lanes));
                LogOfLanes(xv, yv).CopyTo(logX.Slice(done, Lanes));
                LogOfLanes(yv, xv).CopyTo(logY.Slice(done, Lanes));
            }
        }
        for (int j = done; j < n; j++)
        {
            logX[j] = LogOf(x[j], y[j]);
            logY[j] = LogOf(y[j], x[j]);
        }
    }

    // LogPrefactor's centred branch in lanes: the same operations in the same order, branches chosen per lane.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private Vector512<double> CentredLanes(Vector512<double> x, Vector512<double> y)
    {
        var gap = C(roundingGap);
        var d = Vector512.ConditionalSelect(Vector512.LessThanOrEqual(x, C(0.5)), x - C(mean), (C(meanComplement) - y) + gap);
        var tx = d / C(mean);
        var ty = (gap - d) / C(meanComplement);
        var lx = CentredTerm(tx, x, mean);
        var ly = CentredTerm(ty, y, meanComplement);
        return C(A) * lx + C(B) * ly + d * C(linearSlope) + C(logConstant);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private Vector512<double> FromLogsLanes(Vector512<double> lx, Vector512<double> ly) =>
        form == Form.FromMean
            ? C(A) * (lx - C(logOfMean)) + C(B) * (ly - C(logOfMeanComplement)) + C(logAtMean)
            : C(A) * lx + C(B) * ly + C(logConstant);

    // CentredTerm in lanes: each branch is computed only when some lane takes it, and the series only on the
    // lanes within its reach (the others get 0 there), so that no lane drags the group into the long series.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> CentredTerm(Vector512<double> t, Vector512<double> u, double centre)
    {
        var size = Vector512.Abs(t);
        var series = Vector512.LessThanOrEqual(size, C(CentredSeriesReach));
        var seriesLanes = series.ExtractMostSignificantBits();
        var result = SpecialFunctions.Log1pMinusXLanes(Vector512.ConditionalSelect(series, t, Vector512<double>.Zero));
        if (seriesLanes == 0xFF) return result;
        var fromT = Vector512.AndNot(Vector512.LessThanOrEqual(size, C(LogOfSeriesReach)), series);
        if (fromT.ExtractMostSignificantBits() != 0)
            result = Vector512.ConditionalSelect(fromT, RepeatableMath.Log1pSmall(t) - t, result);
        var fromRatio = ~(series | fromT);
        if (fromRatio.ExtractMostSignificantBits() != 0)
            result = Vector512.ConditionalSelect(fromRatio, RepeatableMath.Log(u / C(centre)) - t, result);
        return result;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> LogOfLanes(Vector512<double> u, Vector512<double> v)
    {
        var fromV = Vector512.GreaterThan(u, C(0.5)) & Vector512.LessThanOrEqual(v, C(LogOfSeriesReach));
        var bits = fromV.ExtractMostSignificantBits();
        if (bits == 0) return RepeatableMath.Log(u);
        if (bits == 0xFF) return RepeatableMath.Log1pSmall(-v);
        return Vector512.ConditionalSelect(fromV, RepeatableMath.Log1pSmall(-v), RepeatableMath.Log(u));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> C(double value) => Vector512.Create(value);
}
