using DesignCompiler.Tests.Ledger;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Faults;

/// <summary>
/// A ledger held open by another program (a database browser, a backup tool, a script) with an
/// exclusive lock: trialc waits its stated 5 s, then says so, exits 1 and changes nothing.
/// LedgerReliabilityTests covers the same with another trialc holding the lock.
/// </summary>
public sealed class LedgerLockedTests
{
    private static readonly Dictionary<string, double> Rates = new() { ["OV"] = 0.6, ["RC"] = 0.7, ["MP"] = 0.5, ["BP"] = 0.6 };

    [Fact]
    public void Compile_against_a_ledger_another_program_has_locked_fails_clearly_and_writes_nothing()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        Assert.Equal(0, trial.Record(trial.FillBernoulli(1, 31, Rates)).ExitCode);
        var before = LedgerDump.Of(trial.Ledger);

        Trialc.Run compile, record;
        using (var other = LedgerDump.Open(trial.Ledger))
        {
            using var hold = other.CreateCommand();
            hold.CommandText = "BEGIN EXCLUSIVE";
            hold.ExecuteNonQuery();
            compile = trial.Compile(2);
            record = trial.Record(trial.FillBernoulli(1, 32, Rates, "again.csv"));
        }

        foreach (var run in new[] { compile, record })
        {
            Assert.Equal(1, run.ExitCode);
            Assert.Contains($"{trial.Ledger}: error TD4103: the ledger is busy: another trialc, or another program that has the file open, has held its lock for over 5 s", run.Error);
            Assert.DoesNotContain("Exception", run.Error);
        }
        Assert.False(Directory.Exists(trial.OutFolder(2)) && Directory.EnumerateFileSystemEntries(trial.OutFolder(2)).Any(),
            "no sheet of round 2 may be written while the ledger cannot record its issue");
        Assert.Equal(before, LedgerDump.Of(trial.Ledger));
        // Once the other program lets go, the same command succeeds.
        Assert.Equal(0, trial.Compile(2).ExitCode);
    }
}
