using DesignCompiler.Rendering.Charts;
using DesignCompiler.Rendering.Status;

namespace DesignCompiler.Rendering.Models;

/// <summary>
/// What a round's templates can see, and nothing else. Numbers come both as exact text
/// (for JSON and CSV) and as rounded text (for people); templates never compute. Charts come
/// laid out, as SVG coordinates in text. Every field is listed in docs/templates.md.
/// </summary>
public sealed record SheetModel(
    string Trial,
    int Round,
    int Rounds,
    string DesignHash,
    string DesignHashShort,
    string Seed,
    string ToolVersion,
    string Policy,
    string OutcomeName,
    string OutcomeUnit,
    string OutcomeFamily,
    string OutcomeValues,
    string ValueUnit,
    string DateIssued,
    int Plots,
    int PlotsRecorded,
    string ProbabilityBestErrorBound,
    string ProbabilityBestAccuracyText,
    string Caution,
    IReadOnlyList<ArmModel> Arms,
    IReadOnlyList<BlockModel> Blocks,
    IReadOnlyList<StatusRoundModel> History,
    LineChartModel? ProbabilityBestChart,
    DensityChartModel? DensityChart);

/// <summary>One arm: code, label, plots this round, and the posterior figures exact and rounded.</summary>
public sealed record ArmModel(
    string Code,
    string Label,
    bool IsControl,
    string Status,
    int Plots,
    int PlotsRecorded,
    string TargetShare,
    string TargetShareText,
    string ProbabilityBest,
    string ProbabilityBestText,
    string PosteriorMean,
    string PosteriorMeanText,
    string CredibleLower,
    string CredibleUpper,
    string CredibleText,
    string ExpectedLoss,
    string ExpectedLossText);

/// <summary>One block: its plots in order, its counts for every arm (zeros included), and its field map when it has a layout.</summary>
public sealed record BlockModel(
    string Name,
    int Plots,
    bool HasLayout,
    int Rows,
    int Columns,
    IReadOnlyList<CountModel> Counts,
    IReadOnlyList<PlotModel> PlotList,
    IReadOnlyList<MapRowModel> Map);

public sealed record CountModel(string Code, string Label, int Plots);

/// <summary>One plot: its stable id, its place in the layout (empty text when there is none) and its arm.</summary>
public sealed record PlotModel(string Block, string PlotId, int Number, string Row, string Column, string Arm, string Label);

public sealed record MapRowModel(int Row, IReadOnlyList<PlotModel> Cells);
