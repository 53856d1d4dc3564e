using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>
/// A world to simulate: a true mean per arm (in design order), or true values drawn from
/// the prior for each simulated trial. <see cref="NoiseSd"/> is the true plot-to-plot sd
/// of a normal outcome when the scenario states one. <see cref="Effects"/> holds the season,
/// block, missing-plot and dispersion departures of a robustness scenario.
/// </summary>
public sealed record ScenarioSpec(string Name, bool FromPrior, IReadOnlyList<double> TrueMeans, double? NoiseSd, TextSpan Span)
{
    public FieldEffects Effects { get; init; } = FieldEffects.None;
}
