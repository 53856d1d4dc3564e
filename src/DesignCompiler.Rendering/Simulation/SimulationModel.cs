namespace DesignCompiler.Rendering.Simulation;

/// <summary>
/// What the simulation report templates see, and nothing else: every number comes as exact
/// text for JSON (<c>null</c> when undefined) and as rounded text for people. Templates never compute.
/// </summary>
public sealed record SimulationModel(
    string Trial,
    string DesignHash,
    string DesignHashShort,
    string Seed,
    string ToolVersion,
    string Policy,
    string OutcomeName,
    string OutcomeUnit,
    string OutcomeFamily,
    string ValueUnit,
    int Rounds,
    int PlotsPerRound,
    string Replications,
    string Finished,
    bool CutShort,
    string CutShortText,
    string Margin,
    string MarginRule,
    IReadOnlyList<ArmInfoModel> Arms,
    IReadOnlyList<ScenarioModel> Scenarios,
    bool HasEqualTwin,
    IReadOnlyList<TwinScenarioModel> EqualTwin);

/// <summary>
/// The design against its equal-allocation twin in one scenario, on the same random numbers:
/// <see cref="FigureModel.A"/> is the design, <see cref="FigureModel.B"/> the twin, differences twin − design.
/// </summary>
public sealed record TwinScenarioModel(
    string Name,
    bool AllArmsEqual,
    IReadOnlyList<FigureModel> Figures,
    IReadOnlyList<string> Verdicts,
    IReadOnlyList<TwinBiasModel> Bias,
    IReadOnlyList<ChartModel> Charts);

/// <summary>An arm's naive-mean bias under the design and under equal allocation.</summary>
public sealed record TwinBiasModel(string Code, EstimateModel Design, EstimateModel Equal);

public sealed record ArmInfoModel(string Code, string Label, bool IsControl);

/// <summary>A figure with its Monte Carlo standard error: exact (<see cref="Mean"/>, <see cref="Se"/>) and for people (<see cref="Text"/>, "1.342 ± 0.005").</summary>
public sealed record EstimateModel(string Mean, string Se, string Text);

public sealed record ScenarioModel(
    string Name,
    bool FromPrior,
    bool AllArmsEqual,
    string WorldText,
    string Replications,
    EstimateModel Regret,
    EstimateModel NonBestPlots,
    EstimateModel PlotsSown,
    EstimateModel RoundsRun,
    EstimateModel CorrectSelection,
    EstimateModel WithinMargin,
    EstimateModel DeclaredWinner,
    string DeclaredWinnerLabel,
    string RanAllRounds,
    string Infeasible,
    string InfeasibleMessage,
    IReadOnlyList<StopRoundModel> StopRounds,
    IReadOnlyList<RoundModel> ByRound,
    IReadOnlyList<ArmFigureModel> ArmFigures,
    bool HasCalibration,
    IReadOnlyList<CalibrationModel> Calibration,
    IReadOnlyList<ChartModel> Charts);

public sealed record StopRoundModel(int Round, string Trials, string Share, string ShareText);

public sealed record RoundModel(int Round, EstimateModel CumulativeRegret, EstimateModel CorrectSelection, EstimateModel WithinMargin);

public sealed record ArmFigureModel(
    string Code,
    string Label,
    string TrueMean,
    string TrueMeanText,
    string TrueValue,
    bool IsBest,
    EstimateModel Bias,
    string BiasTrials,
    string PlotsTotalMean,
    string PlotsTotalMeanText,
    string PlotsTotal95,
    IReadOnlyList<PlotQuantilesModel> ByRound);

public sealed record PlotQuantilesModel(int Round, string Mean, string MeanText, string P5, string P50, string P95);

public sealed record CalibrationModel(
    string From,
    string To,
    string Pairs,
    string MeanProbability,
    string Frequency,
    string Se,
    string RangeText,
    string MeanProbabilityText,
    string FrequencyText,
    string SeText,
    string Agreement);
