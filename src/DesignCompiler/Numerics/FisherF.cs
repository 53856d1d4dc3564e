namespace DesignCompiler.Numerics;

/// <summary>Snedecor's F distribution with d1 and d2 degrees of freedom: the tail that an analysis of variance reports.</summary>
public static class FisherF
{
    /// <summary>
    /// P(F &gt; f) = I_x(d2/2, d1/2) with x = d2/(d2 + d1·f) (A&amp;S 26.6.2; equation number from memory). Both x and
    /// 1 − x are formed directly, so neither tail is a rounded complement.
    /// </summary>
    public static double UpperTail(double d1, double d2, double f)
    {
        if (!(d1 > 0) || !(d2 > 0) || !double.IsFinite(d1) || !double.IsFinite(d2) || double.IsNaN(f)) return double.NaN;
        if (f <= 0) return 1;
        if (double.IsPositiveInfinity(f)) return 0;
        double scaled = d1 * f;
        if (double.IsPositiveInfinity(scaled)) return 0;
        double x = d2 / (d2 + scaled);
        double y = scaled / (d2 + scaled);
        new BetaKernel(0.5 * d2, 0.5 * d1).Tails(x, y, out double tail, out _);
        return tail;
    }
}
