using System.Collections.Immutable;

namespace DesignCompiler.Numerics;

/// <summary>
/// Log-gamma and log-beta, accurate to a few ulps for every positive argument,
/// including the large parameters that posteriors reach after thousands of plots.
/// </summary>
public static partial class SpecialFunctions
{
    internal const double HalfLogTwoPi = 0.91893853320467274178032973640562;

    // Below this the Stirling remainder series needs too many terms; above it ten terms give full precision.
    internal const double StirlingThreshold = 10.0;

    /// <summary>ln Γ(x) for x &gt; 0; +∞ at 0 and NaN for negative or NaN input.</summary>
    public static double LogGamma(double x)
    {
        if (double.IsNaN(x) || x < 0) return double.NaN;
        if (x == 0) return double.PositiveInfinity;
        if (double.IsPositiveInfinity(x)) return x;
        if (x < 0.5)
        {
            // Γ(x) = Γ(2+x) / (x(1+x)); x itself is never rounded, so tiny x keeps full precision.
            return LogGammaNearTwo(x) - Log1p(x) - Math.Log(x);
        }
        if (x < 1.5)
        {
            // x - 1 is exact here, and dividing out (1+z) keeps relative accuracy at the zero x = 1.
            double z = x - 1.0;
            return LogGammaNearTwo(z) - Log1p(z);
        }
        if (x <= 2.5) return LogGammaNearTwo(x - 2.0);
        if (x < StirlingThreshold)
        {
            // Shifting down by integers is exact in this range; at most eight factors.
            double y = x, product = 1.0;
            while (y > 2.5)
            {
                y -= 1.0;
                product *= y;
            }
            return LogGammaNearTwo(y - 2.0) + Math.Log(product);
        }
        return (x - 0.5) * Math.Log(x) - x + HalfLogTwoPi + StirlingSeries.Correction(x);
    }

    /// <summary>ln Γ(1 + a) for a &gt; −½, without rounding 1 + a (which would lose the digits of small a).</summary>
    internal static double LogGammaOnePlus(double a) =>
        a <= 0.5 ? LogGammaNearTwo(a) - Log1p(a) : LogGamma(1.0 + a);

    /// <summary>
    /// ln B(a,b). When both parameters are large the Stirling terms are combined so that the
    /// huge ln Γ values never meet and cancel; the result keeps its full relative precision.
    /// </summary>
    public static double LogBeta(double a, double b)
    {
        if (!(a > 0) || !(b > 0)) return double.NaN;
        if (double.IsPositiveInfinity(a) || double.IsPositiveInfinity(b)) return double.NegativeInfinity;
        double small = Math.Min(a, b), large = Math.Max(a, b);
        if (small >= StirlingThreshold)
        {
            double s = a + b;
            return HalfLogTwoPi
                - (a - 0.5) * Log1p(b / a)
                - (b - 0.5) * Log1p(a / b)
                - 0.5 * Math.Log(s)
                + StirlingSeries.Correction(a) + StirlingSeries.Correction(b) - StirlingSeries.Correction(s);
        }
        if (large >= StirlingThreshold)
        {
            return LogGamma(small) + LogGammaRatio(large, small);
        }
        return LogGamma(a) + LogGamma(b) - LogGamma(a + b);
    }

    /// <summary>ln Γ(h) − ln Γ(h+l) for h ≥ 10, without forming either large logarithm.</summary>
    internal static double LogGammaRatio(double h, double l)
    {
        double s = h + l;
        return -(h - 0.5) * Log1p(l / h) - l * Math.Log(s) + l
            + StirlingSeries.Correction(h) - StirlingSeries.Correction(s);
    }

    // Taylor series of ln Γ(2+z) for |z| ≤ 0.5: coefficients (-1)^k (ζ(k) − 1)/k, k ≥ 2, and 1 − γ for k = 1
    // (DLMF 5.7.3 shifted by one). Values computed with mpmath at 40 digits.
    private static readonly ImmutableArray<double> NearTwoCoefficients =
    [
        0.42278433509846713939,
        0.3224670334241132,
        -0.0673523010531981,
        0.020580808427784546,
        -0.007385551028673986,
        0.0028905103307415234,
        -0.001192753911703261,
        0.0005096695247430425,
        -0.00022315475845357939,
        9.945751278180853e-05,
        -4.492623673813314e-05,
        2.050721277567069e-05,
        -9.439488275268397e-06,
        4.374866789907488e-06,
        -2.039215753801366e-06,
        9.55141213040742e-07,
        -4.492469198764566e-07,
        2.1207184805554665e-07,
        -1.0043224823968099e-07,
        4.7698101693639804e-08,
        -2.2711094608943164e-08,
        1.0838659214896955e-08,
        -5.183475041970047e-09,
        2.4836745438024785e-09,
        -1.1921401405860912e-09,
        5.731367241678862e-10,
        -2.7595228851242334e-10,
        1.330476437424449e-10,
        -6.4229645638381e-11,
    ];

    private static double LogGammaNearTwo(double z)
    {
        var c = NearTwoCoefficients.AsSpan();
        double sum = c[^1];
        for (int k = c.Length - 2; k >= 0; k--) sum = sum * z + c[k];
        return sum * z;
    }
}
