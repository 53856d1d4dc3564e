namespace DesignCompiler.Simulation.Reports;

/// <summary>A simulation's report: what was simulated and the figures per scenario.</summary>
public sealed record SimulationReport(SimulationSetup Setup, IReadOnlyList<ScenarioReport> Scenarios, bool CutShort)
{
    /// <summary>Trials finished in the scenario that finished fewest (all of them unless cut short).</summary>
    public long Finished => Scenarios.Count == 0 ? 0 : Scenarios.Min(s => s.Replications);
}
