namespace DesignCompiler.Rendering.Simulation;

/// <summary>What the comparison report templates see: both designs, the shared settings, and per scenario the paired figures.</summary>
public sealed record ComparisonModel(
    DesignSideModel A,
    DesignSideModel B,
    string Seed,
    string ToolVersion,
    string Replications,
    string Finished,
    bool CutShort,
    string CutShortText,
    string Margin,
    string MarginRule,
    IReadOnlyList<string> Notes,
    IReadOnlyList<ComparedScenarioModel> Scenarios);

/// <summary>One of the two designs, as the header names it.</summary>
public sealed record DesignSideModel(
    string Trial,
    string DesignHash,
    string DesignHashShort,
    string Policy,
    string OutcomeFamily,
    string ValueUnit,
    int Rounds,
    int PlotsPerRound,
    IReadOnlyList<ArmInfoModel> Arms);

public sealed record ComparedScenarioModel(
    string Name,
    string WorldTextA,
    string WorldTextB,
    bool AllArmsEqual,
    string Replications,
    IReadOnlyList<FigureModel> Figures,
    IReadOnlyList<string> Verdicts,
    IReadOnlyList<ChartModel> Charts,
    ScenarioModel DetailA,
    ScenarioModel DetailB);

/// <summary>
/// One figure for A and B and the paired difference B − A with its 95 % interval. <see cref="Verdict"/>
/// is a plain sentence when the interval excludes zero, and empty otherwise.
/// </summary>
public sealed record FigureModel(
    string Key,
    string Label,
    EstimateModel A,
    EstimateModel B,
    EstimateModel Difference,
    string Lower,
    string Upper,
    string DifferenceText,
    string IntervalText,
    bool Clear,
    string Verdict);
