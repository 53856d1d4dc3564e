namespace DesignCompiler.Ledger;

/// <summary>How long to wait for another trialc's write lock, and a test-only pause inside write transactions.</summary>
public sealed record LedgerOptions
{
    /// <summary>A record or compile takes well under a second; five seconds covers a slow disk without leaving a user staring.</summary>
    public TimeSpan LockWait { get; init; } = TimeSpan.FromSeconds(5);

    /// <summary>
    /// Tests only: hold each write transaction open this long just before it commits, so a
    /// kill or a second writer can be made to land inside it. <see cref="OnPause"/> is called
    /// first, so the test knows the moment has come.
    /// </summary>
    public TimeSpan? PauseBeforeCommit { get; init; }

    public Action? OnPause { get; init; }

    public static LedgerOptions Default { get; } = new();
}
