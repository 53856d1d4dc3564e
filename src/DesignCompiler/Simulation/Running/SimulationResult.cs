using DesignCompiler.Simulation.Accumulators;

namespace DesignCompiler.Simulation.Running;

/// <summary>
/// The exact summaries of a simulation (or of one shard of it), one per scenario in
/// <see cref="SimulationSetup.Scenarios"/> order. <see cref="CutShort"/> says it was stopped
/// before every replication ran. <see cref="Twin"/> holds the equal-allocation twin's run when
/// one was asked for.
/// </summary>
public sealed record SimulationResult(SimulationSetup Setup, Shard Shard, IReadOnlyList<ScenarioAccumulator> Scenarios, bool CutShort)
{
    public TwinResult? Twin { get; init; }
}
