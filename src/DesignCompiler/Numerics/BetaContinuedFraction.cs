namespace DesignCompiler.Numerics;

/// <summary>
/// The continued fraction for I_x(a,b) (DLMF 8.17.22; Numerical Recipes §6.4), evaluated with the
/// modified Lentz method. It converges quickly for x &lt; (a+1)/(a+b+2); callers swap the tails beyond that.
/// </summary>
internal static class BetaContinuedFraction
{
    private const double Tiny = 1e-300;
    private const double Tolerance = 2.5e-16;

    /// <summary>The value h with I_x(a,b) = x^a (1−x)^b h / (a B(a,b)).</summary>
    internal static double Evaluate(double a, double b, double x)
    {
        double qab = a + b, qap = a + 1.0, qam = a - 1.0;
        double c = 1.0, d = 1.0 - qab * x / qap;
        if (Math.Abs(d) < Tiny) d = Tiny;
        d = 1.0 / d;
        double h = d;
        int limit = IterationLimit(a, b);
        for (int m = 1; m <= limit; m++)
        {
            int m2 = 2 * m;
            double aa = m * (b - m) * x / ((qam + m2) * (a + m2));
            d = 1.0 + aa * d;
            if (Math.Abs(d) < Tiny) d = Tiny;
            c = 1.0 + aa / c;
            if (Math.Abs(c) < Tiny) c = Tiny;
            d = 1.0 / d;
            h *= d * c;
            aa = -(a + m) * (qab + m) * x / ((a + m2) * (qap + m2));
            d = 1.0 + aa * d;
            if (Math.Abs(d) < Tiny) d = Tiny;
            c = 1.0 + aa / c;
            if (Math.Abs(c) < Tiny) c = Tiny;
            d = 1.0 / d;
            double delta = d * c;
            h *= delta;
            if (Math.Abs(delta - 1.0) <= Tolerance) break;
        }
        return h;
    }

    // The worst case, at the switch point, needs O(√max(a,b)) terms; this leaves a wide margin.
    private static int IterationLimit(double a, double b) =>
        200 + (int)Math.Min(1e6, 10.0 * Math.Sqrt(Math.Max(a, b)));
}
