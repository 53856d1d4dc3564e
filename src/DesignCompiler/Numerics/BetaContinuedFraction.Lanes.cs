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
        var sum = Vector512.Create(a + b);
        var shifted = Vector512.Create(a + 1.0);
        var first = new Chain(x1, sum, shifted, running: true);
        var second = new Chain(x2, sum, shifted, running: pair);
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
            var drift = first.Step(evenCoefficient, oddCoefficient);
            if (pair) drift |= second.Step(evenCoefficient, oddCoefficient);
            if (drift.ExtractMostSignificantBits() != 0) return false;
            if ((first.Running | second.Running).ExtractMostSignificantBits() == 0) break;
        }
        first.Result.CopyTo(results);
        second.Result.CopyTo(results[Lanes..]);
        return true;
    }

    /// <summary>
    /// One register's recurrence: the last two approximants, the one at which each lane converged, and the
    /// lanes still running. Each step is the scalar loop's step, lane by lane.
    /// </summary>
    private struct Chain
    {
        private readonly Vector512<double> x;
        private Vector512<double> previousA, previousB, currentA, currentB, resultA, resultB;

        internal Chain(Vector512<double> x, Vector512<double> sum, Vector512<double> shifted, bool running)
        {
            this.x = x;
            previousA = previousB = currentA = Vector512<double>.One;
            currentB = Vector512<double>.One - sum * x / shifted;
            resultA = currentA;
            resultB = currentB;
            Running = running ? Vector512<double>.AllBitsSet : Vector512<double>.Zero;
        }

        /// <summary>All bits set in the lanes that have not converged yet.</summary>
        internal Vector512<double> Running { readonly get; private set; }

        /// <summary>Lanes that ran out of iterations end with the last approximant, as the scalar loop does.</summary>
        internal readonly Vector512<double> Result =>
            Vector512.ConditionalSelect(Running, currentA, resultA) / Vector512.ConditionalSelect(Running, currentB, resultB);

        /// <summary>One step of the recurrence; returns the running lanes whose approximants drift towards overflow.</summary>
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        internal Vector512<double> Step(double evenCoefficient, double oddCoefficient)
        {
            var even = Vector512.Create(evenCoefficient) * x;
            var odd = Vector512.Create(oddCoefficient) * x;
            var evenA = currentA + even * previousA;
            var evenB = currentB + even * previousB;
            currentA = evenA + odd * currentA;
            currentB = evenB + odd * currentB;
            previousA = evenA;
            previousB = evenB;
            var magnitude = Vector512.Abs(currentB);
            var drift = (Vector512.GreaterThan(magnitude, Vector512.Create(Big)) | Vector512.LessThan(magnitude, Vector512.Create(1.0 / Big))) & Running;
            var cross = currentA * previousB;
            var converged = Vector512.LessThanOrEqual(Vector512.Abs(cross - previousA * currentB), Vector512.Create(Tolerance) * Vector512.Abs(cross)) & Running;
            resultA = Vector512.ConditionalSelect(converged, currentA, resultA);
            resultB = Vector512.ConditionalSelect(converged, currentB, resultB);
            Running = Vector512.AndNot(Running, converged);
            return drift;
        }
    }
}
