using DesignCompiler.Rendering.Charts;

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
    string Seed,
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
    LineChartModel Chart);

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
