using Microsoft.Data.Sqlite;

namespace DesignCompiler.Ledger;

/// <summary>Reads every table into <see cref="LedgerRows"/>, each in its key order so the result never depends on how SQLite stores the rows.</summary>
internal static class LedgerQueries
{
    public static LedgerRows ReadAll(SqliteConnection connection, SqliteTransaction transaction)
    {
        var meta = new Dictionary<string, string>(StringComparer.Ordinal);
        Each(connection, transaction, "SELECT key, value FROM meta ORDER BY key", r => meta[r.GetString(0)] = r.GetString(1));
        var designs = new Dictionary<string, string>(StringComparer.Ordinal);
        Each(connection, transaction, "SELECT hash, text FROM designs ORDER BY hash", r => designs[r.GetString(0)] = r.GetString(1));

        var entries = new List<EntryRow>();
        Each(connection, transaction,
            "SELECT seq, kind, round, design_hash, user_name, recorded_at, tool_version, prev_hash, hash FROM entries ORDER BY seq",
            r => entries.Add(new EntryRow(r.GetInt64(0), r.GetString(1), r.GetInt32(2), r.GetString(3), r.GetString(4),
                r.GetString(5), r.GetString(6), r.GetString(7), r.GetString(8))));

        var rounds = new List<RoundRow>();
        Each(connection, transaction, "SELECT round, entry_seq, plan_json, plan_data FROM rounds ORDER BY round",
            r => rounds.Add(new RoundRow(r.GetInt32(0), r.GetInt64(1), r.GetString(2), r.GetString(3))));

        var plots = new List<PlotRow>();
        Each(connection, transaction,
            "SELECT round, ordinal, block, block_index, plot_index, plot_id, row, col, arm, arm_index FROM plots ORDER BY round, ordinal",
            r => plots.Add(new PlotRow(r.GetInt32(0), r.GetInt32(1), r.GetString(2), r.GetInt32(3), r.GetInt32(4), r.GetString(5),
                NullableInt(r, 6), NullableInt(r, 7), r.GetString(8), r.GetInt32(9))));

        var records = new List<RecordRow>();
        Each(connection, transaction, "SELECT entry_seq, round, file_name, file_sha256 FROM records ORDER BY entry_seq",
            r => records.Add(new RecordRow(r.GetInt64(0), r.GetInt32(1), r.GetString(2), r.GetString(3))));

        var outcomes = new List<OutcomeRow>();
        Each(connection, transaction,
            "SELECT round, ordinal, plot_id, arm, value, value_text, missing_reason, notes, line, entry_seq FROM outcomes ORDER BY round, ordinal",
            r => outcomes.Add(new OutcomeRow(r.GetInt32(0), r.GetInt32(1), r.GetString(2), r.GetString(3),
                r.IsDBNull(4) ? null : r.GetDouble(4), NullableText(r, 5), NullableText(r, 6), r.GetString(7), r.GetInt32(8), r.GetInt64(9))));

        var amendments = new List<AmendmentRow>();
        Each(connection, transaction, "SELECT entry_seq, old_hash, new_hash, reason FROM amendments ORDER BY entry_seq",
            r => amendments.Add(new AmendmentRow(r.GetInt64(0), r.GetString(1), r.GetString(2), r.GetString(3))));

        return new LedgerRows(meta, designs, entries, rounds, plots, records, outcomes, amendments);
    }

    public static void Each(SqliteConnection connection, SqliteTransaction transaction, string sql, Action<SqliteDataReader> read)
    {
        using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        while (reader.Read()) read(reader);
    }

    public static object? Scalar(SqliteConnection connection, SqliteTransaction? transaction, string sql)
    {
        using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        return command.ExecuteScalar();
    }

    public static void Execute(SqliteConnection connection, SqliteTransaction? transaction, string sql, params (string Name, object? Value)[] parameters)
    {
        using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        foreach (var (name, value) in parameters) command.Parameters.AddWithValue(name, value ?? DBNull.Value);
        command.ExecuteNonQuery();
    }

    private static int? NullableInt(SqliteDataReader reader, int column) => reader.IsDBNull(column) ? null : reader.GetInt32(column);

    private static string? NullableText(SqliteDataReader reader, int column) => reader.IsDBNull(column) ? null : reader.GetString(column);
}
