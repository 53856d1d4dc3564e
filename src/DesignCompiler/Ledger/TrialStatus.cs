using DesignCompiler.Planning;

namespace DesignCompiler.Ledger;

/// <summary>
/// Where a trial stands, from its ledger: per arm what was sown and recorded and what the
/// posterior says now, what each stop and drop rule says, stock used and left, P(best) after
/// each recorded round, and the next step. Figures only; the renderer formats them.
/// </summary>
public sealed record TrialStatus(
    string Trial,
    string DesignHash,
    int Rounds,
    int RoundsIssued,
    int RoundsRecorded,
    int PlotsIssued,
    int PlotsRecorded,
    int PlotsMissing,
    string OutcomeName,
    string? OutcomeUnit,
    string OutcomeFamily,
    string? ValueUnit,
    bool Minimize,
    IReadOnlyList<ArmStanding> Arms,
    IReadOnlyList<RuleStanding> Rules,
    IReadOnlyList<StockStanding> Stocks,
    IReadOnlyList<RoundPoint> History,
    IReadOnlyList<Amendment> Amendments,
    NextStep Next,
    string HeadHash,
    ulong Seed);

/// <summary>
/// One arm now. Mean and interval are of the arm's mean outcome; P(best) and expected loss
/// compare the arms still in the trial on value (net of cost when the design has a price).
/// <see cref="LastStatus"/> is the arm's status on the latest issued round.
/// </summary>
public sealed record ArmStanding(
    string Code,
    string Label,
    bool IsControl,
    bool Dropped,
    ArmStatus? LastStatus,
    int PlotsIssued,
    int PlotsRecorded,
    int PlotsMissing,
    double PosteriorMean,
    double CredibleLower,
    double CredibleUpper,
    double ProbabilityBest,
    double ExpectedLoss);

public enum RuleKind
{
    Stop,
    Drop,
}

/// <summary>What one rule says on the data recorded so far: whether it is in force yet, and for which arms it holds.</summary>
public sealed record RuleStanding(RuleKind Kind, string Rule, int AfterRound, bool InForce, bool Holds, IReadOnlyList<string> Arms, string Finding);

/// <summary>One arm's stock: plots' worth of seed or material, how much the issued rounds used, what is left.</summary>
public sealed record StockStanding(string Arm, int Stock, int Used, int Left);

/// <summary>P(best) per arm (design order) after <see cref="RoundsRecorded"/> rounds' results; 0 is the prior.</summary>
public sealed record RoundPoint(int RoundsRecorded, IReadOnlyList<double> ProbabilityBest);

public enum NextStepKind
{
    /// <summary>The next round can be compiled.</summary>
    CompileNext,

    /// <summary>The latest issued round has no results yet.</summary>
    AwaitResults,

    /// <summary>A stop rule holds: no further round is issued.</summary>
    Stopped,

    /// <summary>Every round is issued and recorded.</summary>
    Complete,

    /// <summary>The next round cannot be planned (its limits cannot hold).</summary>
    Blocked,
}

public sealed record NextStep(NextStepKind Kind, int Round, string Text);
