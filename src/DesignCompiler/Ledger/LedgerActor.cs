using System.Globalization;

namespace DesignCompiler.Ledger;

/// <summary>
/// Who writes an entry and when. The command line supplies both (the user name from the
/// environment, the time from the system clock), so the core itself never reads the clock.
/// </summary>
public sealed record LedgerActor(string User, DateTimeOffset At, string ToolVersion)
{
    /// <summary>UTC, ISO 8601, to the second: 2026-08-15T09:30:00Z.</summary>
    public string AtText => At.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", CultureInfo.InvariantCulture);
}
