namespace DesignCompiler.Numerics;

/// <summary>
/// The quadrature's view of any <see cref="IMarginal"/>: the built-in marginals answer through
/// <see cref="IQuadratureProfile"/> and <see cref="IBoundedProfile"/>; any other implementation gets generic
/// answers from its public members.
/// </summary>
internal static class MarginalProfile
{
    internal static double UpperQuantile(IMarginal m, double q) =>
        m is IQuadratureProfile p ? p.UpperQuantile(q) : m.Quantile(1.0 - q);

    internal static void Support(
        IMarginal m, double tailMass, out double lo, out double hi, out double aboveLowerBound, out double belowUpperBound)
    {
        if (m is IQuadratureProfile p)
        {
            p.Support(tailMass, out lo, out hi, out aboveLowerBound, out belowUpperBound);
            return;
        }
        lo = Finite(m.Quantile(tailMass), m.LowerBound, m, -1);
        hi = Finite(m.Quantile(1.0 - tailMass), m.UpperBound, m, +1);
        aboveLowerBound = lo - m.LowerBound;
        belowUpperBound = m.UpperBound - hi;
    }

    /// <summary>Bounds that surely contain the support <see cref="Support"/> finds, when a closed form gives them.</summary>
    internal static bool WideSupport(IMarginal m, double tailMass, out double lo, out double hi)
    {
        if (m is IQuadratureProfile p) return p.WideSupport(tailMass, out lo, out hi);
        lo = double.NegativeInfinity;
        hi = double.PositiveInfinity;
        return false;
    }

    internal static double PanelWidth(IMarginal m, double x, bool forward)
    {
        if (m is IQuadratureProfile p) return p.PanelWidth(x, forward);
        double sd = m.StdDev;
        if (double.IsFinite(sd) && sd > 0) return PanelRules.StdDevMultiple * sd;
        // Without a variance the interquartile range is the natural width; heavy tails also get the
        // adaptive bisection, which is what keeps foreign marginals correct, if not fast.
        return PanelRules.StdDevMultiple * 0.5 * (m.Quantile(0.75) - m.Quantile(0.25));
    }

    internal static void Evaluate(IMarginal m, double x, out double density, out double cdf, out double upperTail)
    {
        if (m is IQuadratureProfile p)
        {
            p.Evaluate(x, out density, out cdf, out upperTail);
            return;
        }
        density = m.Density(x);
        cdf = m.Cdf(x);
        upperTail = m.UpperTail(x);
    }

    internal static void EvaluateMany(IMarginal m, ReadOnlySpan<double> x, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        if (m is IQuadratureProfile p)
        {
            p.EvaluateMany(x, density, cdf, upperTail);
            return;
        }
        for (int j = 0; j < x.Length; j++) Evaluate(m, x[j], out density[j], out cdf[j], out upperTail[j]);
    }

    internal static void EvaluateNearBoundMany(
        IMarginal m, bool upper, ReadOnlySpan<double> distance, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        if (m is IBoundedProfile p)
        {
            p.EvaluateNearBoundMany(upper, distance, density, cdf, upperTail);
            return;
        }
        // The positions EvaluateNearBound would form, evaluated together: a profile's EvaluateMany gives each the
        // bits Evaluate would, and shares its work between them (a gamma arm's lower half is swept this way).
        Span<double> x = distance.Length <= 64 ? stackalloc double[distance.Length] : new double[distance.Length];
        for (int j = 0; j < distance.Length; j++) x[j] = upper ? m.UpperBound - distance[j] : m.LowerBound + distance[j];
        EvaluateMany(m, x, density, cdf, upperTail);
    }

    internal static void EvaluateNearBound(
        IMarginal m, bool upper, double distance, out double density, out double cdf, out double upperTail)
    {
        if (m is IBoundedProfile p) p.EvaluateNearBound(upper, distance, out density, out cdf, out upperTail);
        else Evaluate(m, upper ? m.UpperBound - distance : m.LowerBound + distance, out density, out cdf, out upperTail);
    }

    internal static double PanelWidthNearBound(IMarginal m, bool upper, double distance, bool awayFromBound) =>
        m is IBoundedProfile p
            ? p.PanelWidthNearBound(upper, distance, awayFromBound)
            : PanelWidth(m, upper ? m.UpperBound - distance : m.LowerBound + distance, forward: upper != awayFromBound);

    private static double Finite(double quantile, double bound, IMarginal m, int side)
    {
        if (double.IsFinite(quantile)) return quantile;
        if (double.IsFinite(bound)) return bound;
        double guess = m.Mean + side * 50.0 * m.StdDev;
        if (double.IsFinite(guess)) return guess;
        throw new ArgumentException("A marginal without finite tail quantiles or a finite variance cannot be integrated.", nameof(m));
    }
}
