using System.Text.Json;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Ledger;

/// <summary>
/// The shipped cover-crop design run as a trial through its ledger: compile, fill in invented
/// outcomes, record, look at the status, compile again, round after round.
/// </summary>
public sealed class LedgerWorkflowTests
{
    /// <summary>Invented establishment rates: MP clearly worst, the other three close, so the drop rule fires and the stop rule does not.</summary>
    private static readonly Dictionary<string, double> CloseRace = new() { ["OV"] = 0.60, ["RC"] = 0.70, ["MP"] = 0.15, ["BP"] = 0.62 };

    [Fact]
    public void Four_rounds_run_end_to_end_with_the_drop_rule_removing_the_weak_mix()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        var dropped = new HashSet<string>();
        for (var round = 1; round <= 4; round++)
        {
            trial.Issue(round);
            var plan = JsonDocument.Parse(File.ReadAllText(Path.Combine(trial.OutFolder(round), $"cover-crops-round{round}.json"))).RootElement;
            var arms = plan.GetProperty("arms").EnumerateArray().ToList();
            // Once dropped, an arm gets no plots and stays dropped.
            foreach (var arm in arms.Where(a => dropped.Contains(a.GetProperty("code").GetString()!)))
            {
                Assert.Equal("dropped", arm.GetProperty("status").GetString());
                Assert.Equal(0, arm.GetProperty("plots").GetInt32());
            }
            foreach (var arm in arms.Where(a => a.GetProperty("status").GetString() == "dropped"))
                dropped.Add(arm.GetProperty("code").GetString()!);

            var sheet = File.ReadAllText(trial.Sheet(round));
            // The trace line names the round and the ledger's issue date; the header follows it.
            Assert.Matches(@"^# Late-sown cover mixes; round \d of 4; design [0-9a-f]{12}; seed 20260815; policy thompson; trialc [0-9.]+; issued \d{4}-\d{2}-\d{2}\r\nround,block,plot,row,column,arm,label,outcome,notes\r\n", sheet);
            var html = File.ReadAllText(Path.Combine(trial.OutFolder(round), $"cover-crops-round{round}.html"));
            Assert.Matches(@"Date issued: \d{4}-\d{2}-\d{2}<", html);

            var record = trial.Record(trial.FillBernoulli(round, 1000 + (ulong)round, CloseRace));
            Assert.True(record.ExitCode == 0, record.Error);
            Assert.Contains($"recorded round {round}", record.Out);

            var status = StatusJson(trial);
            Assert.Equal(round, status.GetProperty("roundsRecorded").GetInt32());
            Assert.Equal(36 * round, status.GetProperty("plotsRecorded").GetInt32());
            var standing = status.GetProperty("arms").EnumerateArray().ToList();
            Assert.Equal(36 * round, standing.Sum(a => a.GetProperty("plotsRecorded").GetInt32()));
            // P(best) is a probability distribution over the arms still in the trial (definition; common practice).
            Assert.Equal(1.0, standing.Sum(a => a.GetProperty("probabilityBest").GetDouble()), 6);
            Assert.All(standing.Where(a => dropped.Contains(a.GetProperty("code").GetString()!)),
                a => Assert.Equal(0.0, a.GetProperty("probabilityBest").GetDouble()));
            var byRound = status.GetProperty("probabilityBestByRound").EnumerateArray().ToList();
            Assert.Equal(round + 1, byRound.Count);
            Assert.All(byRound, p => Assert.Equal(1.0, p.GetProperty("probabilityBest").EnumerateObject().Sum(x => x.Value.GetDouble()), 6));
        }

        // MP does worst by far; 'drop when best < 0.02 after round 2' removes it from round 3 on.
        Assert.Contains("MP", dropped);
        Assert.DoesNotContain("OV", dropped); // the control is never dropped

        var done = trial.Compile(5);
        Assert.Equal(0, done.ExitCode);
        Assert.Contains("all 4 rounds are issued and recorded", done.Out);
        Assert.Equal("complete", StatusJson(trial).GetProperty("next").GetProperty("kind").GetString());
        Assert.Equal(0, trial.Verify().ExitCode);
    }

    [Fact]
    public void The_posterior_in_status_is_the_beta_update_of_the_recorded_plots()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var sheet = trial.FillBernoulli(1, 7, CloseRace);
        Assert.Equal(0, trial.Record(sheet).ExitCode);

        var rows = trial.SheetRows(1).Skip(1).ToList();
        var returned = File.ReadAllLines(sheet).Skip(1).Select(l => l.Split(',')).ToList();
        var status = StatusJson(trial);
        foreach (var arm in status.GetProperty("arms").EnumerateArray())
        {
            var code = arm.GetProperty("code").GetString()!;
            var plots = returned.Where(r => r[5] == code).ToList();
            var successes = plots.Count(r => r[7] == "1");
            // Beta(a, b) prior with s successes in n plots gives Beta(a + s, b + n − s), mean (a + s)/(a + b + n)
            // (conjugacy of the beta; common practice). OV has prior beta(2, 2), the others beta(1, 1).
            var (a, b) = code == "OV" ? (2.0, 2.0) : (1.0, 1.0);
            Assert.Equal((a + successes) / (a + b + plots.Count), arm.GetProperty("posteriorMean").GetDouble(), 12);
            Assert.Equal(rows.Count(r => r[5] == code), arm.GetProperty("plotsIssued").GetInt32());
        }
    }

    [Fact]
    public void Compiling_again_before_results_reissues_the_identical_sheets()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var before = LedgerDump.Of(trial.Ledger);
        var again = Trialc.Invoke("compile", trial.Design, "--ledger", trial.Ledger, "--out", trial.File("again"));
        Assert.Equal(0, again.ExitCode);
        Assert.Contains("awaits results for 36 plots; its sheets are issued again unchanged", again.Out);
        foreach (var file in Directory.GetFiles(trial.OutFolder(1)))
            Assert.Equal(File.ReadAllBytes(file), File.ReadAllBytes(Path.Combine(trial.File("again"), Path.GetFileName(file))));
        Assert.Equal(before, LedgerDump.Of(trial.Ledger));
    }

    [Fact]
    public void Asking_for_the_next_round_while_results_are_outstanding_is_refused_naming_the_plots()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var run = trial.Compile(2, "--round", "2");
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("error TD4113: round 1 still awaits results for 36 plot(s): north-1-1, north-1-2,", run.Error);
        Assert.Contains("and 24 more", run.Error);
        Assert.False(Directory.Exists(trial.OutFolder(2)));
    }

    [Fact]
    public void A_stop_rule_that_holds_issues_nothing_and_says_so()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        var clearWinner = new Dictionary<string, double> { ["OV"] = 0.25, ["RC"] = 0.97, ["MP"] = 0.2, ["BP"] = 0.3 };
        for (var round = 1; round <= 2; round++)
        {
            trial.Issue(round);
            Assert.Equal(0, trial.Record(trial.FillBernoulli(round, 11, clearWinner)).ExitCode);
        }
        var before = LedgerDump.Of(trial.Ledger);

        var run = trial.Compile(3);
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("the trial stops after round 2: 'best >= 0.95' holds for RC", run.Out);
        Assert.Contains("round 3 is not issued", run.Out);
        Assert.False(Directory.Exists(trial.OutFolder(3)));
        Assert.Equal(before, LedgerDump.Of(trial.Ledger));
        var status = StatusJson(trial);
        Assert.Equal("stopped", status.GetProperty("next").GetProperty("kind").GetString());
        var stop = status.GetProperty("rules").EnumerateArray().Single(r => r.GetProperty("kind").GetString() == "stop");
        Assert.True(stop.GetProperty("holds").GetBoolean());
    }

    [Fact]
    public void Export_gives_one_tidy_row_per_plot_and_round()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var rows = trial.SheetRows(1);
        rows[1][SheetColumnsOutcome] = "missing: hail";
        var lines = new List<string> { string.Join(",", rows[0]) };
        lines.AddRange(rows.Skip(1).Select((r, k) => { if (k > 0) r[SheetColumnsOutcome] = (k % 2).ToString(System.Globalization.CultureInfo.InvariantCulture); return string.Join(",", r); }));
        var returned = trial.File("returned.csv");
        LedgerTrial.WriteLines(returned, lines);
        Assert.Equal(0, trial.Record(returned).ExitCode);
        trial.Issue(2);

        var exported = trial.File("export.csv");
        var run = Trialc.Invoke("export", "--ledger", trial.Ledger, "--out", exported);
        Assert.Equal(0, run.ExitCode);
        var text = File.ReadAllText(exported);
        var table = text.Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("round,block,plot,row,column,arm,outcome,missing_reason,recorded_at", table[0]);
        Assert.Equal(1 + 36 + 36, table.Length);
        Assert.Matches(@"^1,north,north-1-1,1,1,[A-Z]+,,hail,\d{4}-\d\d-\d\dT\d\d:\d\d:\d\dZ$", table[1]);
        Assert.Matches(@"^1,north,north-1-2,1,2,[A-Z]+,1,,\d{4}-", table[2]);
        Assert.Matches(@"^2,north,north-1-1,1,1,[A-Z]+,,,$", table[37]);
    }

    private const int SheetColumnsOutcome = DesignCompiler.Results.SheetColumns.Outcome;

    private static JsonElement StatusJson(LedgerTrial trial)
    {
        var run = trial.Status();
        Assert.True(run.ExitCode == 0, run.Error);
        return JsonDocument.Parse(run.Out).RootElement.Clone();
    }
}
