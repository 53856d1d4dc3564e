using System.Text.Json;
using System.Text.RegularExpressions;
using DesignCompiler.Ledger;
using DesignCompiler.Planning;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Ledger;

/// <summary>Status in its three formats, and the replay that status and compile both stand on.</summary>
public sealed class LedgerStatusTests
{
    private static readonly Dictionary<string, double> Rates = new() { ["OV"] = 0.6, ["RC"] = 0.7, ["MP"] = 0.15, ["BP"] = 0.62 };

    private static LedgerTrial TwoRounds()
    {
        var trial = new LedgerTrial("cover-crops.trial");
        for (var round = 1; round <= 2; round++)
        {
            trial.Issue(round);
            Assert.Equal(0, trial.Record(trial.FillBernoulli(round, 1000 + (ulong)round, Rates)).ExitCode);
        }
        return trial;
    }

    [Fact]
    public void Replaying_the_ledger_plans_every_past_round_exactly_as_it_was_stored()
    {
        using var trial = TwoRounds();
        trial.Issue(3);
        var design = TestDesigns.FromText(File.ReadAllText(trial.Design), trial.Design);
        var planner = RoundPlanner.For(design).Planner!;
        var (ledger, problem) = LedgerFile.Open(trial.Ledger, create: false);
        Assert.Null(problem);
        using (ledger)
        {
            var history = ledger!.Read().Value!;
            Assert.Empty(ReplayCheck.Check(planner, history, DesignCompiler.Rendering.RoundOutputs.ToolVersion));
            var state = TrialReplay.Before(design, history, 3).Value!;
            Assert.Equal(2, state.RoundsCompleted);
            Assert.Equal(72, state.PlotsRecorded);
            Assert.Equal(history.Rounds.Take(2).Sum(r => r.Plots.Count(p => p.ArmCode == "MP")), state.PlotsIssued[2]);
        }
    }

    [Fact]
    public void Text_status_lists_arms_rules_stock_and_p_best_by_round()
    {
        using var trial = TwoRounds();
        var run = trial.Status("text");
        Assert.Equal(0, run.ExitCode);
        Assert.StartsWith("Late-sown cover mixes: 2 of 4 rounds recorded (2 issued); 72 plots with results, 0 missing\n", run.Out);
        Assert.Matches(@"\n  OV +\d+ +\d+ +0  ", run.Out);
        Assert.Contains("\nrules\n  drop when best < 0.02 after round 2: ", run.Out);
        Assert.Contains("\nstock\n  MP: 30 plots, ", run.Out);
        Assert.Contains("\n  prior ", run.Out);
        Assert.Contains("\n  after round 2 ", run.Out);
        Assert.EndsWith("next: round 3 of 4 can be compiled\n", run.Out);
    }

    [Fact]
    public void Html_status_has_a_black_and_white_chart_of_p_best_by_round()
    {
        using var trial = TwoRounds();
        var file = trial.File("status.html");
        var run = Trialc.Invoke("status", trial.Design, "--ledger", trial.Ledger, "--format", "html", "--out", file);
        Assert.Equal(0, run.ExitCode);
        var html = File.ReadAllText(file);
        Assert.Contains("<svg xmlns=\"http://www.w3.org/2000/svg\"", html);
        var lines = Regex.Matches(html, "<polyline points=\"([^\"]*)\"").Select(m => m.Groups[1].Value).ToList();
        Assert.Equal(4, lines.Count);
        Assert.All(lines, l => Assert.Equal(3, l.Split(' ').Length)); // prior, after round 1, after round 2
        // Lines differ by dash pattern, not colour: every stroke and fill is black, white or grey.
        Assert.Equal(4, Regex.Matches(html, "<polyline[^>]*").Select(m => Regex.Match(m.Value, "stroke-dasharray=\"([^\"]*)\"").Value).Distinct().Count());
        var colours = Regex.Matches(html, "(?:stroke|fill)=\"(#[0-9a-f]+|[a-z]+)\"").Select(m => m.Groups[1].Value).Distinct();
        Assert.All(colours, c => Assert.Contains(c, new[] { "#000", "#777", "black", "white", "none" }));
        Assert.DoesNotContain("{{", html);
    }

    [Fact]
    public void Json_status_reports_the_rules_and_stock_as_numbers()
    {
        using var trial = TwoRounds();
        var status = JsonDocument.Parse(trial.Status().Out).RootElement;
        var stock = status.GetProperty("stock").EnumerateArray().Single();
        Assert.Equal("MP", stock.GetProperty("arm").GetString());
        Assert.Equal(30, stock.GetProperty("stock").GetInt32());
        Assert.Equal(30 - stock.GetProperty("used").GetInt32(), stock.GetProperty("left").GetInt32());
        var drop = status.GetProperty("rules").EnumerateArray().Single(r => r.GetProperty("kind").GetString() == "drop");
        Assert.True(drop.GetProperty("inForce").GetBoolean());
        var mp = status.GetProperty("arms").EnumerateArray().Single(a => a.GetProperty("code").GetString() == "MP");
        Assert.Equal(mp.GetProperty("probabilityBest").GetDouble() < 0.02, drop.GetProperty("holds").GetBoolean());
    }
}
