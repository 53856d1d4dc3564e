using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Ledger;

/// <summary>A design changed during a trial: refused until amended with a reason, and only when the recorded data still fit.</summary>
public sealed class LedgerAmendmentTests
{
    private static readonly Dictionary<string, double> Rates = new() { ["OV"] = 0.6, ["RC"] = 0.7, ["MP"] = 0.5, ["BP"] = 0.6 };

    private static LedgerTrial RecordedRound()
    {
        var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        Assert.Equal(0, trial.Record(trial.FillBernoulli(1, 31, Rates)).ExitCode);
        return trial;
    }

    [Fact]
    public void A_changed_design_is_refused_then_accepted_with_an_amendment_that_is_recorded()
    {
        using var trial = RecordedRound();
        File.WriteAllText(trial.Design, File.ReadAllText(trial.Design).Replace("limit MP stock 30 plots", "limit MP stock 36 plots   # a second seed lot arrived"));
        var before = LedgerDump.Of(trial.Ledger);

        var refused = trial.Compile(2);
        Assert.Equal(1, refused.ExitCode);
        Assert.Contains("error TD4110: the design text changed since round 1 was issued on", refused.Error);
        Assert.Contains("compile with --amend \"reason\"", refused.Error);
        Assert.Equal(before, LedgerDump.Of(trial.Ledger));
        Assert.Equal(1, trial.Status().ExitCode);

        var amended = trial.Compile(2, "--amend", "second MP seed lot of 6 plots");
        Assert.True(amended.ExitCode == 0, amended.Error);
        Assert.Contains("amended the design", amended.Out);
        Assert.Contains("issued round 2", amended.Out);
        Assert.Equal(1, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM amendments WHERE reason = 'second MP seed lot of 6 plots'"));
        Assert.Equal(2, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM designs"));

        var status = trial.Status("text");
        Assert.Equal(0, status.ExitCode);
        Assert.Contains("second MP seed lot of 6 plots", status.Out);
        Assert.Contains("MP: 36 plots", status.Out);
        Assert.Equal(0, trial.Verify().ExitCode);
    }

    [Fact]
    public void An_amendment_that_removes_a_sown_arm_or_changes_the_family_is_refused()
    {
        using var trial = RecordedRound();
        var original = File.ReadAllText(trial.Design);
        var sown = trial.SheetRows(1).Skip(1).Select(r => r[5]).Distinct().First(c => c != "OV");
        File.WriteAllText(trial.Design, original
            .Replace($"  arm {sown} ", $"  # arm {sown} ")
            .Replace($"limit {sown} stock 30 plots", "")
            .Replace($"{sown} 0.72 ", "").Replace($"{sown} 0.55 ", "")
            .Replace("limit every arm <= 40% per round", "limit every arm <= 60% per round"));
        var check = Trialc.Invoke("check", trial.Design);
        Assert.True(check.ExitCode == 0, check.Error);
        var without = trial.Compile(2, "--amend", "drop an arm");
        Assert.Equal(1, without.ExitCode);
        Assert.Contains($"error TD4111: the amended design does not fit the recorded trial: arm '{sown}' was sown in the trial but is not in the amended design", without.Error);

        File.WriteAllText(trial.Design, original.Replace("established: bernoulli", "established: binomial of 4"));
        var family = trial.Compile(2, "--amend", "count seedlings instead");
        Assert.Equal(1, family.ExitCode);
        Assert.Contains("the outcome was bernoulli and would become binomial of 4", family.Error);
        Assert.Equal(0, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM amendments"));
    }

    [Fact]
    public void Recording_under_a_changed_design_is_refused()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var sheet = trial.FillBernoulli(1, 32, Rates);
        File.AppendAllText(trial.Design, "# edited after the sheets went out\n");
        var run = trial.Record(sheet);
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("error TD4110", run.Error);
        Assert.Equal(0, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM records"));
    }
}
