namespace DesignCompiler.Numerics;

/// <summary>
/// Where a tail of Beta(a, b) with a, b ≥ <see cref="SmallestShape"/> surely holds no more than a given mass,
/// found from the density alone.
/// </summary>
/// <remarks>
/// <para>
/// With a, b ≥ 1 the log-density ψ = (a−1) ln x + (b−1) ln(1−x) − ln B(a,b) is concave, so it lies below its
/// tangent: f(t) ≤ f(x)·e^{ψ'(x)(t−x)}. Integrating that exponential over the tail beyond a point x outside
/// the mode bounds the tail by f(x)/|ψ'(x)|. Solving f(x)/|ψ'(x)| = mass takes logarithms only, where a quantile search evaluates the
/// incomplete beta function, a continued fraction, at every step; the support search of the P(best)
/// quadrature was a sixth of its time.
/// </para>
/// <para>
/// The bound is tight where the tail is nearly exponential (far from the mode, the true mass is within a few
/// per cent of it) and errs on the safe side elsewhere: where the density behaves like x^(a−1) near 0 it is
/// a/(a−1) times the mass, 3 at most for shapes of 1.5 and more, so the point lies further out than the
/// quantile, never inside it.
/// </para>
/// </remarks>
internal static class BetaTailBound
{
    /// <summary>Both shapes at least this: the bound is then within a factor 3 of the mass it promises.</summary>
    internal const double SmallestShape = 1.5;

    // Newton stops when the bound is within 1 % of the mass: ln(bound/mass) ≤ 0.01.
    private const double LogTolerance = 0.01;
    private const int MaxIterations = 60;

    /// <summary>
    /// The distance t from the lower end (x = t) or from the upper end (x = 1 − t) at which the tail beyond
    /// holds at most about <paramref name="mass"/> (1 % over at worst). The distance is exact in relative
    /// terms, however close to 1 the point is.
    /// </summary>
    internal static double Distance(in BetaKernel kernel, bool upper, double mass)
    {
        // In the coordinate t the density is t^(p) (1−t)^(r) up to a constant.
        double p = (upper ? kernel.B : kernel.A) - 1.0, r = (upper ? kernel.A : kernel.B) - 1.0;
        double modeDistance = p / (p + r);
        double logMass = RepeatableMath.Log(mass);
        double below = 0.0, above = modeDistance;
        double t = IncompleteBeta.InitialGuess(p + 1.0, r + 1.0, mass, 1.0 - mass);
        if (!(t > below && t < above)) t = 0.5 * modeDistance;
        for (int iteration = 0; iteration < MaxIterations; iteration++)
        {
            double other = 1.0 - t;
            // ψ'(t) > 0 and ψ''(t) < 0 below the mode; h = ln(f/ψ') − ln mass rises with t.
            double slope = p / t - r / other;
            double curvature = -p / (t * t) - r / (other * other);
            double logDensity = upper ? kernel.LogDensity(other, t) : kernel.LogDensity(t, other);
            double h = logDensity - RepeatableMath.Log(slope) - logMass;
            if (Math.Abs(h) <= LogTolerance) return t;
            if (h > 0) above = t; else below = t;
            // Newton in ln t: near 0 the bound is a power of t, so h is nearly linear there.
            double rate = t * (slope - curvature / slope);
            double next = t * RepeatableMath.Exp(-h / rate);
            if (!(next > below && next < above))
                next = below > 0 && above > 4.0 * below ? Math.Sqrt(below) * Math.Sqrt(above) : below > 0 ? 0.5 * (below + above) : 0.25 * above;
            if (next == t) return t;
            t = next;
        }
        // Not settled (no input seen does this): the side of the bracket further out is safe.
        return below;
    }
}
