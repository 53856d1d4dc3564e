namespace DesignCompiler.Binding;

public enum Goal
{
    Maximize,
    Minimize,
}

/// <summary>
/// How arms are ranked. Each arm's value is u = sign·price·θ − cost, with sign −1 when the
/// goal is to minimise; with no price written, price is 1 and costs must be absent, so
/// arms are ranked by their mean outcome alone.
/// </summary>
public sealed record Valuation(Goal Goal, double? Price, string? Currency)
{
    public double Sign => Goal == Goal.Maximize ? 1 : -1;

    public bool HasPrice => Price is not null;

    /// <summary>The factor from outcome units to value units.</summary>
    public double Scale => Sign * (Price ?? 1);
}
