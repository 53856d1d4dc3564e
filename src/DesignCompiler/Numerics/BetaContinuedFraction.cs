using System.Runtime.CompilerServices;

namespace DesignCompiler.Numerics;

/// <summary>
/// The continued fraction for I_x(a,b) (DLMF 8.17.22; Numerical Recipes §6.4). It converges quickly for
/// x &lt; (a+1)/(a+b+2); callers swap the tails beyond that.
/// </summary>
/// <remarks>
/// h = 1/(1 + d1/(1 + d2/(1 + …))) with d1 = −(a+b)x/(a+1), d_2m = m(b−m)x/((a+2m−1)(a+2m)) and
/// d_2m+1 = −(a+m)(a+b+m)x/((a+2m)(a+2m+1)). It is evaluated by the forward three-term recurrence for
/// the approximants A/B rather than by Lentz's method, so the loop needs no division: the coefficients
/// without x can be tabulated once per distribution, and convergence is tested by cross-multiplication.
/// A and B are rescaled by powers of two, which is exact, whenever they drift towards overflow.
/// </remarks>
internal static partial class BetaContinuedFraction
{
    private const double Tolerance = 2.5e-16;
    private const double Big = 1e150;

    /// <summary>Terms tabulated per distribution; beyond them coefficients are computed as needed.</summary>
    internal const int TabulatedTerms = 48;

    /// <summary>The x-free coefficients (d_2m/x, d_2m+1/x) for m = 1 … <see cref="TabulatedTerms"/>.</summary>
    internal static double[] Tabulate(double a, double b)
    {
        var table = new double[2 * TabulatedTerms];
        for (int m = 1; m <= TabulatedTerms; m++) Coefficients(a, b, m, out table[2 * m - 2], out table[2 * m - 1]);
        return table;
    }

    /// <summary>The value h with I_x(a,b) = x^a (1−x)^b h / (a B(a,b)).</summary>
    // Kept out of tiered compilation: a simulation spends its first seconds here, and tiering would run that
    // time in unoptimised code and then compile it again; there is nothing for profile guidance to learn.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static double Evaluate(double a, double b, double x, ReadOnlySpan<double> table = default)
    {
        double previousA = 1.0, previousB = 1.0;
        double currentA = 1.0, currentB = 1.0 - (a + b) * x / (a + 1.0);
        int tabulated = table.Length / 2;
        int limit = IterationLimit(a, b);
        for (int m = 1; m <= limit; m++)
        {
            double even, odd;
            if (m <= tabulated)
            {
                even = table[2 * m - 2];
                odd = table[2 * m - 1];
            }
            else
            {
                Coefficients(a, b, m, out even, out odd);
            }
            even *= x;
            odd *= x;
            double evenA = currentA + even * previousA, evenB = currentB + even * previousB;
            double oddA = evenA + odd * currentA, oddB = evenB + odd * currentB;
            previousA = evenA;
            previousB = evenB;
            currentA = oddA;
            currentB = oddB;
            double magnitude = Math.Abs(currentB);
            if (magnitude > Big || magnitude < 1.0 / Big)
            {
                int shift = -Math.ILogB(currentB);
                currentA = Math.ScaleB(currentA, shift);
                currentB = Math.ScaleB(currentB, shift);
                previousA = Math.ScaleB(previousA, shift);
                previousB = Math.ScaleB(previousB, shift);
            }
            double cross = currentA * previousB;
            if (Math.Abs(cross - previousA * currentB) <= Tolerance * Math.Abs(cross)) break;
        }
        return currentA / currentB;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Coefficients(double a, double b, int m, out double even, out double odd)
    {
        double a2m = a + 2 * m;
        double common = 1.0 / ((a2m - 1.0) * a2m * (a2m + 1.0));
        even = m * (b - m) * (a2m + 1.0) * common;
        odd = -(a + m) * (a + b + m) * (a2m - 1.0) * common;
    }

    // The worst case, at the switch point, needs O(√max(a,b)) terms; this leaves a wide margin.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static int IterationLimit(double a, double b) =>
        200 + (int)Math.Min(1e6, 10.0 * Math.Sqrt(Math.Max(a, b)));
}
