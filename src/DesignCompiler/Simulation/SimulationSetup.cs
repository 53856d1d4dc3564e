namespace DesignCompiler.Simulation;

/// <summary>
/// Everything a simulation report says about what was simulated, apart from the results:
/// the design's identity, the settings and the scenarios. A partial summary file carries it,
/// so merged shards give the same report without the design file.
/// </summary>
public sealed record SimulationSetup(
    string Trial,
    string DesignHash,
    ulong Seed,
    string Policy,
    string OutcomeName,
    string? OutcomeUnit,
    string OutcomeFamily,
    string? ValueUnit,
    int Rounds,
    int PlotsPerRound,
    long Replications,
    double Margin,
    string MarginRule,
    IReadOnlyList<ArmInfo> Arms,
    IReadOnlyList<ScenarioInfo> Scenarios);

public sealed record ArmInfo(string Code, string Label, bool IsControl);

/// <summary>
/// One simulated world. For a scenario with fixed values, <see cref="TrueMeans"/> are the arms'
/// true mean outcomes, <see cref="Values"/> the same in ranking units (scale·θ − cost) and
/// <see cref="NoiseSd"/> the plot-to-plot sd used for normal outcomes; all three are null for
/// <c>from prior</c>, where each replication draws its own. <see cref="KeyName"/> is the name
/// the random streams are keyed on (the scenario's own, or design A's in a comparison).
/// </summary>
public sealed record ScenarioInfo(
    string Name,
    string KeyName,
    bool FromPrior,
    IReadOnlyList<double>? TrueMeans,
    IReadOnlyList<double>? Values,
    IReadOnlyList<double>? NoiseSd)
{
    /// <summary>Every arm has the same true value, so any declared winner is a false positive.</summary>
    public bool AllArmsEqual => Values is { Count: > 0 } v && v.All(x => x == v[0]);
}
