namespace DesignCompiler.Simulation.Reports;

/// <summary>
/// A simulation's report: what was simulated and the figures per scenario; with
/// <see cref="EqualTwin"/>, the equal-allocation twin's figures beside the design's in every
/// scenario (A = the design, B = the twin, differences twin − design).
/// </summary>
public sealed record SimulationReport(SimulationSetup Setup, IReadOnlyList<ScenarioReport> Scenarios, bool CutShort)
{
    public IReadOnlyList<Comparisons.ComparedScenario>? EqualTwin { get; init; }

    /// <summary>Trials finished in the scenario that finished fewest (all of them unless cut short).</summary>
    public long Finished => Scenarios.Count == 0 ? 0 : Scenarios.Min(s => s.Replications);
}
