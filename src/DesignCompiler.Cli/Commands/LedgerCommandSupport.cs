using System.Globalization;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Rendering;
using DesignCompiler.Rendering.Output;

namespace DesignCompiler.Cli.Commands;

/// <summary>What every ledger command shares: where the ledger is, who is writing, the test hook, and writing one output file.</summary>
internal static class LedgerCommandSupport
{
    /// <summary>Tests only: milliseconds to hold each ledger write transaction open before it commits.</summary>
    public const string PauseVariable = "TRIALC_TEST_PAUSE_IN_TRANSACTION_MS";

    /// <summary>
    /// Tests only: the instant every ledger entry records as its time, as <c>2026-04-01T08:00:00Z</c>.
    /// The ledger, its export and the printed sheets' issue date are the only outputs that carry the
    /// time; with this set, two runs of a workflow in separate processes can be compared byte for byte.
    /// </summary>
    public const string ClockVariable = "TRIALC_TEST_CLOCK";

    /// <summary>The ledger beside the design: same folder, same name, extension <c>.ledger</c>.</summary>
    public static string DefaultPath(string designPath) => Path.ChangeExtension(designPath, ".ledger");

    /// <summary>The user from the environment (USER, then USERNAME, then the system's name) and the time now, in UTC.</summary>
    public static LedgerActor Actor()
    {
        var user = new[] { Environment.GetEnvironmentVariable("USER"), Environment.GetEnvironmentVariable("USERNAME"), Environment.UserName }
            .FirstOrDefault(u => !string.IsNullOrWhiteSpace(u)) ?? "unknown";
        return new LedgerActor(user.Trim(), Now(), RoundOutputs.ToolVersion);
    }

    private static DateTimeOffset Now() =>
        DateTimeOffset.TryParseExact(Environment.GetEnvironmentVariable(ClockVariable), "yyyy-MM-dd'T'HH:mm:ss'Z'",
            CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal | DateTimeStyles.AdjustToUniversal, out var fixedNow)
            ? fixedNow
            : TimeProvider.System.GetUtcNow();

    public static LedgerOptions Options(CliConsole console)
    {
        var pause = Environment.GetEnvironmentVariable(PauseVariable);
        if (!int.TryParse(pause, NumberStyles.None, CultureInfo.InvariantCulture, out var milliseconds) || milliseconds <= 0)
            return LedgerOptions.Default;
        return LedgerOptions.Default with
        {
            PauseBeforeCommit = TimeSpan.FromMilliseconds(milliseconds),
            OnPause = () =>
            {
                console.Error.WriteLine(FormattableString.Invariant($"trialc: test pause: holding the ledger transaction open for {milliseconds} ms"));
                console.Error.Flush();
            },
        };
    }

    /// <summary>Opens the ledger, or reports why not; null then.</summary>
    public static LedgerFile? Open(CliConsole console, string path, bool create)
    {
        var (ledger, problem) = LedgerFile.Open(path, create, Options(console));
        if (ledger is null) console.Report([problem!]);
        return ledger;
    }

    /// <summary>Writes text to a file (under a temporary name, then renamed) or, without a path, to standard output.</summary>
    public static bool WriteOutput(CliConsole console, string? path, string text)
    {
        if (path is null)
        {
            console.Out.Write(text);
            return true;
        }
        var full = Path.GetFullPath(path);
        var failure = AtomicOutput.WriteAll(Path.GetDirectoryName(full)!, [(Path.GetFileName(full), new System.Text.UTF8Encoding(false).GetBytes(text))]);
        if (failure is null) return true;
        console.Report([new Diagnostic(DiagnosticCatalog.OutputUnwritable, SourceLocation.File(path), [failure])]);
        return false;
    }

    /// <summary>A list of plot ids for a message: all of them when few, else the first ones and how many more.</summary>
    public static string PlotList(IEnumerable<string> plots, int shown = 12)
    {
        var all = plots.ToList();
        return all.Count <= shown
            ? string.Join(", ", all)
            : string.Join(", ", all.Take(shown)) + FormattableString.Invariant($" and {all.Count - shown} more");
    }
}
