namespace DesignCompiler.Numerics;

public static partial class IncompleteBeta
{
    // Newton converges quadratically, so once a step is this small the point it lands on is exact to an ulp.
    internal const double FullPrecision = 1e-14;

    /// <summary>The x with I_x(a,b) = p.</summary>
    public static double Inverse(double a, double b, double p)
    {
        if (!ValidParameters(a, b) || double.IsNaN(p) || p < 0 || p > 1) return double.NaN;
        Quantile(new BetaKernel(a, b), p, 1.0 - p, FullPrecision, out double x, out _);
        return x;
    }

    /// <summary>
    /// The quantile as the pair (x, 1 − x), each accurate in relative terms. The solve runs in whichever
    /// of x and 1 − x is below ½ at the answer, so quantiles crowding against 1 keep their digits too.
    /// </summary>
    internal static void Quantile(in BetaKernel kernel, double p, double q, double relativeTolerance, out double x, out double y)
    {
        if (p <= 0) { x = 0; y = 1; return; }
        if (q <= 0) { x = 1; y = 0; return; }
        double guess = InitialGuess(kernel.A, kernel.B, p, q);
        if (guess <= 0.5)
        {
            x = SolveLower(kernel, p, q, guess, relativeTolerance);
            y = 1.0 - x;
            if (x <= 0.5) return;
            guess = x;
        }
        y = SolveLower(kernel.Swapped, q, p, 1.0 - guess, relativeTolerance);
        x = 1.0 - y;
        if (y > 0.5)
        {
            // The starting value pointed to the wrong side; the answer is below ½ after all.
            x = SolveLower(kernel, p, q, x, relativeTolerance);
            y = 1.0 - x;
        }
    }

    private static double SolveLower(in BetaKernel kernel, double p, double q, double guess, double relativeTolerance) =>
        TailInversion.Solve(new BetaTails(kernel), p, q, guess, 1.0, relativeTolerance);

    // Starting values from the normal approximation with a Cornish–Fisher-type correction when a, b ≥ 1,
    // and from the leading power laws at either end otherwise (after the starting values of invbetai in
    // Press et al., Numerical Recipes, 3rd ed.; the section number is from memory). Only the start
    // matters here: the Newton iteration fixes its accuracy.
    internal static double InitialGuess(double a, double b, double p, double q)
    {
        if (a >= 1 && b >= 1)
        {
            double z = p <= q ? StandardNormal.QuantileOfSmallTail(p) : -StandardNormal.QuantileOfSmallTail(q);
            double xn = -z;
            double al = (z * z - 3.0) / 6.0;
            double h = 2.0 / (1.0 / (2.0 * a - 1.0) + 1.0 / (2.0 * b - 1.0));
            double w = xn * Math.Sqrt(al + h) / h
                - (1.0 / (2.0 * b - 1.0) - 1.0 / (2.0 * a - 1.0)) * (al + 5.0 / 6.0 - 2.0 / (3.0 * h));
            double guess = a / (a + b * Math.Exp(2.0 * w));
            return double.IsFinite(guess) && guess > 0 && guess < 1 ? guess : a / (a + b);
        }
        double lna = -SpecialFunctions.Log1p(b / a), lnb = -SpecialFunctions.Log1p(a / b);
        double t = Math.Exp(a * lna) / a, u = Math.Exp(b * lnb) / b, weight = t + u;
        double logBetaTerm = Math.Log(weight);
        if (p < t / weight) return Math.Exp((Math.Log(a * p) + logBetaTerm) / a);
        return 1.0 - Math.Exp((Math.Log(b * q) + logBetaTerm) / b);
    }

    private readonly struct BetaTails(BetaKernel kernel) : ITailFunction
    {
        public void Evaluate(double x, out double lower, out double upper, out double density) =>
            kernel.Evaluate(x, 1.0 - x, out density, out lower, out upper);
    }
}
