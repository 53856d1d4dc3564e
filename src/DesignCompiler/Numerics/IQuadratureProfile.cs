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

    /// <summary>Points beyond which each tail holds about <paramref name="tailMass"/>; a few per cent off is fine.</summary>
    void Support(double tailMass, out double lo, out double hi);

    /// <summary>
    /// The widest panel on which a 20-point Gauss–Legendre rule resolves this density: [x, x + w] when
    /// <paramref name="forward"/>, otherwise [x − w, x].
    /// </summary>
    double PanelWidth(double x, bool forward);

    void Evaluate(double x, out double density, out double cdf, out double upperTail);
}
