using System.Text;
using DesignCompiler.Randomness;
using DesignCompiler.Results;
using DesignCompiler.Tests.Testing;
using DesignCompiler.Text;

namespace DesignCompiler.Tests.Ledger;

/// <summary>
/// A trial in its own temporary folder: a copy of an example design, its ledger, the sheets of
/// each round, and the returned sheets a test writes. Runs trialc in-process, as a user would.
/// </summary>
public sealed class LedgerTrial : IDisposable
{
    public LedgerTrial(string example)
        : this(example, System.IO.File.ReadAllBytes(RepoPaths.Example(example)))
    {
    }

    /// <summary>A trial of a design written by the test, saved as <paramref name="fileName"/>.</summary>
    public LedgerTrial(string fileName, string designText)
        : this(fileName, new UTF8Encoding(false).GetBytes(designText))
    {
    }

    private LedgerTrial(string fileName, byte[] design)
    {
        Folder = Path.Combine(Path.GetTempPath(), "trialc-ledger-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Folder);
        Stem = Path.GetFileNameWithoutExtension(fileName);
        Design = Path.Combine(Folder, fileName);
        System.IO.File.WriteAllBytes(Design, design);
        Ledger = Path.Combine(Folder, Stem + ".ledger");
    }

    public string Folder { get; }
    public string Stem { get; }
    public string Design { get; }
    public string Ledger { get; }

    public string OutFolder(int round) => Path.Combine(Folder, "out" + round);

    public string Sheet(int round) => Path.Combine(OutFolder(round), $"{Stem}-round{round}.csv");

    public string File(string name) => Path.Combine(Folder, name);

    public Trialc.Run Compile(int round, params string[] extra) =>
        Trialc.Invoke(["compile", Design, "--ledger", Ledger, "--out", OutFolder(round), .. extra]);

    public Trialc.Run Record(string results) => Trialc.Invoke("record", Design, "--ledger", Ledger, results);

    public Trialc.Run Status(string format = "json") => Trialc.Invoke("status", Design, "--ledger", Ledger, "--format", format);

    public Trialc.Run Verify() => Trialc.Invoke("verify", "--ledger", Ledger);

    /// <summary>Compiles a round and asserts it was issued.</summary>
    public void Issue(int round)
    {
        var run = Compile(round);
        Assert.True(run.ExitCode == 0, run.Error + run.Out);
        Assert.True(System.IO.File.Exists(Sheet(round)), run.Out);
    }

    /// <summary>The issued sheet's rows (header first) as fields, without the '#' line that traces the sheet.</summary>
    public List<string[]> SheetRows(int round)
    {
        var (records, problems) = CsvReader.Read(new SourceText("sheet", System.IO.File.ReadAllText(Sheet(round))));
        Assert.Empty(problems);
        Assert.StartsWith("# ", records[0].Fields[0].Text);
        return records.Skip(1).Select(r => r.Fields.Select(f => f.Text).ToArray()).ToList();
    }

    /// <summary>Draws one plot's outcome text for an arm from the test's seeded generator.</summary>
    public delegate string OutcomeDraw(string arm, ref Xoshiro256StarStar rng);

    /// <summary>
    /// The round's sheet with invented outcomes: each plot's value drawn by <paramref name="draw"/>
    /// from a generator seeded with <paramref name="seed"/>, so every run writes the same file.
    /// </summary>
    public string Fill(int round, ulong seed, OutcomeDraw draw, string? name = null)
    {
        var rng = new Xoshiro256StarStar(seed);
        var rows = SheetRows(round);
        var lines = new List<string> { string.Join(",", rows[0]) };
        foreach (var row in rows.Skip(1))
        {
            row[SheetColumns.Outcome] = draw(row[SheetColumns.Arm], ref rng);
            lines.Add(string.Join(",", row.Select(Csv)));
        }
        var path = File(name ?? $"returned-round{round}.csv");
        WriteLines(path, lines);
        return path;
    }

    /// <summary>Bernoulli outcomes (1 = success) with the given success rate per arm.</summary>
    public string FillBernoulli(int round, ulong seed, IReadOnlyDictionary<string, double> rates, string? name = null) =>
        Fill(round, seed, (string arm, ref Xoshiro256StarStar rng) => rng.NextDouble() < rates[arm] ? "1" : "0", name);

    public static void WriteLines(string path, IEnumerable<string> lines, string newline = "\r\n") =>
        System.IO.File.WriteAllText(path, string.Concat(lines.Select(l => l + newline)), new UTF8Encoding(false));

    private static string Csv(string field) =>
        field.IndexOfAny([',', '"', '\r', '\n']) >= 0 ? "\"" + field.Replace("\"", "\"\"") + "\"" : field;

    public void Dispose()
    {
        try
        {
            Directory.Delete(Folder, true);
        }
        catch (IOException)
        {
            // A child process killed by a test may hold a file a moment longer; the folder is in /tmp anyway.
        }
    }
}
