namespace DesignCompiler.Numerics;

/// <summary>
/// Knobs of the P(best) quadrature. The defaults meet the accuracy target with a wide margin; tests and
/// convergence studies tighten them to produce a reference.
/// </summary>
/// <param name="WidthScale">multiplies every panel width the marginals propose.</param>
/// <param name="PanelTolerance">a panel is bisected while its derivative check misses by more than this.</param>
internal readonly record struct QuadratureSettings(double WidthScale, double PanelTolerance)
{
    internal static QuadratureSettings Default => new(1.0, 1e-13);
}
