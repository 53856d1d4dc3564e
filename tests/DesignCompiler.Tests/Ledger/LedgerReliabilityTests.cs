using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Ledger;

/// <summary>
/// The ledger under the things that happen to files: a command killed mid-write, two commands
/// at once, edits made with other tools, a truncated file, the wrong file.
/// </summary>
public sealed class LedgerReliabilityTests
{
    private static readonly Dictionary<string, double> Rates = new() { ["OV"] = 0.6, ["RC"] = 0.7, ["MP"] = 0.5, ["BP"] = 0.6 };

    private static Dictionary<string, string> Pause(int milliseconds) =>
        new() { ["TRIALC_TEST_PAUSE_IN_TRANSACTION_MS"] = milliseconds.ToString(System.Globalization.CultureInfo.InvariantCulture) };

    [Fact]
    public void A_record_killed_inside_its_transaction_leaves_the_ledger_as_before_and_a_retry_succeeds()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var sheet = trial.FillBernoulli(1, 21, Rates);
        var before = LedgerDump.Of(trial.Ledger);

        using (var child = TrialcChild.Start(Pause(60_000), "record", trial.Design, "--ledger", trial.Ledger, sheet))
        {
            child.WaitUntilInsideTransaction(TimeSpan.FromSeconds(30));
            child.Kill();
        }

        // The rows were written inside the open transaction; the kill left them only in the journal.
        Assert.Equal(before, LedgerDump.Of(trial.Ledger));
        Assert.Equal(0, trial.Verify().ExitCode);
        var retry = trial.Record(sheet);
        Assert.True(retry.ExitCode == 0, retry.Error);
        Assert.Equal(36, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM outcomes"));
        Assert.Equal(0, trial.Verify().ExitCode);
    }

    [Fact]
    public void Two_records_at_once_record_the_round_once_and_the_second_is_told_why()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var sheet = trial.FillBernoulli(1, 22, Rates);

        var crew = new Dictionary<string, string>(Pause(1500)) { ["USER"] = "crew-north", ["USERNAME"] = "" };
        using var first = TrialcChild.Start(crew, "record", trial.Design, "--ledger", trial.Ledger, sheet);
        first.WaitUntilInsideTransaction(TimeSpan.FromSeconds(30));
        // The second waits for the first's lock, then finds the file recorded.
        var second = trial.Record(sheet);
        Assert.Equal(0, first.WaitForExit(TimeSpan.FromSeconds(30)));

        Assert.Equal(1, second.ExitCode);
        Assert.Contains("error TD4013: this file is already recorded as round 1", second.Error);
        Assert.Equal(1, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM records"));
        // Who wrote the entry comes from the environment of the command that wrote it.
        Assert.Equal(1, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM entries WHERE kind = 'record' AND user_name = 'crew-north'"));
        Assert.Equal(36, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM outcomes"));
        Assert.Equal(0, trial.Verify().ExitCode);
    }

    [Fact]
    public void A_ledger_locked_for_longer_than_the_wait_fails_clearly()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var sheet = trial.FillBernoulli(1, 23, Rates);
        var before = LedgerDump.Of(trial.Ledger);

        using var holder = TrialcChild.Start(Pause(60_000), "record", trial.Design, "--ledger", trial.Ledger, sheet);
        holder.WaitUntilInsideTransaction(TimeSpan.FromSeconds(30));
        var waited = System.Diagnostics.Stopwatch.StartNew();
        var blocked = trial.Record(sheet);
        waited.Stop();
        holder.Kill();

        Assert.Equal(1, blocked.ExitCode);
        Assert.Contains($"{trial.Ledger}: error TD4103: the ledger is busy: another trialc, or another program that has the file open, has held its lock for over 5 s", blocked.Error);
        Assert.DoesNotContain("Exception", blocked.Error);
        Assert.True(waited.Elapsed >= TimeSpan.FromSeconds(4), "it should have waited for the lock");
        Assert.Equal(before, LedgerDump.Of(trial.Ledger));
    }

    [Fact]
    public void An_outcome_changed_outside_trialc_is_found_by_verify_and_compile_refuses()
    {
        using var trial = RecordedRound();
        LedgerDump.Execute(trial.Ledger, "UPDATE outcomes SET value = 1 - value, value_text = CAST(1 - value AS INTEGER) WHERE round = 1 AND ordinal = 3");

        var verify = trial.Verify();
        Assert.Equal(1, verify.ExitCode);
        Assert.Contains($"{trial.Ledger}: error TD4104: the ledger was changed outside trialc: entry 2 (results of round 1 recorded", verify.Error);
        Assert.Contains("no longer matches its hash", verify.Error);

        var compile = trial.Compile(2);
        Assert.Equal(1, compile.ExitCode);
        Assert.Contains("error TD4104", compile.Error);
        Assert.False(Directory.Exists(trial.OutFolder(2)));
        Assert.Equal(1, trial.Status().ExitCode);
    }

    [Theory]
    [InlineData("DELETE FROM outcomes WHERE round = 1 AND ordinal = 7", "entry 2 ")]
    [InlineData("DELETE FROM plots WHERE round = 1 AND ordinal = 0", "entry 1 ")]
    [InlineData("UPDATE plots SET arm = CASE arm WHEN 'OV' THEN 'RC' ELSE 'OV' END WHERE round = 1 AND ordinal = 5", "entry 1 ")]
    [InlineData("UPDATE outcomes SET ordinal = -1 WHERE round = 1 AND ordinal = 1; UPDATE outcomes SET ordinal = 1 WHERE round = 1 AND ordinal = 2; UPDATE outcomes SET ordinal = 2 WHERE ordinal = -1", "entry 2 ")]
    [InlineData("UPDATE entries SET seq = 99 WHERE seq = 1; UPDATE entries SET seq = 1 WHERE seq = 2; UPDATE entries SET seq = 2 WHERE seq = 99", "entry 1 ")]
    [InlineData("UPDATE entries SET user_name = 'someone else' WHERE seq = 1", "entry 1 ")]
    [InlineData("DELETE FROM entries WHERE seq = 2; DELETE FROM outcomes; DELETE FROM records", "entries after 1 were removed")]
    [InlineData("UPDATE designs SET text = text || ' '", "design text")]
    public void Any_edit_made_outside_trialc_is_found(string edit, string named)
    {
        using var trial = RecordedRound();
        LedgerDump.Execute(trial.Ledger, edit);
        var verify = trial.Verify();
        Assert.Equal(1, verify.ExitCode);
        Assert.Contains("error TD4104", verify.Error);
        Assert.Contains(named, verify.Error);
        Assert.Equal(1, trial.Compile(2).ExitCode);
    }

    [Fact]
    public void A_truncated_ledger_is_a_clear_error()
    {
        using var trial = RecordedRound();
        var bytes = File.ReadAllBytes(trial.Ledger);
        foreach (var length in new[] { 60, 4096, bytes.Length / 2 })
        {
            File.WriteAllBytes(trial.Ledger, bytes[..length]);
            foreach (var run in new[] { trial.Verify(), trial.Compile(2), trial.Record(trial.File("returned-round1.csv")), trial.Status() })
            {
                Assert.Equal(1, run.ExitCode);
                Assert.Matches($"{System.Text.RegularExpressions.Regex.Escape(trial.Ledger)}: error TD41(02|04): ", run.Error);
                Assert.DoesNotContain("Exception", run.Error);
                Assert.DoesNotContain(" at ", run.Error);
            }
        }
    }

    [Fact]
    public void A_text_file_or_another_database_given_as_ledger_is_a_clear_error()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        var text = trial.File("notes.txt");
        File.WriteAllText(text, "round 1 sown on the 3rd, north field wet\n");
        var run = Trialc.Invoke("verify", "--ledger", text);
        Assert.Equal(1, run.ExitCode);
        Assert.Contains($"{text}: error TD4102: this is not a trial ledger: it is a text file (it begins \"round 1 sown on the 3rd,\"), not an SQLite ledger", run.Error);
        var compile = Trialc.Invoke("compile", trial.Design, "--ledger", text, "--out", trial.OutFolder(1));
        Assert.Equal(1, compile.ExitCode);
        Assert.Contains("error TD4102", compile.Error);
        Assert.Equal("round 1 sown on the 3rd, north field wet\n", File.ReadAllText(text));

        var other = trial.File("other.db");
        LedgerDump.CreateDatabase(other, "CREATE TABLE t (x)");
        var foreign = Trialc.Invoke("verify", "--ledger", other);
        Assert.Equal(1, foreign.ExitCode);
        Assert.Contains("error TD4102: this is not a trial ledger: it is an SQLite database of another program", foreign.Error);

        var missing = Trialc.Invoke("record", trial.Design, "--ledger", trial.File("none.ledger"), text);
        Assert.Equal(1, missing.ExitCode);
        Assert.Contains("error TD4105: there is no ledger here", missing.Error);
    }

    /// <summary>Round 1 issued and recorded.</summary>
    private static LedgerTrial RecordedRound()
    {
        var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var run = trial.Record(trial.FillBernoulli(1, 24, Rates));
        Assert.True(run.ExitCode == 0, run.Error);
        Assert.Equal(0, trial.Verify().ExitCode);
        return trial;
    }
}
