namespace DesignCompiler.Numerics;

/// <summary>The regularized incomplete gamma functions P(a,x), Q(a,x) = 1 − P(a,x), and the inverse of P.</summary>
public static class IncompleteGamma
{
    /// <summary>P(a,x) = γ(a,x)/Γ(a), the CDF of Gamma(shape a, rate 1).</summary>
    public static double LowerRegularized(double a, double x)
    {
        if (!ValidShape(a) || double.IsNaN(x)) return double.NaN;
        if (x <= 0) return 0;
        new GammaKernel(a).Tails(x, out double lower, out _);
        return lower;
    }

    /// <summary>Q(a,x) = Γ(a,x)/Γ(a), computed directly in the right tail.</summary>
    public static double UpperRegularized(double a, double x)
    {
        if (!ValidShape(a) || double.IsNaN(x)) return double.NaN;
        if (x <= 0) return 1;
        new GammaKernel(a).Tails(x, out _, out double upper);
        return upper;
    }

    /// <summary>The x with P(a,x) = p.</summary>
    public static double Inverse(double a, double p)
    {
        if (!ValidShape(a) || double.IsNaN(p) || p < 0 || p > 1) return double.NaN;
        return Quantile(new GammaKernel(a), p, 1.0 - p, IncompleteBeta.FullPrecision);
    }

    internal static double Quantile(in GammaKernel kernel, double p, double q, double relativeTolerance)
    {
        if (p <= 0) return 0;
        if (q <= 0) return double.PositiveInfinity;
        double guess = InitialGuess(kernel.A, p, q);
        return TailInversion.Solve(new GammaTails(kernel), p, q, guess, double.PositiveInfinity, relativeTolerance);
    }

    internal static bool ValidShape(double a) => a > 0 && !double.IsPositiveInfinity(a);

    // Wilson–Hilferty for a > 1; otherwise the leading power law near 0 or the exponential tail (after the
    // starting values of invgammp in Press et al., Numerical Recipes, 3rd ed.; from memory). Newton fixes
    // the accuracy.
    private static double InitialGuess(double a, double p, double q)
    {
        if (a > 1)
        {
            double z = p <= q ? StandardNormal.QuantileOfSmallTail(p) : -StandardNormal.QuantileOfSmallTail(q);
            double c = 1.0 / (9.0 * a);
            double cube = 1.0 - c + z * Math.Sqrt(c);
            double guess = a * cube * cube * cube;
            return guess > 0 && double.IsFinite(guess) ? guess : 1e-3 * a;
        }
        double t = 1.0 - a * (0.253 + a * 0.12);
        if (p < t) return Math.Exp(Math.Log(p / t) / a);
        return 1.0 - Math.Log(q / (1.0 - t));
    }

    private readonly struct GammaTails(GammaKernel kernel) : ITailFunction
    {
        public void Evaluate(double x, out double lower, out double upper, out double density) =>
            kernel.Evaluate(x, out density, out lower, out upper);
    }
}
