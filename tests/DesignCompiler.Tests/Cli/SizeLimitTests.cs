using System.Text;
using DesignCompiler.Binding;
using DesignCompiler.Results;
using DesignCompiler.Tests.Ledger;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Cli;

/// <summary>
/// Inputs far past any real trial are refused with a message that names the limit and says what to
/// do, at a position, with exit code 1; never an out-of-memory crash or a long wait. The limits are
/// stated in <see cref="DesignLimits"/> and <see cref="ResultFile"/> and explained in DEVELOPERS.md.
/// </summary>
public sealed class SizeLimitTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "trialc-size-" + Guid.NewGuid().ToString("N"));

    public SizeLimitTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, true);

    private static string Design(int arms) =>
        "trial \"Many arms\" {\n  seed 1\n  rounds 2\n  outcome y: bernoulli\n  policy thompson\n  default prior beta(1, 1)\n" +
        "  plots 2000 per round\n" +
        string.Concat(Enumerable.Range(0, arms).Select(i => FormattableString.Invariant($"  arm A{i} \"Arm {i}\"\n"))) + "}\n";

    [Fact]
    public void A_design_with_ten_thousand_arms_is_refused_at_the_first_arm_past_the_limit()
    {
        var path = Path.Combine(_folder, "arms.trial");
        File.WriteAllText(path, Design(10_000));

        var run = Trialc.Invoke("check", path);

        Assert.Equal(1, run.ExitCode);
        // Arm 1001 (A1000) is on line 1008: seven lines of header come first.
        Assert.Contains(path + ":1008:7: error TD2004: the number of arms must be at most 1000, not 10000", run.Error);
        Assert.Contains("hint: no field trial sows this many arms at once", run.Error);
        Assert.Equal(1, run.Error.Split('\n').Count(l => l.Contains("error TD", StringComparison.Ordinal)));
    }

    [Fact]
    public void A_design_at_the_arm_limit_compiles_and_every_figure_is_finite()
    {
        var path = Path.Combine(_folder, "thousand.trial");
        File.WriteAllText(path, Design(DesignLimits.MaxArms));
        var out1 = Path.Combine(_folder, "out");

        var run = Trialc.Invoke("compile", path, "--out", out1);

        Assert.True(run.ExitCode == 0, run.Error);
        var files = Directory.GetFiles(out1).Select(f => (Path.GetFileName(f), File.ReadAllBytes(f))).ToList();
        // CSV, HTML, JSON, Markdown, the round report and the workbook.
        Assert.Equal(6, files.Count);
        Assert.Empty(OutputInvariants.FileProblems(files));
        // 2000 plots over 1000 identical arms: a header and 2000 rows below the '#' trace line, every arm on two
        // plots (identical priors give identical Thompson shares: symmetry, common practice).
        var csv = Encoding.UTF8.GetString(files.Single(f => f.Item1.EndsWith(".csv", StringComparison.Ordinal)).Item2);
        var rows = csv.Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Where(l => !l.StartsWith('#')).ToArray();
        Assert.Equal(2001, rows.Length);
        Assert.All(rows.Skip(1).GroupBy(r => r.Split(',')[SheetColumns.Arm]), g => Assert.Equal(2, g.Count()));
    }

    [Fact]
    public void A_fifty_megabyte_design_file_is_refused_before_it_is_read()
    {
        var path = Path.Combine(_folder, "huge.trial");
        using (var file = File.Create(path)) file.SetLength(50L * 1024 * 1024);

        var run = Trialc.Invoke("check", path);

        Assert.Equal(1, run.ExitCode);
        // A file-level problem is printed at the file, without a line: there is no line to point at.
        Assert.Contains(path + ": error TD5001: cannot read the file: it is 52,428,800 bytes, over the limit of 1,048,576 bytes for a design file", run.Error);
        Assert.Contains("check that this is the right file, or split it into smaller ones", run.Error);
        Assert.DoesNotContain("Exception", run.Error);
    }

    [Fact]
    public void A_design_just_under_the_file_limit_is_read_and_checked()
    {
        // A real design padded with comments to just under the limit: the limit refuses size, not content.
        var text = File.ReadAllText(RepoPaths.Example("cover-crops.trial"));
        var padding = new StringBuilder();
        while (padding.Length + text.Length + 80 < DesignLimits.MaxDesignFileBytes) padding.Append("# notes from the planning meeting, kept with the design\n");
        var path = Path.Combine(_folder, "padded.trial");
        File.WriteAllText(path, padding + text);

        var run = Trialc.Invoke("check", path);

        Assert.True(run.ExitCode == 0, run.Error);
        Assert.Contains(": ok:", run.Out);
    }

    [Fact]
    public void A_results_file_over_the_size_limit_is_refused_and_nothing_is_recorded()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var before = LedgerDump.Of(trial.Ledger);
        var path = trial.File("huge.csv");
        using (var file = File.Create(path)) file.SetLength(ResultFile.MaxBytes + 1);

        var run = trial.Record(path);

        Assert.Equal(1, run.ExitCode);
        Assert.Contains(path + ": error TD4001: cannot read the results: it is 33,554,433 bytes, over the limit of 33,554,432 bytes for a results sheet", run.Error);
        Assert.Equal(before, LedgerDump.Of(trial.Ledger));
    }

    [Fact]
    public void A_results_file_with_far_more_rows_than_plots_is_refused_at_the_first_row_too_many()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var before = LedgerDump.Of(trial.Ledger);
        var rows = File.ReadAllText(trial.Sheet(1)).Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Where(l => !l.StartsWith('#')).ToList();
        var path = trial.File("pasted-twice.csv");
        // The 36 plots pasted over and over: 20 000 rows, about a megabyte.
        LedgerTrial.WriteLines(path, rows.Take(1).Concat(Enumerable.Range(0, 20_000).Select(i => rows[1 + i % 36])));

        var run = trial.Record(path);

        Assert.Equal(1, run.ExitCode);
        var limit = 36 + 1 + ResultSheetChecker.BlankRowAllowance;
        Assert.Contains(FormattableString.Invariant(
            $"{path}:{limit + 1}:1: error TD4009: the sheet has more than {limit} rows; the largest issued round has 36 plots"), run.Error);
        Assert.Equal(1, run.Error.Split('\n').Count(l => l.Contains("error TD", StringComparison.Ordinal)));
        Assert.Equal(before, LedgerDump.Of(trial.Ledger));
    }
}
