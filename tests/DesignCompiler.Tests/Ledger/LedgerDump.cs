using System.Globalization;
using System.Text;
using Microsoft.Data.Sqlite;

namespace DesignCompiler.Tests.Ledger;

/// <summary>
/// Reads a ledger file directly with Microsoft.Data.Sqlite: a dump of every table (to show a
/// refused command changed nothing) and edits made behind trialc's back (to show they are caught).
/// </summary>
public static class LedgerDump
{
    public static SqliteConnection Open(string path)
    {
        var connection = new SqliteConnection(new SqliteConnectionStringBuilder
        {
            DataSource = path,
            Mode = SqliteOpenMode.ReadWrite,
            Pooling = false,
        }.ToString());
        connection.Open();
        return connection;
    }

    /// <summary>Every row of every table, sorted, as text; two dumps are equal exactly when the tables hold the same rows.</summary>
    public static string Of(string path)
    {
        using var connection = Open(path);
        var tables = new List<string>();
        using (var list = connection.CreateCommand())
        {
            list.CommandText = "SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name";
            using var reader = list.ExecuteReader();
            while (reader.Read()) tables.Add(reader.GetString(0));
        }
        var dump = new StringBuilder();
        foreach (var table in tables)
        {
            dump.Append("== ").Append(table).Append('\n');
            using var command = connection.CreateCommand();
            command.CommandText = $"SELECT * FROM \"{table}\"";
            using var reader = command.ExecuteReader();
            var rows = new List<string>();
            while (reader.Read())
            {
                var fields = Enumerable.Range(0, reader.FieldCount).Select(i =>
                    reader.IsDBNull(i) ? "NULL" : Convert.ToString(reader.GetValue(i), CultureInfo.InvariantCulture));
                rows.Add(string.Join(" | ", fields));
            }
            rows.Sort(StringComparer.Ordinal);
            foreach (var row in rows) dump.Append(row).Append('\n');
        }
        return dump.ToString();
    }

    /// <summary>Runs SQL as another tool would, with foreign keys off (the sqlite3 shell's default), so any edit can be made.</summary>
    public static void Execute(string path, string sql)
    {
        using var connection = Open(path);
        using var command = connection.CreateCommand();
        command.CommandText = "PRAGMA foreign_keys = OFF; " + sql;
        command.ExecuteNonQuery();
    }

    /// <summary>An SQLite file of some other program.</summary>
    public static void CreateDatabase(string path, string sql)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }

    public static long Count(string path, string sql)
    {
        using var connection = Open(path);
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return Convert.ToInt64(command.ExecuteScalar(), CultureInfo.InvariantCulture);
    }
}
