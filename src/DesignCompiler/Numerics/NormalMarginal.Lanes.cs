using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;
using DesignCompiler.Numerics.Multivariate;

namespace DesignCompiler.Numerics;

/// <summary>
/// A panel's points eight at a time: the density and the tail beyond |z| in lanes (<see cref="NormalTail"/>'s lane
/// forms, bit for bit its one-point values), the other tail as the complement, exactly as
/// <see cref="IQuadratureProfile.Evaluate"/> forms them one at a time.
/// </summary>
public sealed partial class NormalMarginal
{
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    [SkipLocalsInit]
    void IQuadratureProfile.EvaluateMany(ReadOnlySpan<double> x, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        const int lanes = NormalTail.Lanes;
        var self = (IQuadratureProfile)this;
        if (!Vector512.IsHardwareAccelerated || x.Length < lanes)
        {
            for (int j = 0; j < x.Length; j++) self.Evaluate(x[j], out density[j], out cdf[j], out upperTail[j]);
            return;
        }
        Span<double> group = stackalloc double[lanes], d = stackalloc double[lanes], c = stackalloc double[lanes],
            u = stackalloc double[lanes];
        var mean = Vector512.Create(Mean);
        var sd = Vector512.Create(StdDev);
        var one = Vector512<double>.One;
        for (int done = 0; done < x.Length; done += lanes)
        {
            int count = Math.Min(lanes, x.Length - done);
            for (int i = 0; i < lanes; i++) group[i] = x[done + Math.Min(i, count - 1)];
            var z = (Vector512.Create((ReadOnlySpan<double>)group) - mean) / sd;
            // φ(|z|) is φ(z) bit for bit (z² is the same), and the tail beyond |z| is the scalar branch's.
            var tail = NormalTail.UpperLanes(Vector512.Abs(z), out var pdf);
            var positive = Vector512.GreaterThanOrEqual(z, Vector512<double>.Zero);
            (pdf / sd).CopyTo(d);
            Vector512.ConditionalSelect(positive, one - tail, tail).CopyTo(c);
            Vector512.ConditionalSelect(positive, tail, one - tail).CopyTo(u);
            d[..count].CopyTo(density[done..]);
            c[..count].CopyTo(cdf[done..]);
            u[..count].CopyTo(upperTail[done..]);
        }
    }
}
