using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace DesignCompiler.Numerics;

/// <summary>
/// <see cref="Evaluate"/> at many points at once, as the P(best) quadrature asks for a panel: the uniform expansion
/// of large shapes (GammaKernel.Uniform.cs), the series and the continued fraction, the costly parts, run eight
/// points to an AVX-512 register. Every lane takes exactly the scalar steps and keeps its value from the step at
/// which it converged, so each result is bit for bit the one-point value whatever the other lanes do.
/// </summary>
internal readonly partial struct GammaKernel
{
    private const int Lanes = 8;

    /// <summary>Density and both tails at every point, each bit for bit what <see cref="Evaluate"/> gives.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    [SkipLocalsInit]
    internal void EvaluateMany(ReadOnlySpan<double> x, Span<double> density, Span<double> lower, Span<double> upper)
    {
        int n = x.Length;
        if (!Vector512.IsHardwareAccelerated || n < Lanes)
        {
            for (int j = 0; j < n; j++) Evaluate(x[j], out density[j], out lower[j], out upper[j]);
            return;
        }
        Span<double> prefactor = stackalloc double[n], seriesAt = stackalloc double[n], fractionAt = stackalloc double[n], values = stackalloc double[n];
        Span<int> seriesIndex = stackalloc int[n], fractionIndex = stackalloc int[n], pending = stackalloc int[n];
        int series = 0, fractions = 0, count = 0;
        for (int j = 0; j < n; j++)
        {
            double v = x[j];
            if (!(v > 0) || double.IsPositiveInfinity(v))
            {
                Evaluate(v, out density[j], out lower[j], out upper[j]);
                continue;
            }
            pending[count++] = j;
        }
        // A uniform kernel's points get their prefactors in lanes and keep for the series and the continued
        // fraction only those outside the expansion's domain; other kernels' points all go there.
        if (uniform) count = UniformMany(x, pending[..count], prefactor, density, lower, upper);
        else
        {
            foreach (int j in pending[..count])
            {
                prefactor[j] = RepeatableMath.Exp(LogPrefactor(x[j]));
                density[j] = prefactor[j] / x[j];
            }
        }
        foreach (int j in pending[..count])
        {
            double v = x[j];
            if (v < A + 1.0)
            {
                seriesIndex[series] = j;
                seriesAt[series++] = v;
            }
            else
            {
                fractionIndex[fractions] = j;
                fractionAt[fractions++] = v;
            }
        }
        SeriesMany(A, seriesAt[..series], values);
        for (int i = 0; i < series; i++)
        {
            int j = seriesIndex[i];
            lower[j] = Math.Min(1.0, prefactor[j] * values[i]);
            upper[j] = A < 1.0 && lower[j] > 0.25 ? SmallShapeUpper(A, x[j]) : 1.0 - lower[j];
        }
        FractionMany(A, fractionAt[..fractions], values);
        for (int i = 0; i < fractions; i++)
        {
            int j = fractionIndex[i];
            upper[j] = Math.Min(1.0, prefactor[j] * values[i]);
            lower[j] = 1.0 - upper[j];
        }
    }

    // The points of a uniform kernel in groups of eight (a short group padded with its last point): each gets its
    // prefactor and density, and its tails where the expansion holds. The others are moved to the front of
    // points, in order, for the series or the continued fraction (with the prefactor found here, which is the
    // scalar one bit for bit); returns how many.
    [SkipLocalsInit]
    private int UniformMany(ReadOnlySpan<double> x, Span<int> points, Span<double> prefactor, Span<double> density,
        Span<double> lower, Span<double> upper)
    {
        Span<double> lanes = stackalloc double[Lanes], f = stackalloc double[Lanes], d = stackalloc double[Lanes],
            lo = stackalloc double[Lanes], up = stackalloc double[Lanes], ok = stackalloc double[Lanes];
        int outside = 0;
        for (int done = 0; done < points.Length; done += Lanes)
        {
            int count = Math.Min(Lanes, points.Length - done);
            for (int i = 0; i < Lanes; i++) lanes[i] = x[points[done + Math.Min(i, count - 1)]];
            UniformLanes(Vector512.Create((ReadOnlySpan<double>)lanes), out var dv, out var lv, out var uv, out var inside).CopyTo(f);
            dv.CopyTo(d);
            lv.CopyTo(lo);
            uv.CopyTo(up);
            inside.CopyTo(ok);
            for (int i = 0; i < count; i++)
            {
                int j = points[done + i];
                prefactor[j] = f[i];
                density[j] = d[i];
                if (BitConverter.DoubleToInt64Bits(ok[i]) != 0)
                {
                    lower[j] = lo[i];
                    upper[j] = up[i];
                }
                else
                {
                    points[outside++] = j; // never ahead of the group being read
                }
            }
        }
        return outside;
    }

    // LowerSeries and UpperContinuedFraction at every point: groups of eight in lanes, a group short of eight padded
    // with its last point (the copies are dropped), and one or two points left over done one at a time.
    private static void SeriesMany(double a, ReadOnlySpan<double> x, Span<double> values) => InGroups(a, x, values, SeriesLanes, LowerSeries);

    private static void FractionMany(double a, ReadOnlySpan<double> x, Span<double> values) => InGroups(a, x, values, FractionLanes, UpperContinuedFraction);

    [SkipLocalsInit]
    private static void InGroups(
        double a, ReadOnlySpan<double> x, Span<double> values,
        Func<double, Vector512<double>, Vector512<double>> lanesForm, Func<double, double, double> scalarForm)
    {
        Span<double> lanes = stackalloc double[Lanes];
        for (int done = 0; done < x.Length; done += Lanes)
        {
            int count = Math.Min(Lanes, x.Length - done);
            if (count < 3)
            {
                for (int j = done; j < done + count; j++) values[j] = scalarForm(a, x[j]);
                continue;
            }
            Load(x, done, count, lanes);
            lanesForm(a, Vector512.Create((ReadOnlySpan<double>)lanes)).CopyTo(lanes);
            lanes[..count].CopyTo(values[done..]);
        }
    }

    private static void Load(ReadOnlySpan<double> x, int start, int count, Span<double> lanes)
    {
        x.Slice(start, count).CopyTo(lanes);
        lanes[count..].Fill(x[start + count - 1]);
    }

    // LowerSeries lane by lane: a lane stops adding once its own term is below 1e-17 of its sum.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static Vector512<double> SeriesLanes(double a, Vector512<double> x)
    {
        var ap = Vector512.Create(a);
        var term = Vector512.Create(1.0 / a);
        var sum = term;
        var running = Vector512<double>.AllBitsSet;
        var one = Vector512<double>.One;
        var smallShare = Vector512.Create(1e-17);
        int limit = IterationLimit(a);
        for (int n = 0; n < limit; n++)
        {
            ap += one;
            term = Vector512.ConditionalSelect(running, term * (x / ap), term);
            sum = Vector512.ConditionalSelect(running, sum + term, sum);
            running = Vector512.AndNot(running, Vector512.LessThanOrEqual(term, sum * smallShare));
            if (running.ExtractMostSignificantBits() == 0) break;
        }
        return sum;
    }

    // UpperContinuedFraction lane by lane (modified Lentz); a lane keeps h from the step at which it converged.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static Vector512<double> FractionLanes(double a, Vector512<double> x)
    {
        const double tiny = 1e-300;
        var tinyLanes = Vector512.Create(tiny);
        var two = Vector512.Create(2.0);
        var one = Vector512<double>.One;
        var tolerance = Vector512.Create(2.5e-16);
        var b = x + one - Vector512.Create(a);
        var c = Vector512.Create(1.0 / tiny);
        var d = one / b;
        var h = d;
        var running = Vector512<double>.AllBitsSet;
        int limit = IterationLimit(a);
        for (int i = 1; i <= limit; i++)
        {
            var an = Vector512.Create(-i * (i - a));
            b += two;
            var dn = an * d + b;
            dn = Vector512.ConditionalSelect(Vector512.LessThan(Vector512.Abs(dn), tinyLanes), tinyLanes, dn);
            var cn = b + an / c;
            cn = Vector512.ConditionalSelect(Vector512.LessThan(Vector512.Abs(cn), tinyLanes), tinyLanes, cn);
            dn = one / dn;
            var delta = dn * cn;
            h = Vector512.ConditionalSelect(running, h * delta, h);
            d = dn;
            c = cn;
            running = Vector512.AndNot(running, Vector512.LessThanOrEqual(Vector512.Abs(delta - one), tolerance));
            if (running.ExtractMostSignificantBits() == 0) break;
        }
        return h;
    }
}
