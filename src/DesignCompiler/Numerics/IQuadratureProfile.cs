namespace DesignCompiler.Numerics;

/// <summary>
/// What a built-in marginal can tell the P(best) quadrature beyond <see cref="IMarginal"/>: where its mass
/// lives, how wide a Gauss–Legendre panel its density tolerates, and its density and tails in one call.
/// Foreign marginals do without it through <see cref="MarginalProfile"/>.
/// </summary>
internal interface IQuadratureProfile
{
    /// <summary>The x with UpperTail(x) = q, accurate for tiny q (Quantile(1 − q) would round q away).</summary>
    double UpperQuantile(double q);

    /// <summary>
    /// Points beyond which each tail holds about <paramref name="tailMass"/>: a few per cent over is fine, and a
    /// bound that places them further out (holding less) is too.
    /// The distances lo − LowerBound and UpperBound − hi are also given, exact even where lo or hi
    /// themselves round onto the bound (+∞ for an infinite bound).
    /// </summary>
    void Support(double tailMass, out double lo, out double hi, out double aboveLowerBound, out double belowUpperBound);

    /// <summary>
    /// Cheap bounds, from a closed form, that surely contain what <see cref="Support"/> returns (with room for
    /// its few per cent); false when there are none. The quadrature's screen uses them.
    /// </summary>
    bool WideSupport(double tailMass, out double lo, out double hi)
    {
        lo = double.NegativeInfinity;
        hi = double.PositiveInfinity;
        return false;
    }

    /// <summary>
    /// The widest panel on which a 20-point Gauss–Legendre rule resolves this density: [x, x + w] when
    /// <paramref name="forward"/>, otherwise [x − w, x].
    /// </summary>
    double PanelWidth(double x, bool forward);

    void Evaluate(double x, out double density, out double cdf, out double upperTail);

    /// <summary>
    /// <see cref="Evaluate"/> at every point of <paramref name="x"/>, each result bit for bit the one it gives;
    /// the quadrature asks for a whole panel's nodes at once, so that an implementation can share work
    /// between them.
    /// </summary>
    void EvaluateMany(ReadOnlySpan<double> x, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        for (int j = 0; j < x.Length; j++) Evaluate(x[j], out density[j], out cdf[j], out upperTail[j]);
    }
}

/// <summary>
/// A marginal with a finite bound that can be evaluated at a given distance from it without rounding that
/// distance. Next to the bound of [0, 1], x = 1 − d cannot hold d &lt; 1e-16, yet a density like (1−x)^(−½)
/// keeps a mass of order 1e-8 there; likewise 0.2 + d for a shifted density singular at 0.2.
/// </summary>
internal interface IBoundedProfile
{
    void EvaluateNearBound(bool upper, double distance, out double density, out double cdf, out double upperTail);

    /// <summary><see cref="EvaluateNearBound"/> at every distance, each result bit for bit the one it gives.</summary>
    void EvaluateNearBoundMany(bool upper, ReadOnlySpan<double> distance, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        for (int j = 0; j < distance.Length; j++) EvaluateNearBound(upper, distance[j], out density[j], out cdf[j], out upperTail[j]);
    }

    /// <summary>Panel width at <paramref name="distance"/> from the bound, for a panel moving away from it or towards it.</summary>
    double PanelWidthNearBound(bool upper, double distance, bool awayFromBound);
}
