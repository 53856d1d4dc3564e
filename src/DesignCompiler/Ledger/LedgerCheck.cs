namespace DesignCompiler.Ledger;

/// <summary>
/// The verdict on a ledger's chain: intact, or the first entry that is not as trialc wrote it.
/// <see cref="BrokenEntry"/> is null when the problem is not one entry's (the file's head, or a row that belongs to no entry).
/// </summary>
public sealed record LedgerCheck(bool Intact, string? Problem, long? BrokenEntry, int Entries, string HeadHash)
{
    public static LedgerCheck Broken(string problem, long? entry, int entries, string head) => new(false, problem, entry, entries, head);
}
