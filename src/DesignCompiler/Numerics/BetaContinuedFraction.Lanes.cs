using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace DesignCompiler.Numerics;

/// <summary>
/// The continued fraction at many arguments of one distribution at once: the P(best) quadrature needs it at
/// twenty nodes per panel for every arm. Eight arguments share one AVX-512 register, and two registers run
/// side by side (the recurrence is a chain of dependent steps; a second chain fills the waits), or one alone
/// for the last eight or fewer: a panel's twenty-one points take three registers, not four. Each lane
/// runs exactly the scalar recurrence of <see cref="Evaluate"/> and keeps the approximant of the step at
/// which it converged, so every result is bit for bit the scalar one, whatever the other lanes do.
/// </summary>
internal static partial class BetaContinuedFraction
{
    private const int Lanes = 8;

    /// <summary>h for each x, as <see cref="Evaluate"/> gives it.</summary>
    // Kept out of tiered compilation: a simulation spends its first seconds here, and tiering would run that
    // time in unoptimised code and then compile it again; there is nothing for profile guidance to learn.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    [SkipLocalsInit]
    internal static void EvaluateMany(double a, double b, ReadOnlySpan<double> x, ReadOnlySpan<double> table, Span<double> h)
    {
        int done = 0;
        if (Vector512.IsHardwareAccelerated)
        {
            Span<double> lanes = stackalloc double[2 * Lanes];
            for (; x.Length - done >= 2; done += 2 * Lanes)
            {
                int count = Math.Min(2 * Lanes, x.Length - done);
                bool pair = count > Lanes;
                // Short groups are padded with their last argument; the padding's results are dropped.
                scoped ReadOnlySpan<double> group = x.Slice(done, count);
                if (count < 2 * Lanes)
                {
                    group.CopyTo(lanes);
                    lanes[count..].Fill(x[done + count - 1]);
                    group = lanes;
                }
                if (EvaluateLanes(a, b, Vector512.Create(group), Vector512.Create(group[Lanes..]), pair, table, lanes))
                    lanes[..count].CopyTo(h[done..]);
                else
                    for (int i = done; i < done + count; i++) h[i] = Evaluate(a, b, x[i], table);
            }
        }
        for (int i = done; i < x.Length; i++) h[i] = Evaluate(a, b, x[i], table);
    }

    /// <summary>
    /// Both registers' results into <paramref name="results"/> (the second's only with <paramref name="pair"/>;
    /// without, its chain is skipped); false when a lane's approximants drift towards overflow, rare enough
    /// that the caller then simply redoes the group one argument at a time.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static bool EvaluateLanes(double a, double b, Vector512<double> x1, Vector512<double> x2, bool pair, ReadOnlySpan<double> table, Span<double> results)
    {
        var one = Vector512.Create(1.0);
        var sum = Vector512.Create(a + b);
        var shifted = Vector512.Create(a + 1.0);
        var big = Vector512.Create(Big);
        var small = Vector512.Create(1.0 / Big);
        var tolerance = Vector512.Create(Tolerance);
        Vector512<double> previousA1 = one, previousB1 = one, currentA1 = one, currentB1 = one - sum * x1 / shifted;
        Vector512<double> previousA2 = one, previousB2 = one, currentA2 = one, currentB2 = one - sum * x2 / shifted;
        Vector512<double> resultA1 = currentA1, resultB1 = currentB1, resultA2 = currentA2, resultB2 = currentB2;
        Vector512<double> live1 = Vector512<double>.AllBitsSet, live2 = pair ? Vector512<double>.AllBitsSet : Vector512<double>.Zero;
        int tabulated = table.Length / 2;
        int limit = IterationLimit(a, b);
        for (int m = 1; m <= limit; m++)
        {
            double evenCoefficient, oddCoefficient;
            if (m <= tabulated)
            {
                evenCoefficient = table[2 * m - 2];
                oddCoefficient = table[2 * m - 1];
            }
            else
            {
                Coefficients(a, b, m, out evenCoefficient, out oddCoefficient);
            }
            var even1 = Vector512.Create(evenCoefficient) * x1;
            var odd1 = Vector512.Create(oddCoefficient) * x1;
            var evenA1 = currentA1 + even1 * previousA1;
            var evenB1 = currentB1 + even1 * previousB1;
            currentA1 = evenA1 + odd1 * currentA1;
            currentB1 = evenB1 + odd1 * currentB1;
            previousA1 = evenA1;
            previousB1 = evenB1;
            var magnitude1 = Vector512.Abs(currentB1);
            var drift = (Vector512.GreaterThan(magnitude1, big) | Vector512.LessThan(magnitude1, small)) & live1;
            var cross1 = currentA1 * previousB1;
            var converged1 = Vector512.LessThanOrEqual(Vector512.Abs(cross1 - previousA1 * currentB1), tolerance * Vector512.Abs(cross1)) & live1;
            resultA1 = Vector512.ConditionalSelect(converged1, currentA1, resultA1);
            resultB1 = Vector512.ConditionalSelect(converged1, currentB1, resultB1);
            live1 = Vector512.AndNot(live1, converged1);

            if (pair)
            {
                var even2 = Vector512.Create(evenCoefficient) * x2;
                var odd2 = Vector512.Create(oddCoefficient) * x2;
                var evenA2 = currentA2 + even2 * previousA2;
                var evenB2 = currentB2 + even2 * previousB2;
                currentA2 = evenA2 + odd2 * currentA2;
                currentB2 = evenB2 + odd2 * currentB2;
                previousA2 = evenA2;
                previousB2 = evenB2;
                var magnitude2 = Vector512.Abs(currentB2);
                drift |= (Vector512.GreaterThan(magnitude2, big) | Vector512.LessThan(magnitude2, small)) & live2;
                var cross2 = currentA2 * previousB2;
                var converged2 = Vector512.LessThanOrEqual(Vector512.Abs(cross2 - previousA2 * currentB2), tolerance * Vector512.Abs(cross2)) & live2;
                resultA2 = Vector512.ConditionalSelect(converged2, currentA2, resultA2);
                resultB2 = Vector512.ConditionalSelect(converged2, currentB2, resultB2);
                live2 = Vector512.AndNot(live2, converged2);
            }
            if (drift.ExtractMostSignificantBits() != 0) return false;
            if ((live1 | live2).ExtractMostSignificantBits() == 0) break;
        }
        // Lanes that ran out of iterations end with the last approximant, as the scalar loop does.
        (Vector512.ConditionalSelect(live1, currentA1, resultA1) / Vector512.ConditionalSelect(live1, currentB1, resultB1)).CopyTo(results);
        (Vector512.ConditionalSelect(live2, currentA2, resultA2) / Vector512.ConditionalSelect(live2, currentB2, resultB2)).CopyTo(results[Lanes..]);
        return true;
    }
}
