namespace DesignCompiler.Tests.Randomness;

/// <summary>
/// Test-only special functions, written independently of the library code they check.
/// </summary>
internal static class SpecialFunctions
{
    /// <summary>
    /// ln Γ(z) for z &gt; 0: shift up with Γ(z) = Γ(z + m) / (z (z+1) ... (z+m−1)) until the
    /// argument is at least 30, then the Stirling series to z^-9 (Abramowitz and Stegun 6.1.40,
    /// from memory). Error near 1e-15 relative.
    /// </summary>
    public static double LogGamma(double z)
    {
        double shift = 0.0;
        while (z < 30.0)
        {
            shift += Math.Log(z);
            z += 1.0;
        }

        double inverse = 1.0 / z;
        double inverseSquared = inverse * inverse;
        double series = inverse * (1.0 / 12 - inverseSquared * (1.0 / 360 - inverseSquared * (1.0 / 1260 - inverseSquared * (1.0 / 1680 - inverseSquared / 1188))));
        return (z - 0.5) * Math.Log(z) - z + 0.5 * Math.Log(2 * Math.PI) + series - shift;
    }

    /// <summary>
    /// The regularized upper incomplete gamma Q(a, x) = Γ(a, x)/Γ(a): the power series for
    /// P when x &lt; a + 1, otherwise the continued fraction for Q evaluated by the modified
    /// Lentz method (Press et al., <i>Numerical Recipes in C</i>, 2nd ed., §6.2).
    /// </summary>
    public static double UpperRegularizedGamma(double a, double x)
    {
        if (x <= 0.0)
        {
            return 1.0;
        }

        double logPrefactor = a * Math.Log(x) - x - LogGamma(a);
        if (x < a + 1.0)
        {
            double term = 1.0 / a;
            double sum = term;
            for (int n = 1; n < 10_000; n++)
            {
                term *= x / (a + n);
                sum += term;
                if (Math.Abs(term) < Math.Abs(sum) * 1e-17)
                {
                    break;
                }
            }

            return 1.0 - sum * Math.Exp(logPrefactor);
        }

        const double tiny = 1e-300;
        double b = x + 1.0 - a;
        double c = 1.0 / tiny;
        double d = 1.0 / b;
        double h = d;
        for (int i = 1; i < 10_000; i++)
        {
            double an = -i * (i - a);
            b += 2.0;
            d = an * d + b;
            if (Math.Abs(d) < tiny)
            {
                d = tiny;
            }

            c = b + an / c;
            if (Math.Abs(c) < tiny)
            {
                c = tiny;
            }

            d = 1.0 / d;
            double delta = d * c;
            h *= delta;
            if (Math.Abs(delta - 1.0) < 1e-16)
            {
                break;
            }
        }

        return Math.Exp(logPrefactor) * h;
    }
}
