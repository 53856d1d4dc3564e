using DesignCompiler.Simulation.Accumulators;

namespace DesignCompiler.Simulation.Running;

/// <summary>
/// The design's equal-allocation twin, simulated beside it on the same random numbers: its own
/// exact summaries per scenario and the paired differences twin − design. The twin has the
/// design's plots, blocks, rounds, limits and stop and drop rules; only the policy is 'equal'.
/// </summary>
public sealed record TwinResult(SimulationSetup Setup, IReadOnlyList<ScenarioAccumulator> Scenarios, IReadOnlyList<PairedAccumulator> Differences);
