using System.Globalization;
using DesignCompiler.Diagnostics;
using Microsoft.Data.Sqlite;

namespace DesignCompiler.Ledger;

/// <summary>Turns what SQLite and the file system throw into one clear diagnostic about the ledger file; no stack trace ever reaches a user.</summary>
internal static class LedgerFailure
{
    private const int Busy = 5;
    private const int Locked = 6;
    private const int ReadOnly = 8;
    private const int IoError = 10;
    private const int Corrupt = 11;
    private const int Full = 13;
    private const int CantOpen = 14;
    private const int NotADatabase = 26;

    public static Diagnostic From(string path, Exception exception, LedgerOptions options) => exception switch
    {
        SqliteException { SqliteErrorCode: Busy or Locked } => At(path, LedgerDiagnostics.LedgerLocked,
            options.LockWait.TotalSeconds.ToString("0.#", CultureInfo.InvariantCulture)),
        SqliteException { SqliteErrorCode: Corrupt or NotADatabase } e => At(path, LedgerDiagnostics.NotALedger,
            $"the file is damaged or cut short (SQLite says: {Reason(e)}); restore the ledger from a copy"),
        SqliteException { SqliteErrorCode: ReadOnly } => At(path, LedgerDiagnostics.LedgerWriteFailed, "the file or its folder is read-only"),
        SqliteException { SqliteErrorCode: Full } => At(path, LedgerDiagnostics.LedgerWriteFailed, "the disk is full"),
        SqliteException { SqliteErrorCode: CantOpen } => At(path, LedgerDiagnostics.LedgerUnreadable, "the file cannot be opened (check the folder and its permissions)"),
        SqliteException { SqliteErrorCode: IoError } e => At(path, LedgerDiagnostics.LedgerUnreadable, "a disk error: " + Reason(e)),
        SqliteException e => At(path, LedgerDiagnostics.LedgerUnreadable, Reason(e)),
        UnauthorizedAccessException => At(path, LedgerDiagnostics.LedgerUnreadable, "permission denied"),
        // Values of the wrong type in a column: the tables were edited, or the file is another program's.
        InvalidCastException or InvalidOperationException or FormatException or OverflowException or KeyNotFoundException
            or System.Text.Json.JsonException => At(path, LedgerDiagnostics.LedgerChanged,
                "its tables hold values trialc never writes (" + exception.Message + ")"),
        _ => At(path, LedgerDiagnostics.LedgerUnreadable, exception.Message),
    };

    /// <summary>The exceptions a ledger operation can meet on a bad file; anything else is a bug and is left to surface as one.</summary>
    public static bool IsExpected(Exception e) =>
        e is SqliteException or IOException or UnauthorizedAccessException or InvalidCastException or InvalidOperationException
            or FormatException or OverflowException or KeyNotFoundException or System.Text.Json.JsonException;

    private static string Reason(SqliteException e)
    {
        // "SQLite Error 11: 'database disk image is malformed'." → "database disk image is malformed"
        var message = e.Message;
        var open = message.IndexOf('\'');
        var close = message.LastIndexOf('\'');
        return open >= 0 && close > open ? message[(open + 1)..close] : message;
    }

    private static Diagnostic At(string path, DiagnosticDescriptor descriptor, params object[] arguments) =>
        new(descriptor, SourceLocation.File(path), arguments);
}
