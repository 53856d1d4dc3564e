namespace DesignCompiler.Numerics;

/// <summary>A continuous distribution on (0, upper) seen through both of its tails and its density.</summary>
internal interface ITailFunction
{
    void Evaluate(double x, out double lower, out double upper, out double density);
}

/// <summary>
/// Inverts a CDF on (0, hi) by safeguarded Newton steps on the logarithm of whichever tail is targeted:
/// in ln x for the lower tail (where F behaves like a power of x) and in x for the upper tail (where the
/// survival function behaves like an exponential). A shrinking bracket catches every bad step.
/// </summary>
internal static class TailInversion
{
    private const int MaxIterations = 100;
    private const double SmallestNormal = 2.2250738585072014e-308;

    /// <param name="p">target lower tail.</param>
    /// <param name="q">target upper tail, 1 − p; whichever of p and q is smaller must be exact.</param>
    /// <param name="relativeTolerance">stop when a step moves x by less than this fraction.</param>
    internal static double Solve<T>(in T f, double p, double q, double guess, double hi, double relativeTolerance)
        where T : struct, ITailFunction
    {
        bool lowerTarget = p <= q;
        double target = lowerTarget ? p : q;
        double logTarget = Math.Log(target);
        double lo = 0.0;
        double x = guess > lo && guess < hi ? guess : Bisect(lo, hi);
        for (int iteration = 0; iteration < MaxIterations; iteration++)
        {
            f.Evaluate(x, out double lower, out double upper, out double density);
            double tail = lowerTarget ? lower : upper;
            if (tail == target) return x;
            bool belowRoot = lowerTarget ? tail < target : tail > target;
            if (belowRoot) lo = x; else hi = x;
            double g = Math.Log(tail) - logTarget;
            double next = lowerTarget
                ? x * Math.Exp(-g * tail / (x * density))
                : x + g * tail / density;
            // A step too small to change x means convergence; the bracket test below would misread it.
            if (next == x) return x;
            if (!(next > lo && next < hi)) next = Bisect(lo, hi);
            if (lowerTarget && lo == 0 && next < 1e-290)
            {
                // The quantile may lie below the smallest normal double (shape parameters near 0.01 put
                // whole percentiles there); then 0 is the nearest representable answer.
                f.Evaluate(SmallestNormal, out double atFloor, out _, out _);
                if (atFloor >= target) return 0.0;
                lo = SmallestNormal;
                next = Bisect(lo, hi);
            }
            if (Math.Abs(next - x) <= relativeTolerance * next) return next;
            x = next;
        }
        return x;
    }

    // Geometric bisection when the bracket spans orders of magnitude: tail quantiles can be 1e-200.
    private static double Bisect(double lo, double hi)
    {
        if (double.IsPositiveInfinity(hi)) return lo > 0 ? 4.0 * lo : 1.0;
        if (hi > 4.0 * lo) return Math.Sqrt(Math.Max(lo, SmallestNormal)) * Math.Sqrt(hi);
        return 0.5 * (lo + hi);
    }
}
