using System.Text.RegularExpressions;
using DesignCompiler.Rendering;
using DesignCompiler.Tests.Ledger;
using DesignCompiler.Tests.Testing;
using DocumentFormat.OpenXml.Packaging;

namespace DesignCompiler.Tests.Sheets;

/// <summary>
/// Every output a person reads names the trial, the round, the design (short hash), the trialc
/// version and the seed, so a printed page or a returned file can be traced back (common practice
/// for trial records: a sheet must identify its protocol version).
/// </summary>
public sealed class TraceabilityTests
{
    public static TheoryData<string> CompileOutputs() => ["csv", "html", "md", "json", "report", "xlsx", "letterhead"];

    [Theory]
    [MemberData(nameof(CompileOutputs))]
    public void Each_compiled_file_states_trial_round_design_version_and_seed(string output)
    {
        using var round = new CompiledRound("germination.trial", "--template", Path.Combine(RepoPaths.Examples, "templates", "letterhead-de.html.sbn"));
        var text = output switch
        {
            "report" => round.ReportText,
            "letterhead" => round.Text("letterhead-de.html"),
            "xlsx" => WorkbookText(round.File("xlsx")),
            _ => round.Text(output),
        };
        var trial = round.Plan.GetProperty("trial").GetString()!;
        var version = RoundOutputs.ToolVersion;
        var (hash, seed) = output == "json"
            ? (round.Plan.GetProperty("designHash").GetString()!, round.Seed)
            : (round.DesignHashShort, round.Seed);

        Assert.Contains(output is "html" or "report" or "letterhead" ? System.Net.WebUtility.HtmlEncode(trial) : trial, text);
        Assert.Contains(hash, text);
        Assert.Contains(version, text);
        Assert.Matches(output switch
        {
            "json" => $"\"seed\": {seed},",
            "letterhead" => $"Startwert {seed}",
            "md" => $"seed {seed},",
            _ => $"seed {seed}",
        }, text);
        Assert.Matches(output switch
        {
            "json" => "\"round\": 1,",
            "letterhead" => "Durchgang 1 von 3",
            "md" => "round 1 of 3",
            "csv" => "; round 1 of 3;",
            _ => "[Rr]ound 1 of 3",
        }, text);
    }

    [Fact]
    public void The_compile_terminal_summary_states_them_too()
    {
        using var round = new CompiledRound("germination.trial");
        Assert.StartsWith($"{round.Plan.GetProperty("trial").GetString()}: round 1 of 3, 24 plots, policy ", round.Run.Out);
        Assert.Contains($"\n  design {round.DesignHashShort} · seed {round.Seed} · trialc {RoundOutputs.ToolVersion}\n", round.Run.Out);
    }

    [Theory]
    [InlineData("text")]
    [InlineData("html")]
    [InlineData("json")]
    public void Status_states_trial_rounds_design_version_and_seed(string format)
    {
        using var trial = new LedgerTrial("aphid-margins.trial");
        trial.Issue(1);
        var run = trial.Status(format);
        Assert.Equal(0, run.ExitCode);
        var design = TestDesigns.FromText(File.ReadAllText(trial.Design), trial.Design);
        Assert.Contains(design.Name, run.Out);
        Assert.Contains(format == "json" ? design.Hash : design.ShortHash, run.Out);
        Assert.Contains(RoundOutputs.ToolVersion, run.Out);
        Assert.Matches(format == "json" ? $"\"seed\": {design.Seed}," : $"seed {design.Seed} ", run.Out);
        Assert.Matches(format == "json" ? "\"roundsRecorded\": 0," : $"0 of {design.Rounds} rounds recorded", run.Out);
    }

    [Fact]
    public void Simulate_and_compare_text_state_design_version_and_seed()
    {
        var design = TestDesigns.Example("germination.trial");
        var simulate = Trialc.Invoke("simulate", RepoPaths.Example("germination.trial"), "--reps", "8", "--threads", "1");
        Assert.Equal(0, simulate.ExitCode);
        Assert.StartsWith($"{design.Name}: simulated with policy ", simulate.Out);
        Assert.Contains($"seed {design.Seed}\ndesign {design.ShortHash}; {design.Rounds} rounds", simulate.Out);
        Assert.Contains($"; trialc {RoundOutputs.ToolVersion}\n", simulate.Out);

        var compare = Trialc.Invoke("compare", RepoPaths.Example("germination.trial"), RepoPaths.Example("germination.trial"), "--reps", "8", "--threads", "1");
        Assert.Equal(0, compare.ExitCode);
        Assert.Matches($@"seed \d+, trialc {Regex.Escape(RoundOutputs.ToolVersion)}\n", compare.Out);
        Assert.Contains($"(design {design.ShortHash})", compare.Out);
    }

    /// <summary>All text of a workbook's cells and page headers, sheet after sheet.</summary>
    private static string WorkbookText(string path)
    {
        using var document = SpreadsheetDocument.Open(path, false);
        return string.Join("\n", WorkbookCells.Worksheets(document).Select(w => w.Part.Worksheet!.InnerText));
    }
}
