using DesignCompiler.Planning;

namespace DesignCompiler.Ledger;

/// <summary>Who wrote an entry, when, with which trialc, and under which design text.</summary>
public sealed record LedgerEntryInfo(long Seq, string Kind, int Round, string DesignHash, string User, string At, string ToolVersion, string Hash)
{
    /// <summary>The UTC date of the entry (yyyy-MM-dd), as printed on sheets.</summary>
    public string Date => At.Length >= 10 ? At[..10] : At;

    public string Describe() => FormattableString.Invariant($"entry {Seq}, {At} by {User}");
}

/// <summary>One plot's recorded result: a value, or missing with a reason ('' when none was given).</summary>
public sealed record RecordedOutcome(int Ordinal, string PlotId, string Arm, double? Value, string? ValueText, string? MissingReason, string Notes, int Line);

/// <summary>The results of one round, read from one returned sheet.</summary>
public sealed record RoundRecording(LedgerEntryInfo Entry, string FileName, string FileSha256, IReadOnlyList<RecordedOutcome> Outcomes);

/// <summary>An issued round: its stored plan and plots, and its results once recorded.</summary>
public sealed record IssuedRound(
    int Round, LedgerEntryInfo Entry, string PlanJson, string PlanData, IReadOnlyList<PlotAssignment> Plots, RoundRecording? Recording)
{
    public bool IsRecorded => Recording is not null;

    /// <summary>The stored plan, exactly as it was issued (the planner is not run again).</summary>
    public RoundPlan ReadPlan() => LedgerPlanData.Read(PlanData, Plots);
}

/// <summary>A recorded change of the design text during the trial.</summary>
public sealed record Amendment(LedgerEntryInfo Entry, string OldHash, string NewHash, string Reason);

/// <summary>
/// Everything a ledger holds, after its chain was checked: immutable, in round order. Commands
/// read it to replay the trial; they never read the tables themselves.
/// </summary>
public sealed class LedgerHistory
{
    private readonly IReadOnlyDictionary<string, string> _designs;

    internal LedgerHistory(IReadOnlyList<LedgerEntryInfo> entries, IReadOnlyList<IssuedRound> rounds, IReadOnlyList<Amendment> amendments,
        IReadOnlyDictionary<string, string> designs, string headHash)
    {
        Entries = entries;
        Rounds = rounds;
        Amendments = amendments;
        _designs = designs;
        HeadHash = headHash;
    }

    public IReadOnlyList<LedgerEntryInfo> Entries { get; }
    public IReadOnlyList<IssuedRound> Rounds { get; }
    public IReadOnlyList<Amendment> Amendments { get; }
    public string HeadHash { get; }

    public IssuedRound? LastRound => Rounds.Count == 0 ? null : Rounds[^1];
    public int RecordedRounds => Rounds.Count(r => r.IsRecorded);

    /// <summary>The design text the trial now runs under: that of the latest entry (null for an empty ledger).</summary>
    public string? CurrentDesignHash => Entries.Count == 0 ? null : Entries[^1].DesignHash;

    /// <summary>The entry that set the current design text: the latest amendment, else the first issue.</summary>
    public LedgerEntryInfo? CurrentDesignEntry =>
        Entries.LastOrDefault(e => e.Kind == EntryKinds.Amend) ?? Entries.FirstOrDefault(e => e.Kind == EntryKinds.Issue);

    public string? DesignText(string hash) => _designs.TryGetValue(hash, out var text) ? text : null;

    public RoundRecording? RecordingOfFile(string sha256) =>
        Rounds.Select(r => r.Recording).FirstOrDefault(r => r is not null && r.FileSha256 == sha256);

    internal static LedgerHistory From(LedgerRows rows)
    {
        var entries = rows.Entries.Select(e => new LedgerEntryInfo(e.Seq, e.Kind, e.Round, e.DesignHash, e.User, e.At, e.ToolVersion, e.Hash)).ToList();
        var bySeq = entries.ToDictionary(e => e.Seq);
        var plotsByRound = rows.Plots.ToLookup(p => p.Round);
        var outcomesBySeq = rows.Outcomes.ToLookup(o => o.EntrySeq);
        var recordByRound = rows.Records.ToDictionary(r => r.Round);

        var rounds = rows.Rounds.Select(r =>
        {
            var plots = plotsByRound[r.Round].OrderBy(p => p.Ordinal)
                .Select(p => new PlotAssignment(p.Block, p.BlockIndex, p.PlotIndex, p.PlotId, p.Row, p.Column, p.ArmIndex, p.Arm)).ToList();
            RoundRecording? recording = null;
            if (recordByRound.TryGetValue(r.Round, out var record))
                recording = new RoundRecording(bySeq[record.EntrySeq], record.FileName, record.FileSha256,
                    outcomesBySeq[record.EntrySeq].OrderBy(o => o.Ordinal)
                        .Select(o => new RecordedOutcome(o.Ordinal, o.PlotId, o.Arm, o.Value, o.ValueText, o.MissingReason, o.Notes, o.Line)).ToList());
            return new IssuedRound(r.Round, bySeq[r.EntrySeq], r.PlanJson, r.PlanData, plots, recording);
        }).ToList();

        var amendments = rows.Amendments.Select(a => new Amendment(bySeq[a.EntrySeq], a.OldHash, a.NewHash, a.Reason)).ToList();
        var head = entries.Count == 0 ? LedgerSchema.GenesisHash : entries[^1].Hash;
        return new LedgerHistory(entries, rounds, amendments, rows.Designs, head);
    }
}
