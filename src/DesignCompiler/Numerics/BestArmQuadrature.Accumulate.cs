using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace DesignCompiler.Numerics;

/// <summary>A panel's sums over its nodes, eight nodes at a time.</summary>
internal ref partial struct BestArmQuadrature
{
    /// <summary>
    /// Adds to each live slot's panel sum Σ_n w_n f_s F_s^(m−1) ∏_{t≠s} F_t^(m_t) at the panel's nodes, and
    /// gives the rule's value of the integral of G′ = Σ_s m_s f_s F_s^(m−1) ∏_{t≠s} F_t^(m_t) and of x·G′.
    /// </summary>
    /// <remarks>
    /// The twenty nodes and the right end fill three registers of eight; the end and the padding are masked
    /// out (the end's density may be infinite at a singular bound). The products over the other slots come
    /// from prefix and suffix products, lane by lane. Written with <see cref="Vector512{T}"/> operations only,
    /// which give the same bits whether the hardware has them or the runtime emulates them, and with sums
    /// in a fixed order, so results never depend on the machine.
    /// </remarks>
    // Kept out of tiered compilation: a simulation spends its first seconds here, and tiering would run that
    // time in unoptimised code and then compile it again; there is nothing for profile guidance to learn.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    [SkipLocalsInit]
    private readonly void AccumulatePanel(double half, out double derivativeSum, out double momentSum)
    {
        var weights = GaussLegendre20.Weights.AsSpan();
        Span<double> w = stackalloc double[PanelStride], x = stackalloc double[PanelStride];
        for (int j = 0; j < PanelStride; j++)
        {
            w[j] = j < PanelNodes ? half * weights[j / 2] : 0.0;
            x[j] = j < PanelNodes ? Position(nodes[j]) : 0.0;
        }
        var suffixLanes = MemoryMarshal.Cast<double, Vector512<double>>(suffix);
        var density = MemoryMarshal.Cast<double, Vector512<double>>(nodeDensity);
        var cdf = MemoryMarshal.Cast<double, Vector512<double>>(nodeCdf);
        const int groups = PanelStride / Lanes;
        derivativeSum = 0;
        momentSum = 0;
        for (int g = 0; g < groups; g++)
        {
            var weight = Vector512.Create((ReadOnlySpan<double>)w.Slice(g * Lanes, Lanes));
            var position = Vector512.Create((ReadOnlySpan<double>)x.Slice(g * Lanes, Lanes));
            var nodeLanes = Vector512.LessThan(Vector512.Create((double)(g * Lanes)) + LaneIndex, Vector512.Create((double)PanelNodes));
            suffixLanes[slots] = Vector512<double>.One;
            for (int s = slots - 1; s >= first; s--) suffixLanes[s] = suffixLanes[s + 1] * Power(cdf[s * groups + g], slotMultiplicity[s]);
            var prefix = Vector512<double>.One;
            var derivative = Vector512<double>.Zero;
            for (int s = first; s < slots; s++)
            {
                int m = slotMultiplicity[s];
                var c = cdf[s * groups + g];
                var own = m == 1 ? Vector512<double>.One : Power(c, m - 1);
                var integrand = Vector512.ConditionalSelect(nodeLanes, density[s * groups + g] * own * prefix * suffixLanes[s + 1], Vector512<double>.Zero);
                panelSum[s] += Sum(weight * integrand);
                derivative += Vector512.Create((double)m) * integrand;
                prefix *= Power(c, m);
            }
            derivativeSum += Sum(weight * derivative);
            // x·G′ before the weight, as each can be huge where the other is tiny (a heavy tail at 1e156).
            momentSum += Sum(weight * (position * derivative));
        }
    }

    private const int Lanes = 8;

    private static readonly Vector512<double> LaneIndex = Vector512.Create(0.0, 1, 2, 3, 4, 5, 6, 7);

    // F^m; m is 1 except for groups of identical arms.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> Power(Vector512<double> c, int m) => m == 1 ? c : RepeatableMath.Power(c, m);

    // The sum of the eight lanes in a fixed order: halves, quarters, then the last pair.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Sum(Vector512<double> v)
    {
        var h = v.GetLower() + v.GetUpper();
        var q = h.GetLower() + h.GetUpper();
        return q.GetElement(0) + q.GetElement(1);
    }
}
