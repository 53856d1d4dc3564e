namespace DesignCompiler.Rendering.Status;

/// <summary>
/// What the status templates see: the trial's standing as text, exact (for JSON) and rounded
/// (for people), and the chart already laid out. Templates only place these strings.
/// </summary>
public sealed record StatusModel(
    string Trial,
    string DesignHash,
    string DesignHashShort,
    string HeadHashShort,
    string ToolVersion,
    int Rounds,
    int RoundsIssued,
    int RoundsRecorded,
    int PlotsIssued,
    int PlotsRecorded,
    int PlotsMissing,
    string OutcomeName,
    string OutcomeUnit,
    string OutcomeFamily,
    string ValueUnit,
    string Goal,
    IReadOnlyList<StatusArmModel> Arms,
    IReadOnlyList<StatusRuleModel> Rules,
    IReadOnlyList<StatusStockModel> Stocks,
    IReadOnlyList<StatusRoundModel> History,
    IReadOnlyList<StatusAmendmentModel> Amendments,
    string NextKind,
    string NextRound,
    string NextText,
    StatusChartModel Chart);

public sealed record StatusArmModel(
    string Code,
    string Label,
    bool IsControl,
    string Status,
    int PlotsIssued,
    int PlotsRecorded,
    int PlotsMissing,
    string PosteriorMean,
    string PosteriorMeanText,
    string CredibleLower,
    string CredibleUpper,
    string CredibleText,
    string ProbabilityBest,
    string ProbabilityBestText,
    string ExpectedLoss,
    string ExpectedLossText);

public sealed record StatusRuleModel(string Kind, string Rule, bool InForce, bool Holds, IReadOnlyList<string> Arms, string Finding);

public sealed record StatusStockModel(string Arm, int Stock, int Used, int Left);

/// <summary>P(best) of every arm after a number of recorded rounds (0: the prior), exact and rounded, in design order.</summary>
public sealed record StatusRoundModel(int RoundsRecorded, string Label, IReadOnlyList<string> ProbabilityBest, IReadOnlyList<string> ProbabilityBestText);

public sealed record StatusAmendmentModel(string Entry, string At, string User, string OldHashShort, string NewHashShort, string Reason);

/// <summary>
/// An SVG line chart of P(best) by round, laid out for black-and-white print: arms differ by
/// dash pattern and marker shape and are named at the end of their lines, never by colour alone.
/// Every coordinate is ready text; the template only places it.
/// </summary>
public sealed record StatusChartModel(
    int Width,
    int Height,
    string FrameX,
    string FrameY,
    string FrameWidth,
    string FrameHeight,
    IReadOnlyList<ChartLineModel> Grid,
    IReadOnlyList<ChartLineModel> Ticks,
    IReadOnlyList<ChartLabelModel> Labels,
    IReadOnlyList<ChartSeriesModel> Series);

/// <summary>A line from (X1, Y1) to (X2, Y2) with its label at (LabelX, LabelY), anchored start, middle or end.</summary>
public sealed record ChartLineModel(string X1, string Y1, string X2, string Y2, string LabelX, string LabelY, string Anchor, string Label);

public sealed record ChartLabelModel(string X, string Y, string Anchor, string Text);

public sealed record ChartSeriesModel(
    string Code, string Points, string Dash, IReadOnlyList<ChartMarkerModel> Markers, ChartLabelModel EndLabel,
    ChartMarkerModel LegendMarker, ChartLineModel LegendLine);

/// <summary>One marker: an SVG path and its fill (white with a black outline, or black).</summary>
public sealed record ChartMarkerModel(string Path, string Fill);
