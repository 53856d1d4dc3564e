using System.Globalization;
using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Results;
using Microsoft.Data.Sqlite;

namespace DesignCompiler.Ledger;

/// <summary>
/// Appends entries inside the write transaction of <see cref="LedgerFile.Update{T}"/>. Each
/// append inserts the entry and its rows, then reads them back and hashes them with the same
/// code the verifier uses, so what is hashed is exactly what is stored.
/// </summary>
public sealed class LedgerAppender
{
    private readonly SqliteConnection _connection;
    private readonly SqliteTransaction _transaction;
    private readonly LedgerActor _actor;

    internal LedgerAppender(SqliteConnection connection, SqliteTransaction transaction, LedgerActor actor)
    {
        _connection = connection;
        _transaction = transaction;
        _actor = actor;
    }

    public LedgerActor Actor => _actor;

    /// <summary>Records an issued round: the design text, the plan JSON as written beside the sheets, the plan's figures and every plot.</summary>
    public LedgerEntryInfo Issue(CheckedDesign design, RoundPlan plan, string planJson)
    {
        var seq = BeginEntry(EntryKinds.Issue, plan.Round, design);
        Execute("INSERT INTO rounds (round, entry_seq, plan_json, plan_data) VALUES ($round, $seq, $json, $data)",
            ("$round", plan.Round), ("$seq", seq), ("$json", planJson), ("$data", LedgerPlanData.Write(plan)));

        using var command = Prepare(
            "INSERT INTO plots (round, ordinal, block, block_index, plot_index, plot_id, row, col, arm, arm_index) " +
            "VALUES ($round, $ordinal, $block, $blockIndex, $plotIndex, $plotId, $row, $col, $arm, $armIndex)",
            "$round", "$ordinal", "$block", "$blockIndex", "$plotIndex", "$plotId", "$row", "$col", "$arm", "$armIndex");
        for (var k = 0; k < plan.Assignments.Count; k++)
        {
            var a = plan.Assignments[k];
            Run(command, plan.Round, k, a.Block, a.BlockIndex, a.PlotIndex, a.PlotId, a.Row, a.Column, a.ArmCode, a.Arm);
        }
        return Seal(seq);
    }

    /// <summary>Records a checked sheet: every plot's value or missing mark, with the file's name and hash.</summary>
    public LedgerEntryInfo Record(CheckedSheet sheet, string fileName, string fileSha256, string designHash)
    {
        var seq = BeginEntry(EntryKinds.Record, sheet.Round, designHash, null);
        Execute("INSERT INTO records (entry_seq, round, file_name, file_sha256) VALUES ($seq, $round, $name, $sha)",
            ("$seq", seq), ("$round", sheet.Round), ("$name", fileName), ("$sha", fileSha256));

        using var command = Prepare(
            "INSERT INTO outcomes (round, ordinal, plot_id, arm, value, value_text, missing_reason, notes, line, entry_seq) " +
            "VALUES ($round, $ordinal, $plotId, $arm, $value, $text, $reason, $notes, $line, $seq)",
            "$round", "$ordinal", "$plotId", "$arm", "$value", "$text", "$reason", "$notes", "$line", "$seq");
        foreach (var r in sheet.Results)
            Run(command, sheet.Round, r.Ordinal, r.PlotId, r.Arm, r.Value, r.ValueText, r.MissingReason, r.Notes, r.Line, seq);
        return Seal(seq);
    }

    /// <summary>Records a change of design text, with the reason given.</summary>
    public LedgerEntryInfo Amend(string oldHash, CheckedDesign design, string reason, int lastRound)
    {
        var seq = BeginEntry(EntryKinds.Amend, lastRound, design);
        Execute("INSERT INTO amendments (entry_seq, old_hash, new_hash, reason) VALUES ($seq, $old, $new, $reason)",
            ("$seq", seq), ("$old", oldHash), ("$new", design.Hash), ("$reason", reason));
        return Seal(seq);
    }

    private long BeginEntry(string kind, int round, CheckedDesign design) => BeginEntry(kind, round, design.Hash, design.Source.Content);

    private long BeginEntry(string kind, int round, string designHash, string? designText)
    {
        if (designText is not null)
            Execute("INSERT OR IGNORE INTO designs (hash, text) VALUES ($hash, $text)", ("$hash", designHash), ("$text", designText));
        var seq = Convert.ToInt64(Scalar("SELECT coalesce(max(seq), 0) + 1 FROM entries"), CultureInfo.InvariantCulture);
        var previous = Scalar("SELECT hash FROM entries ORDER BY seq DESC LIMIT 1") as string ?? LedgerSchema.GenesisHash;
        // The hash is filled in by Seal once the entry's rows are in.
        Execute("INSERT INTO entries (seq, kind, round, design_hash, user_name, recorded_at, tool_version, prev_hash, hash) " +
                "VALUES ($seq, $kind, $round, $design, $user, $at, $tool, $prev, '')",
            ("$seq", seq), ("$kind", kind), ("$round", round), ("$design", designHash), ("$user", _actor.User),
            ("$at", _actor.AtText), ("$tool", _actor.ToolVersion), ("$prev", previous));
        return seq;
    }

    private LedgerEntryInfo Seal(long seq)
    {
        var rows = LedgerQueries.ReadAll(_connection, _transaction);
        var entry = rows.Entries.Single(e => e.Seq == seq);
        var hash = EntryText.Hash(entry.PrevHash, EntryText.Canonical(entry, rows));
        Execute("UPDATE entries SET hash = $hash WHERE seq = $seq", ("$hash", hash), ("$seq", seq));
        Execute("UPDATE meta SET value = $v WHERE key = 'head_hash'", ("$v", hash));
        Execute("UPDATE meta SET value = $v WHERE key = 'entry_count'", ("$v", seq.ToString(CultureInfo.InvariantCulture)));
        return new LedgerEntryInfo(seq, entry.Kind, entry.Round, entry.DesignHash, entry.User, entry.At, entry.ToolVersion, hash);
    }

    private void Execute(string sql, params (string Name, object? Value)[] parameters) =>
        LedgerQueries.Execute(_connection, _transaction, sql, parameters);

    private object? Scalar(string sql) => LedgerQueries.Scalar(_connection, _transaction, sql);

    private SqliteCommand Prepare(string sql, params string[] names)
    {
        var command = _connection.CreateCommand();
        command.Transaction = _transaction;
        command.CommandText = sql;
        foreach (var name in names) command.Parameters.Add(new SqliteParameter { ParameterName = name });
        command.Prepare();
        return command;
    }

    private static void Run(SqliteCommand command, params object?[] values)
    {
        for (var i = 0; i < values.Length; i++) command.Parameters[i].Value = values[i] ?? DBNull.Value;
        command.ExecuteNonQuery();
    }
}
