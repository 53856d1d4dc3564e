using System.Globalization;
using DesignCompiler.Randomness;
using DesignCompiler.Results;
using DesignCompiler.Tests.Ledger;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Cli;

/// <summary>
/// The whole four-round cover-crop workflow, run twice from scratch in separate real trialc
/// processes: once under a German locale with simulations on one thread, once under the plain C
/// locale on two. Every file either run writes (sheets, plans, summaries, status reports, the export,
/// simulation reports) must be the same byte for byte. The ledger's clock is fixed for both runs
/// (TRIALC_TEST_CLOCK): the entry times are the only thing that may differ between runs on purpose.
/// </summary>
public sealed class ReproducibilityAuditTests
{
    private static readonly Dictionary<string, double> Rates = new() { ["OV"] = 0.6, ["RC"] = 0.62, ["MP"] = 0.58, ["BP"] = 0.6 };

    [Fact]
    public void Four_rounds_under_two_cultures_and_thread_counts_give_byte_identical_files()
    {
        using var german = new Workflow("de_DE.UTF-8", threads: 1);
        using var plain = new Workflow("C.UTF-8", threads: 2);
        german.Run();
        plain.Run();

        var names = Files(german.Folder);
        Assert.Equal(names, Files(plain.Folder));
        // Four rounds of six files (CSV, HTML, JSON, Markdown, workbook, round report), three status reports, the
        // export, verify's report, two simulation reports.
        Assert.Equal(24 + 3 + 1 + 1 + 2, names.Count);
        foreach (var name in names)
            Assert.True(File.ReadAllBytes(Path.Combine(german.Folder, name)).AsSpan().SequenceEqual(File.ReadAllBytes(Path.Combine(plain.Folder, name))),
                name + " differs between the two runs");
        // The German run really was German: its culture would have written decimal commas.
        Assert.Equal(",", CultureInfo.GetCultureInfo("de-DE").NumberFormat.NumberDecimalSeparator);
        Assert.Contains("\"probabilityBest\": 0.", File.ReadAllText(Path.Combine(german.Folder, "out", "round4", "cover-crops-round4.json")));
    }

    private static List<string> Files(string root) =>
        Directory.GetFiles(Path.Combine(root, "out"), "*", SearchOption.AllDirectories)
            .Select(f => Path.GetRelativePath(root, f)).Order(StringComparer.Ordinal).ToList();

    /// <summary>One run of the workflow in its own folder: a fresh copy of the design, a fresh ledger.</summary>
    private sealed class Workflow : IDisposable
    {
        private readonly Dictionary<string, string> _environment;
        private readonly int _threads;

        public Workflow(string locale, int threads)
        {
            Folder = Path.Combine(Path.GetTempPath(), "trialc-audit-" + Guid.NewGuid().ToString("N"));
            Directory.CreateDirectory(Path.Combine(Folder, "out"));
            File.Copy(RepoPaths.Example("cover-crops.trial"), Design);
            _environment = new Dictionary<string, string>
            {
                ["LC_ALL"] = locale, ["LANG"] = locale, ["USER"] = "audit", ["TRIALC_TEST_CLOCK"] = "2026-04-01T08:00:00Z",
            };
            _threads = threads;
        }

        public string Folder { get; }
        private string Design => Path.Combine(Folder, "cover-crops.trial");
        private string Ledger => Path.Combine(Folder, "cover-crops.ledger");
        private string Out(string name) => Path.Combine(Folder, "out", name);

        public void Run()
        {
            for (var round = 1; round <= 4; round++)
            {
                Trialc("compile", Design, "--ledger", Ledger, "--out", Out("round" + round));
                Trialc("record", Design, "--ledger", Ledger, Fill(round));
            }
            foreach (var format in new[] { "text", "json", "html" })
                File.WriteAllText(Out("status." + format), Trialc("status", Design, "--ledger", Ledger, "--format", format));
            Trialc("export", "--ledger", Ledger, "--out", Out("export.csv"));
            File.WriteAllText(Out("verify.txt"), Trialc("verify", "--ledger", Ledger).Replace(Folder, "FOLDER", StringComparison.Ordinal));
            var threads = _threads.ToString(CultureInfo.InvariantCulture);
            Trialc("simulate", Design, "--reps", "40", "--threads", threads, "--format", "json", "--out", Out("simulation.json"));
            Trialc("simulate", Design, "--reps", "40", "--threads", threads, "--format", "html", "--out", Out("simulation.html"));
        }

        private string Trialc(params string[] args)
        {
            var run = TrialcProcess.Invoke(_environment, args);
            Assert.True(run.ExitCode == 0, string.Join(' ', args) + ":\n" + run.Error + run.Out);
            return run.Out;
        }

        /// <summary>The round's returned sheet: outcomes drawn from a generator seeded by the round, so both runs return the same file.</summary>
        private string Fill(int round)
        {
            var sheet = Out("round" + round) + $"/cover-crops-round{round}.csv";
            var (all, problems) = CsvReader.Read(new DesignCompiler.Text.SourceText(sheet, File.ReadAllText(sheet)));
            Assert.Empty(problems);
            // The sheet opens with a '#' line tracing it to its trial; the header comes after it.
            var records = all.Where(r => !r.Fields[0].Text.StartsWith('#')).ToList();
            var rng = new Xoshiro256StarStar((ulong)(100 + round));
            var lines = new List<string> { string.Join(',', records[0].Fields.Select(f => f.Text)) };
            foreach (var record in records.Skip(1))
            {
                var fields = record.Fields.Select(f => f.Text).ToArray();
                fields[SheetColumns.Outcome] = rng.NextDouble() < Rates[fields[SheetColumns.Arm]] ? "1" : "0";
                lines.Add(string.Join(',', fields.Select(f => f.Contains(',') || f.Contains('"') ? "\"" + f.Replace("\"", "\"\"") + "\"" : f)));
            }
            var path = Path.Combine(Folder, $"returned-round{round}.csv");
            LedgerTrial.WriteLines(path, lines);
            return path;
        }

        public void Dispose() => Directory.Delete(Folder, true);
    }
}
