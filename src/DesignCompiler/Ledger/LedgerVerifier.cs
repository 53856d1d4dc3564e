using DesignCompiler.Binding;

namespace DesignCompiler.Ledger;

/// <summary>
/// Walks the hash chain from the first entry: each entry must follow the one before (its
/// <c>prev_hash</c> is that entry's hash), its content must hash to its stored hash, the last
/// hash and the count must match the file's head in <c>meta</c> (so a removed last entry shows),
/// every detail row must belong to an entry of the right kind, and every stored design text must
/// hash to its key. The first failure is reported, naming the entry.
/// </summary>
internal static class LedgerVerifier
{
    public static LedgerCheck Check(LedgerRows rows)
    {
        var previous = LedgerSchema.GenesisHash;
        var expectedSeq = 1L;
        foreach (var entry in rows.Entries)
        {
            if (entry.Seq != expectedSeq)
                return Broken(rows, entry.Seq, entry.Seq > expectedSeq
                    ? FormattableString.Invariant($"entry {expectedSeq} is missing: the entries jump from {expectedSeq - 1} to {entry.Seq}")
                    : FormattableString.Invariant($"entry {entry.Seq} is out of order"));
            if (entry.PrevHash != previous)
                return Broken(rows, entry.Seq, $"{Describe(entry)} does not follow the entry before it: an entry before it was removed, changed or reordered");
            var hash = EntryText.Hash(previous, EntryText.Canonical(entry, rows));
            if (hash != entry.Hash)
                return Broken(rows, entry.Seq, $"{Describe(entry)} no longer matches its hash: {Contents(entry)} changed");
            previous = hash;
            expectedSeq++;
        }

        var count = rows.Entries.Count;
        if (!rows.Meta.TryGetValue("entry_count", out var storedCount) || !rows.Meta.TryGetValue("head_hash", out var storedHead))
            return Broken(rows, null, "the ledger's head (entry count and last hash) is gone");
        if (storedCount != count.ToString(System.Globalization.CultureInfo.InvariantCulture) || storedHead != previous)
            return Broken(rows, count + 1L, FormattableString.Invariant(
                $"the ledger's head records {storedCount} entries ending in {Short(storedHead)}, but {count} entries ending in {Short(previous)} are left: entries after {count} were removed"));

        if (Orphan(rows) is { } orphan) return Broken(rows, null, orphan);
        foreach (var entry in rows.Entries)
        {
            if (!rows.Designs.TryGetValue(entry.DesignHash, out var text))
                return Broken(rows, entry.Seq, $"{Describe(entry)}: its design text {Short(entry.DesignHash)} is gone");
            if (DesignHash.Of(text) != entry.DesignHash)
                return Broken(rows, entry.Seq, $"{Describe(entry)}: the stored design text {Short(entry.DesignHash)} was edited");
        }
        return new LedgerCheck(true, null, null, count, previous);
    }

    /// <summary>A detail row whose entry does not exist or is of another kind: added outside trialc, since no entry's hash covers it.</summary>
    private static string? Orphan(LedgerRows rows)
    {
        var kinds = rows.Entries.ToDictionary(e => e.Seq, e => e.Kind);
        bool Is(long seq, string kind) => kinds.TryGetValue(seq, out var k) && k == kind;

        foreach (var round in rows.Rounds)
            if (!Is(round.EntrySeq, EntryKinds.Issue) || rows.Entries.First(e => e.Seq == round.EntrySeq).Round != round.Round)
                return FormattableString.Invariant($"round {round.Round} is not the round its entry {round.EntrySeq} issued");
        var rounds = rows.Rounds.Select(r => r.Round).ToHashSet();
        foreach (var plot in rows.Plots)
            if (!rounds.Contains(plot.Round))
                return FormattableString.Invariant($"plot '{plot.PlotId}' belongs to round {plot.Round}, which was never issued");
        foreach (var record in rows.Records)
            if (!Is(record.EntrySeq, EntryKinds.Record))
                return FormattableString.Invariant($"the recording of round {record.Round} has no record entry {record.EntrySeq}");
        var records = rows.Records.Select(r => r.EntrySeq).ToHashSet();
        foreach (var outcome in rows.Outcomes)
            if (!records.Contains(outcome.EntrySeq))
                return FormattableString.Invariant($"the outcome of plot '{outcome.PlotId}' in round {outcome.Round} belongs to no recording");
        foreach (var amendment in rows.Amendments)
            if (!Is(amendment.EntrySeq, EntryKinds.Amend))
                return FormattableString.Invariant($"an amendment names entry {amendment.EntrySeq}, which is not an amendment");
        return null;
    }

    private static string Describe(EntryRow entry) => entry.Kind switch
    {
        EntryKinds.Issue => FormattableString.Invariant($"entry {entry.Seq} (round {entry.Round} issued {entry.At} by {entry.User})"),
        EntryKinds.Record => FormattableString.Invariant($"entry {entry.Seq} (results of round {entry.Round} recorded {entry.At} by {entry.User})"),
        _ => FormattableString.Invariant($"entry {entry.Seq} (design amended {entry.At} by {entry.User})"),
    };

    private static string Contents(EntryRow entry) => entry.Kind switch
    {
        EntryKinds.Issue => "the entry, its plan or its plots",
        EntryKinds.Record => "the entry or its outcomes",
        _ => "the entry or its amendment",
    };

    private static string Short(string? hash) => hash is { Length: >= 12 } ? hash[..12] : hash ?? "nothing";

    private static LedgerCheck Broken(LedgerRows rows, long? entry, string problem) =>
        LedgerCheck.Broken(problem, entry, rows.Entries.Count, rows.Entries.Count == 0 ? LedgerSchema.GenesisHash : rows.Entries[^1].Hash);
}
