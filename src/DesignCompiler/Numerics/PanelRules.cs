namespace DesignCompiler.Numerics;

/// <summary>How wide a 20-point Gauss–Legendre panel may be for the shapes the built-in marginals take.</summary>
internal static class PanelRules
{
    /// <summary>Panel width in standard deviations for bell-shaped densities.</summary>
    internal const double StdDevMultiple = 4.0;

    /// <summary>
    /// Width, as a multiple of the distance to a branch point (x^(a−1) at 0, a pole of the t density),
    /// for a panel that moves away from it. With width 3d the nearest singularity sits outside the
    /// Bernstein ellipse of parameter 3, so the rule's error is about 3^−40.
    /// </summary>
    internal const double AwayFromSingularity = 3.0;

    /// <summary>The same for a panel that moves towards the singularity: its far end stays at d/4.</summary>
    internal const double TowardsSingularity = 0.75;

    /// <summary>Width for a density x^(a−1)(…) whose power is not an integer, so 0 is a branch point.</summary>
    internal static double NearBranchPoint(double distance, bool awayFromIt) =>
        (awayFromIt ? AwayFromSingularity : TowardsSingularity) * distance;

    internal static bool IsInteger(double v) => v == Math.Floor(v);
}
