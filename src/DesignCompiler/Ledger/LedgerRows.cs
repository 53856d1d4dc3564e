namespace DesignCompiler.Ledger;

/// <summary>The rows of the ledger's tables exactly as stored; the chain is checked on these, before anything is interpreted.</summary>
internal sealed record LedgerRows(
    IReadOnlyDictionary<string, string> Meta,
    IReadOnlyDictionary<string, string> Designs,
    IReadOnlyList<EntryRow> Entries,
    IReadOnlyList<RoundRow> Rounds,
    IReadOnlyList<PlotRow> Plots,
    IReadOnlyList<RecordRow> Records,
    IReadOnlyList<OutcomeRow> Outcomes,
    IReadOnlyList<AmendmentRow> Amendments);

internal sealed record EntryRow(long Seq, string Kind, int Round, string DesignHash, string User, string At, string ToolVersion, string PrevHash, string Hash);

internal sealed record RoundRow(int Round, long EntrySeq, string PlanJson, string PlanData);

internal sealed record PlotRow(int Round, int Ordinal, string Block, int BlockIndex, int PlotIndex, string PlotId, int? Row, int? Column, string Arm, int ArmIndex);

internal sealed record RecordRow(long EntrySeq, int Round, string FileName, string FileSha256);

internal sealed record OutcomeRow(
    int Round, int Ordinal, string PlotId, string Arm, double? Value, string? ValueText, string? MissingReason, string Notes, int Line, long EntrySeq);

internal sealed record AmendmentRow(long EntrySeq, string OldHash, string NewHash, string Reason);

/// <summary>The kinds of entry, as stored in <c>entries.kind</c>.</summary>
public static class EntryKinds
{
    public const string Issue = "issue";
    public const string Record = "record";
    public const string Amend = "amend";
}
