using System.Globalization;
using System.Text;
using DesignCompiler.Diagnostics;
using Microsoft.Data.Sqlite;

namespace DesignCompiler.Ledger;

/// <summary>
/// One trial's ledger: an SQLite file in rollback-journal mode, so a ledger is always one file
/// that can be copied or mailed, and a write cut short (power loss, a killed process) is rolled
/// back the next time the file is opened. Every write runs in one <c>BEGIN IMMEDIATE</c>
/// transaction that first checks the chain, then reads the history, then appends, so two
/// commands at once are serialised and the second sees what the first wrote. A command that
/// finds the file locked waits up to <see cref="LedgerOptions.LockWait"/>, then fails clearly.
/// </summary>
public sealed class LedgerFile : IDisposable
{
    private static ReadOnlySpan<byte> SqliteMagic => "SQLite format 3\0"u8;

    private readonly SqliteConnection _connection;
    private readonly LedgerOptions _options;

    private LedgerFile(string path, SqliteConnection connection, LedgerOptions options)
    {
        Path = path;
        _connection = connection;
        _options = options;
    }

    public string Path { get; }

    /// <summary>Opens a ledger; with <paramref name="create"/> a missing (or empty) file becomes a new ledger.</summary>
    public static (LedgerFile? Ledger, Diagnostic? Problem) Open(string path, bool create, LedgerOptions? options = null)
    {
        options ??= LedgerOptions.Default;
        if (Directory.Exists(path)) return (null, At(path, LedgerDiagnostics.LedgerUnreadable, "it is a folder, not a ledger file"));
        var exists = File.Exists(path);
        if (!exists && !create) return (null, At(path, LedgerDiagnostics.LedgerMissing, path));
        if (exists && NotSqlite(path) is { } why) return (null, At(path, LedgerDiagnostics.NotALedger, why));

        SqliteConnection? connection = null;
        try
        {
            if (!exists) Directory.CreateDirectory(System.IO.Path.GetDirectoryName(System.IO.Path.GetFullPath(path))!);
            connection = new SqliteConnection(new SqliteConnectionStringBuilder
            {
                DataSource = path,
                Mode = create ? SqliteOpenMode.ReadWriteCreate : SqliteOpenMode.ReadWrite,
                // Pooling would keep the file open after a command ends, which a tool that exits anyway does not need.
                Pooling = false,
                DefaultTimeout = Math.Max(1, (int)Math.Ceiling(options.LockWait.TotalSeconds)),
            }.ToString());
            connection.Open();
            LedgerQueries.Execute(connection, null, FormattableString.Invariant(
                $"PRAGMA busy_timeout = {(int)options.LockWait.TotalMilliseconds}; PRAGMA synchronous = FULL; PRAGMA foreign_keys = ON;"));

            var problem = create ? EnsureSchema(connection, path) : null;
            problem ??= CheckIdentity(connection, path);
            if (problem is not null)
            {
                connection.Dispose();
                return (null, problem);
            }
            return (new LedgerFile(path, connection, options), null);
        }
        catch (Exception e) when (LedgerFailure.IsExpected(e))
        {
            connection?.Dispose();
            return (null, LedgerFailure.From(path, e, options));
        }
    }

    /// <summary>Checks the chain and the file's integrity, without interpreting anything.</summary>
    public LedgerResult<LedgerCheck> Verify() => Guard(() =>
    {
        using var transaction = _connection.BeginTransaction(deferred: true);
        var rows = LedgerQueries.ReadAll(_connection, transaction);
        var check = LedgerVerifier.Check(rows);
        if (check.Intact && LedgerQueries.Scalar(_connection, transaction, "PRAGMA quick_check") is string quick && quick != "ok")
            check = LedgerCheck.Broken("the file is damaged (SQLite's check says: " + quick + ")", null, check.Entries, check.HeadHash);
        return LedgerResult<LedgerCheck>.Ok(check);
    });

    /// <summary>The whole history, once the chain is checked; a broken chain is an error, so nothing is built on an edited ledger.</summary>
    public LedgerResult<LedgerHistory> Read() => Guard(() =>
    {
        using var transaction = _connection.BeginTransaction(deferred: true);
        return ReadChecked(transaction);
    });

    /// <summary>
    /// Runs <paramref name="work"/> inside one write transaction on the checked history. The
    /// appender's entries are committed only if the work reports no error; otherwise, or on any
    /// failure, nothing is written.
    /// </summary>
    public LedgerResult<T> Update<T>(LedgerActor actor, Func<LedgerHistory, LedgerAppender, LedgerResult<T>> work) => Guard(() =>
    {
        using var transaction = _connection.BeginTransaction(deferred: false);
        var history = ReadChecked(transaction);
        if (history.HasErrors || history.Value is null) return LedgerResult<T>.Fail(history.Diagnostics);

        var result = work(history.Value, new LedgerAppender(_connection, transaction, actor));
        if (result.HasErrors)
        {
            transaction.Rollback();
            return result;
        }
        if (_options.PauseBeforeCommit is { } pause)
        {
            _options.OnPause?.Invoke();
            Thread.Sleep(pause);
        }
        transaction.Commit();
        return result;
    });

    public void Dispose() => _connection.Dispose();

    private LedgerResult<LedgerHistory> ReadChecked(SqliteTransaction transaction)
    {
        var rows = LedgerQueries.ReadAll(_connection, transaction);
        var check = LedgerVerifier.Check(rows);
        if (!check.Intact) return LedgerResult<LedgerHistory>.Fail(At(Path, LedgerDiagnostics.LedgerChanged, check.Problem!));
        return LedgerResult<LedgerHistory>.Ok(LedgerHistory.From(rows));
    }

    private LedgerResult<T> Guard<T>(Func<LedgerResult<T>> action)
    {
        try
        {
            return action();
        }
        catch (Exception e) when (LedgerFailure.IsExpected(e))
        {
            return LedgerResult<T>.Fail(LedgerFailure.From(Path, e, _options));
        }
    }

    /// <summary>Why a file cannot be a ledger, read from its first bytes before SQLite is given it (so a text file is named as one).</summary>
    private static string? NotSqlite(string path)
    {
        var head = new byte[100];
        int read;
        using (var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite))
            read = stream.ReadAtLeast(head, head.Length, throwOnEndOfStream: false);
        if (read == 0) return null; // an empty file: a ledger whose creation was cut off, or about to be made
        if (read >= SqliteMagic.Length && head.AsSpan(0, SqliteMagic.Length).SequenceEqual(SqliteMagic))
            return read < head.Length ? "the file is cut short (it ends inside its header); restore the ledger from a copy" : null;
        var looksLikeText = head.AsSpan(0, read).IndexOfAnyInRange((byte)0, (byte)8) < 0;
        return looksLikeText
            ? "it is a text file (it begins \"" + Printable(head.AsSpan(0, Math.Min(read, 24))) + "\"), not an SQLite ledger"
            : "it is not an SQLite file; a ledger is the file trialc compile --ledger made";
    }

    private static string Printable(ReadOnlySpan<byte> bytes)
    {
        var text = Encoding.UTF8.GetString(bytes);
        var builder = new StringBuilder();
        foreach (var c in text) builder.Append(char.IsControl(c) ? ' ' : c);
        return builder.ToString().Trim();
    }

    /// <summary>Creates the tables in a new (empty) file, in one transaction so a half-made ledger never exists.</summary>
    private static Diagnostic? EnsureSchema(SqliteConnection connection, string path)
    {
        using var transaction = connection.BeginTransaction(deferred: false);
        var tables = Convert.ToInt64(LedgerQueries.Scalar(connection, transaction, "SELECT count(*) FROM sqlite_master"), CultureInfo.InvariantCulture);
        if (tables > 0) return null;
        LedgerQueries.Execute(connection, transaction, LedgerSchema.Create);
        LedgerQueries.Execute(connection, transaction, FormattableString.Invariant($"PRAGMA application_id = {LedgerSchema.ApplicationId}"));
        LedgerQueries.Execute(connection, transaction,
            "INSERT INTO meta (key, value) VALUES ('schema_version', $v), ('entry_count', '0'), ('head_hash', $h)",
            ("$v", LedgerSchema.Version.ToString(CultureInfo.InvariantCulture)), ("$h", LedgerSchema.GenesisHash));
        transaction.Commit();
        return null;
    }

    private static Diagnostic? CheckIdentity(SqliteConnection connection, string path)
    {
        var application = Convert.ToInt64(LedgerQueries.Scalar(connection, null, "PRAGMA application_id"), CultureInfo.InvariantCulture);
        if (application != LedgerSchema.ApplicationId)
        {
            var tables = Convert.ToInt64(LedgerQueries.Scalar(connection, null, "SELECT count(*) FROM sqlite_master"), CultureInfo.InvariantCulture);
            return At(path, LedgerDiagnostics.NotALedger, tables == 0
                ? "the file is empty"
                : "it is an SQLite database of another program");
        }
        var version = LedgerQueries.Scalar(connection, null, "SELECT value FROM meta WHERE key = 'schema_version'") as string;
        if (!int.TryParse(version, NumberStyles.None, CultureInfo.InvariantCulture, out var number))
            return At(path, LedgerDiagnostics.LedgerChanged, "its schema version is gone");
        return number > LedgerSchema.Version
            ? At(path, LedgerDiagnostics.SchemaTooNew, number, LedgerSchema.Version)
            : null;
    }

    private static Diagnostic At(string path, DiagnosticDescriptor descriptor, params object[] arguments) =>
        new(descriptor, SourceLocation.File(path), arguments);
}
