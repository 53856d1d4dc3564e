using DesignCompiler.Simulation.Accumulators;

namespace DesignCompiler.Simulation.Comparisons;

/// <summary>Exact summaries of a comparison: each design's own, and the paired differences B − A, per compared scenario.</summary>
public sealed record ComparisonResult(
    SimulationSetup A,
    SimulationSetup B,
    IReadOnlyList<ScenarioAccumulator> SummariesA,
    IReadOnlyList<ScenarioAccumulator> SummariesB,
    IReadOnlyList<PairedAccumulator> Differences,
    IReadOnlyList<string> Notes,
    bool CutShort);
