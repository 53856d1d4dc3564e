namespace DesignCompiler.Numerics;

/// <summary>
/// Knobs of the P(best) quadrature. The defaults, panels of six standard deviations (1.5 times the
/// marginals' four) checked to 1e-12, keep every probability within about 2e-12 of a converged reference
/// on simulated trial states, far inside what a plot count can show; tests and convergence studies tighten
/// them to produce a reference.
/// </summary>
/// <param name="WidthScale">multiplies every panel width the marginals propose.</param>
/// <param name="PanelTolerance">a panel is bisected while its derivative check misses by more than this.</param>
internal readonly record struct QuadratureSettings(double WidthScale, double PanelTolerance)
{
    internal static QuadratureSettings Default => new(1.5, 1e-12);
}
