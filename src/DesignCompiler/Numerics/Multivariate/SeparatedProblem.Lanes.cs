using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// <see cref="Evaluate"/> at eight lattice points at once, one per lane: the lattice rules spend nearly all
/// their time in the truncated-normal steps, and eight points in one register take little longer than one.
/// Every lane is the scalar value bit for bit (the same steps in the same order; see <see cref="TruncatedNormal"/>'s
/// lanes), so a run gives the same sums whichever way its points went.
/// </summary>
internal sealed partial class SeparatedProblem
{
    internal const int Lanes = NormalTail.Lanes;

    /// <summary>
    /// Values and moments of eight points. <paramref name="w"/> holds coordinate c of point i at c · 8 + i;
    /// <paramref name="y"/> is scratch of <see cref="Rank"/> registers.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal void EvaluateLanes(ReadOnlySpan<double> w, Span<Vector512<double>> y, Vector512<double> scale,
        out Vector512<double> value, out Vector512<double> moment)
    {
        var f = Vector512.Create(1.0);
        var alive = Vector512<double>.AllBitsSet;
        var lowest = Vector512.Create(RichtmyerPoints.Epsilon);
        var highest = Vector512.Create(1.0 - RichtmyerPoints.Epsilon);
        int last = Rank - 1;
        for (int c = 0; c < last; c++)
        {
            IntervalLanes(c, y, scale, out var lower, out var upper);
            alive &= Vector512.LessThan(lower, upper);
            var u = Vector512.Create(w.Slice(c * Lanes, Lanes));
            // Math.Clamp(u, ε, 1 − ε).
            u = Vector512.ConditionalSelect(Vector512.LessThan(u, lowest), lowest,
                Vector512.ConditionalSelect(Vector512.GreaterThan(u, highest), highest, u));
            f *= TruncatedNormal.SampleLanes(lower, upper, u, out y[c]);
            alive &= ~Vector512.Equals(f, Vector512<double>.Zero);
            if (alive == Vector512<double>.Zero) break;
        }
        IntervalLanes(last, y, scale, out var lo, out var hi);
        alive &= Vector512.LessThan(lo, hi);
        var mass = TruncatedNormal.BetweenLanes(lo, hi, out var densityLo, out var densityHi);
        value = Vector512.ConditionalSelect(alive, f * mass, Vector512<double>.Zero);
        moment = Vector512<double>.Zero;
        if (Moment is double[] m)
        {
            var known = Vector512<double>.Zero;
            for (int c = 0; c < last; c++) known = Vector512.FusedMultiplyAdd(Vector512.Create(m[c]), y[c], known);
            var edge = densityLo - densityHi;
            moment = Vector512.ConditionalSelect(alive, f * (known * mass + Vector512.Create(m[last]) * edge), Vector512<double>.Zero);
        }
    }

    /// <summary><see cref="Interval"/> in every lane.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void IntervalLanes(int c, ReadOnlySpan<Vector512<double>> y, Vector512<double> scale, out Vector512<double> lower, out Vector512<double> upper)
    {
        lower = Vector512.Create(double.NegativeInfinity);
        upper = Vector512.Create(double.PositiveInfinity);
        for (int r = ColumnRowStart[c]; r < ColumnRowStart[c + 1]; r++)
        {
            double[] row = Coefficients[r];
            var sum = Vector512<double>.Zero;
            for (int l = 0; l < c; l++) sum = Vector512.FusedMultiplyAdd(Vector512.Create(row[l]), y[l], sum);
            var pivot = Vector512.Create(row[c]);
            var a = (Vector512.Create(Lower[r]) * scale - sum) / pivot;
            var b = (Vector512.Create(Upper[r]) * scale - sum) / pivot;
            if (row[c] < 0) (a, b) = (b, a);
            lower = Vector512.ConditionalSelect(Vector512.GreaterThan(a, lower), a, lower);
            upper = Vector512.ConditionalSelect(Vector512.LessThan(b, upper), b, upper);
        }
    }
}
