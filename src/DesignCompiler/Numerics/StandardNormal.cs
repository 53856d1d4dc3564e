namespace DesignCompiler.Numerics;

/// <summary>The standard normal distribution, with tails accurate in relative terms down to underflow.</summary>
public static partial class StandardNormal
{
    private const double InvSqrtTwoPi = 0.39894228040143267793994605993438;

    // Where the power series gives way to the continued fraction (z²/2 = 1.5, where the fraction for
    // Q(½, z²/2) starts to converge well); both cost about 30–60 terms here, and 1 − Φ below it is ≥ 0.04.
    private const double SeriesLimit = 1.7320508075688772;

    public static double LogPdf(double z) => -0.5 * z * z - SpecialFunctions.HalfLogTwoPi;

    public static double Pdf(double z) => InvSqrtTwoPi * SpecialFunctions.ExpMinusHalfSquare(z);

    public static double Cdf(double z) => UpperTail(-z);

    /// <summary>1 − Φ(z), computed directly so that it never cancels in the right tail.</summary>
    public static double UpperTail(double z)
    {
        if (double.IsNaN(z)) return z;
        if (z < -SeriesLimit) return 1.0 - UpperTail(-z);
        if (z < SeriesLimit) return 0.5 - Pdf(z) * z * SpecialFunctions.OddDoubleFactorialSeries(z * z);
        return Pdf(z) * MillsRatio(z);
    }

    /// <summary>ln(1 − Φ(z)), finite far beyond the point where the tail itself underflows.</summary>
    internal static double LogUpperTail(double z)
    {
        if (z < SeriesLimit) return Math.Log(UpperTail(z));
        double hi = z * z, lo = Math.FusedMultiplyAdd(z, z, -hi);
        return -0.5 * hi - 0.5 * lo - SpecialFunctions.HalfLogTwoPi + Math.Log(MillsRatio(z));
    }

    /// <summary>(1 − Φ(z)) / φ(z) for z ≥ 2, from the continued fraction of Q(½, z²/2).</summary>
    internal static double MillsRatio(double z)
    {
        if (double.IsPositiveInfinity(z)) return 0.0;
        if (z > 1e150) return 1.0 / z;
        return 0.5 * z * SpecialFunctions.HalfGammaContinuedFraction(0.5 * z * z);
    }
}
