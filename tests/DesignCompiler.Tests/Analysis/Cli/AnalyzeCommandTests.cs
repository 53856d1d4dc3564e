using System.Globalization;
using System.Text.Json;
using DesignCompiler.Results;
using DesignCompiler.Tests.Ledger;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Analysis.Cli;

/// <summary>
/// <c>trialc analyze</c> end to end: a ledger built by compile and record, or a tidy CSV, gives the
/// per-arm estimates and, for a balanced trial, the classical RCBD table.
/// </summary>
public sealed class AnalyzeCommandTests
{
    // K. A. Gomez and A. A. Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed., Table 2.5:
    // grain yield (kg/ha) at six seeding rates in four replications (shared/REFERENCES.md §10; typed from memory
    // there, but they reproduce every figure of the published Table 2.6).
    private static readonly Dictionary<string, double[]> GomezYields = new()
    {
        ["S25"] = [5113, 5398, 5307, 4678],
        ["S50"] = [5346, 5952, 4719, 4264],
        ["S75"] = [5272, 5713, 5483, 4749],
        ["S100"] = [5164, 4831, 4986, 4410],
        ["S125"] = [4804, 4848, 4432, 4748],
        ["S150"] = [5254, 4542, 4919, 4098],
    };

    /// <summary>The issued sheet with each plot's yield taken from the table by its arm and block (rep1..rep4).</summary>
    private static string FillFromTable(LedgerTrial trial, Func<string, int, string> value)
    {
        var rows = trial.SheetRows(1);
        var lines = new List<string> { string.Join(",", rows[0]) };
        foreach (var row in rows.Skip(1).Where(r => r.Length > SheetColumns.Outcome))
        {
            var rep = int.Parse(row[SheetColumns.Block]["rep".Length..], CultureInfo.InvariantCulture) - 1;
            row[SheetColumns.Outcome] = value(row[SheetColumns.Arm], rep);
            lines.Add(string.Join(",", row));
        }
        var path = trial.File("returned.csv");
        LedgerTrial.WriteLines(path, lines);
        return path;
    }

    [Fact]
    public void A_ledger_of_the_handbook_yields_reproduces_the_handbook_anova()
    {
        using var trial = new LedgerTrial("seeding-rates.trial");
        trial.Issue(1);
        var recorded = trial.Record(FillFromTable(trial, (arm, rep) => GomezYields[arm][rep].ToString(CultureInfo.InvariantCulture)));
        Assert.True(recorded.ExitCode == 0, recorded.Error);

        var run = Trialc.Invoke("analyze", trial.Design, "--ledger", trial.Ledger, "--format", "json", "--reps", "0");
        Assert.True(run.ExitCode == 0, run.Error);
        using var json = JsonDocument.Parse(run.Out);
        var rcbd = json.RootElement.GetProperty("rcbd");
        var lines = rcbd.GetProperty("anova").EnumerateArray().ToDictionary(l => l.GetProperty("source").GetString()!);
        // Table 2.6: replication SS 1,944,361 (3 df); treatment SS 1,198,331 (5 df); error SS 1,658,376 (15 df); F = 2.17; CV 6.7 %.
        Assert.Equal(1_944_361, lines["replication"].GetProperty("ss").GetDouble(), 0);
        Assert.Equal(3, lines["replication"].GetProperty("df").GetInt32());
        Assert.Equal(1_198_331, lines["treatment"].GetProperty("ss").GetDouble(), 0);
        Assert.Equal(5, lines["treatment"].GetProperty("df").GetInt32());
        Assert.Equal(1_658_376, lines["error"].GetProperty("ss").GetDouble(), 0);
        Assert.Equal(15, lines["error"].GetProperty("df").GetInt32());
        Assert.Equal(2.17, lines["treatment"].GetProperty("f").GetDouble(), 2);
        Assert.Equal(6.7, rcbd.GetProperty("cvPercent").GetDouble(), 1);
        Assert.Equal(4960, rcbd.GetProperty("grandMean").GetDouble(), 0);

        // With equal allocation the naive and round-stratified means are the treatment means (common practice).
        var s25 = json.RootElement.GetProperty("arms").EnumerateArray().First(a => a.GetProperty("code").GetString() == "S25");
        Assert.Equal(GomezYields["S25"].Average(), s25.GetProperty("naive").GetProperty("mean").GetDouble(), 9);
        Assert.Equal(GomezYields["S25"].Average(), s25.GetProperty("roundStratified").GetProperty("mean").GetDouble(), 9);

        var text = Trialc.Invoke("analyze", trial.Design, "--ledger", trial.Ledger, "--reps", "0");
        Assert.Contains("1,944,361", text.Out);
        Assert.Contains("Randomized complete block analysis of variance (6 treatments, 4 replicates)", text.Out);
    }

    [Fact]
    public void A_lost_plot_is_estimated_by_the_missing_plot_formula()
    {
        // Yates (1933): X = (tT + bB − G)/((t − 1)(b − 1)), T and B the totals of the plot's treatment and block
        // without it, G the grand total without it. Here S50 in rep 2 is lost.
        using var trial = new LedgerTrial("seeding-rates.trial");
        trial.Issue(1);
        // A crew marks a lost plot 'missing: reason' in the outcome column.
        var path = FillFromTable(trial, (arm, rep) => arm == "S50" && rep == 1 ? "missing: flooded" : GomezYields[arm][rep].ToString(CultureInfo.InvariantCulture));
        var recorded = trial.Record(path);
        Assert.True(recorded.ExitCode == 0, recorded.Error + recorded.Out);

        var run = Trialc.Invoke("analyze", trial.Design, "--ledger", trial.Ledger, "--format", "json", "--reps", "0");
        Assert.True(run.ExitCode == 0, run.Error);
        using var json = JsonDocument.Parse(run.Out);
        var estimated = json.RootElement.GetProperty("rcbd").GetProperty("estimatedMissingPlots").EnumerateArray().Single();
        double t = 6, b = 4;
        var treatment = GomezYields["S50"].Sum() - GomezYields["S50"][1];
        var block = GomezYields.Values.Sum(v => v[1]) - GomezYields["S50"][1];
        var grand = GomezYields.Values.Sum(v => v.Sum()) - GomezYields["S50"][1];
        Assert.Equal((t * treatment + b * block - grand) / ((t - 1) * (b - 1)), estimated.GetProperty("value").GetDouble(), 6);
        Assert.Equal(14, json.RootElement.GetProperty("rcbd").GetProperty("anova")[2].GetProperty("df").GetInt32());
    }

    [Fact]
    public void The_export_csv_analyses_like_the_ledger_and_bad_rows_are_placed()
    {
        using var trial = new LedgerTrial("seeding-rates.trial");
        trial.Issue(1);
        Assert.Equal(0, trial.Record(FillFromTable(trial, (arm, rep) => GomezYields[arm][rep].ToString(CultureInfo.InvariantCulture))).ExitCode);
        var export = trial.File("tidy.csv");
        Assert.Equal(0, Trialc.Invoke("export", "--ledger", trial.Ledger, "--out", export).ExitCode);

        var fromLedger = Trialc.Invoke("analyze", trial.Design, "--ledger", trial.Ledger, "--format", "json", "--reps", "20");
        var fromData = Trialc.Invoke("analyze", trial.Design, "--data", export, "--format", "json", "--reps", "20");
        Assert.True(fromData.ExitCode == 0, fromData.Error);
        Assert.Equal(fromLedger.Out, fromData.Out);

        var broken = File.ReadAllLines(export);
        broken[3] = broken[3].Replace(",S75,", ",S57,", StringComparison.Ordinal).Replace(",S100,", ",S01,", StringComparison.Ordinal)
            .Replace(",S25,", ",S52,", StringComparison.Ordinal).Replace(",S50,", ",S05,", StringComparison.Ordinal)
            .Replace(",S125,", ",S512,", StringComparison.Ordinal).Replace(",S150,", ",S015,", StringComparison.Ordinal);
        var bad = trial.File("bad.csv");
        LedgerTrial.WriteLines(bad, broken);
        var run = Trialc.Invoke("analyze", trial.Design, "--data", bad, "--reps", "0");
        Assert.Equal(1, run.ExitCode);
        Assert.Matches(@"bad\.csv:4:\d+: error TD4206: the design has no arm 'S\d+'", run.Error);
        Assert.Contains("arms of this design: S25, S50", run.Error);
        Assert.DoesNotContain("   at ", run.Error);
    }

    [Fact]
    public void Simulated_coverage_of_the_estimators_is_reported_per_scenario()
    {
        using var trial = new LedgerTrial("seeding-rates.trial");
        trial.Issue(1);
        Assert.Equal(0, trial.Record(FillFromTable(trial, (arm, rep) => GomezYields[arm][rep].ToString(CultureInfo.InvariantCulture))).ExitCode);
        var run = Trialc.Invoke("analyze", trial.Design, "--ledger", trial.Ledger, "--format", "json", "--reps", "200");
        Assert.True(run.ExitCode == 0, run.Error);
        using var json = JsonDocument.Parse(run.Out);
        var scenario = json.RootElement.GetProperty("simulated")[0];
        Assert.Equal("rates differ", scenario.GetProperty("scenario").GetString());
        foreach (var arm in scenario.GetProperty("arms").EnumerateArray())
        {
            // Under equal allocation in complete blocks the naive mean is unbiased and its t interval covers 95 % of the
            // time (common practice); 200 trials give a binomial standard error of about 0.015, so allow 4 of them.
            var naive = arm.GetProperty("naive");
            Assert.InRange(naive.GetProperty("coverage95").GetDouble(), 0.95 - 0.062, 0.95 + 0.05);
            Assert.InRange(naive.GetProperty("bias").GetDouble(), -4 * naive.GetProperty("biasSe").GetDouble(), 4 * naive.GetProperty("biasSe").GetDouble());
        }
    }
}
