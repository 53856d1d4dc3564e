namespace DesignCompiler.Numerics;

public static partial class StandardNormal
{
    /// <summary>
    /// Φ⁻¹(p). A rational starting value (P. J. Acklam's 2003 approximation, relative error about 1e-9)
    /// is polished by Newton steps on the accurate tail, so the result is correct to the last bit or two.
    /// </summary>
    public static double Quantile(double p)
    {
        if (double.IsNaN(p) || p < 0 || p > 1) return double.NaN;
        if (p == 0) return double.NegativeInfinity;
        if (p == 1) return double.PositiveInfinity;
        // 1 − p is exact for p ≥ ½, so the upper half reuses the lower-tail solver without loss.
        return p > 0.5 ? -LowerHalfQuantile(1.0 - p) : LowerHalfQuantile(p);
    }

    /// <summary>
    /// <see cref="Quantile"/>, kept for the P(best) quadrature's tail mass: every support search starts from
    /// Φ⁻¹(1e-16), for every arm of every call, and that one value need only be found once.
    /// </summary>
    internal static double QuantileOfSmallTail(double p) => p == QuadratureTail ? QuadratureTailQuantile : Quantile(p);

    private const double QuadratureTail = BestArmQuadrature.TailMass;
    private static readonly double QuadratureTailQuantile = Quantile(QuadratureTail);

    /// <summary>The z with 1 − Φ(z) = q, accurate for tiny q.</summary>
    public static double UpperQuantile(double q) => -Quantile(q);

    private static double LowerHalfQuantile(double p)
    {
        double z = AcklamStart(p);
        for (int i = 0; i < 4; i++)
        {
            double next;
            if (z < -SeriesLimit)
            {
                // Newton on ln Φ: its slope φ/Φ is the reciprocal Mills ratio, and no tail underflows.
                double t = -z;
                double g = LogUpperTail(t) - Math.Log(p);
                next = z - g * MillsRatio(t);
            }
            else
            {
                // Halley on Φ itself; the centre has no tail to lose.
                double u = (Cdf(z) - p) / Pdf(z);
                next = z - u / (1.0 + 0.5 * z * u);
            }
            bool done = Math.Abs(next - z) <= 1e-15 * Math.Abs(next);
            z = next;
            if (done) break;
        }
        return z;
    }

    private static double AcklamStart(double p)
    {
        const double low = 0.02425;
        if (p < low)
        {
            double q = Math.Sqrt(-2.0 * Math.Log(p));
            return (((((-7.784894002430293e-03 * q - 3.223964580411365e-01) * q - 2.400758277161838e+00) * q
                        - 2.549732539343734e+00) * q + 4.374664141464968e+00) * q + 2.938163982698783e+00)
                / ((((7.784695709041462e-03 * q + 3.224671290700398e-01) * q + 2.445134137142996e+00) * q
                        + 3.754408661907416e+00) * q + 1.0);
        }
        double r = p - 0.5, s = r * r;
        return (((((-3.969683028665376e+01 * s + 2.209460984245205e+02) * s - 2.759285104469687e+02) * s
                    + 1.383577518672690e+02) * s - 3.066479806614716e+01) * s + 2.506628277459239e+00) * r
            / (((((-5.447609879822406e+01 * s + 1.615858368580409e+02) * s - 1.556989798598866e+02) * s
                    + 6.680131188771972e+01) * s - 1.328068155288572e+01) * s + 1.0);
    }
}
