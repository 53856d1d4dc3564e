namespace DesignCompiler.Planning;

/// <summary>
/// Everything decided for one round, and everything a sheet or a reviewer needs to see
/// why: the posterior figures that drove the allocation, the counts per arm and block, and
/// the arm on every plot. Immutable; renderers only format it.
/// </summary>
public sealed record RoundPlan(
    string Trial,
    int Round,
    int Rounds,
    string DesignHash,
    ulong Seed,
    string Policy,
    string OutcomeName,
    string? OutcomeUnit,
    string OutcomeFamily,
    string? ValueUnit,
    IReadOnlyList<ArmPlan> Arms,
    IReadOnlyList<BlockPlan> Blocks,
    IReadOnlyList<PlotAssignment> Assignments,
    double ProbabilityBestErrorBound,
    int PlotsRecorded)
{
    public int Plots => Assignments.Count;
}

/// <summary>
/// One arm's line in the plan. Probabilities and expected loss compare the arms still in
/// the trial; <see cref="TargetShare"/> is the policy's share before rounding and limits.
/// </summary>
public sealed record ArmPlan(
    int Index,
    string Code,
    string Label,
    bool IsControl,
    ArmStatus Status,
    int Plots,
    double TargetShare,
    double ProbabilityBest,
    double PosteriorMean,
    double CredibleLower,
    double CredibleUpper,
    double ExpectedLoss,
    int PlotsRecorded);

public enum ArmStatus
{
    /// <summary>Sown this round (possibly on zero plots if the policy gives it none).</summary>
    InPlay,

    /// <summary>Outside its availability window this round.</summary>
    NotYetAvailable,

    /// <summary>Past its availability window.</summary>
    NoLongerAvailable,

    /// <summary>Its stock is used up or held back for later minimums.</summary>
    OutOfStock,

    /// <summary>Removed by a drop rule.</summary>
    Dropped,
}

/// <summary>A block's plots this round and how many go to each arm (in design order).</summary>
public sealed record BlockPlan(string Name, int Plots, int? Rows, int? Columns, IReadOnlyList<int> Counts);

/// <summary>The arm sown on one plot. Plot ids are stable across rounds.</summary>
public sealed record PlotAssignment(string Block, int BlockIndex, int PlotIndex, string PlotId, int? Row, int? Column, int Arm, string ArmCode);
