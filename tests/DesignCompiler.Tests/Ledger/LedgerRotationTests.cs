using System.Globalization;
using DesignCompiler.Randomness;
using static DesignCompiler.Results.SheetColumns;

namespace DesignCompiler.Tests.Ledger;

/// <summary>
/// Rotation rules look at what each plot grew in earlier rounds, so the ledger must give the
/// planner every past round's plots, by arm code, even after an amendment reorders the arms.
/// </summary>
public sealed class LedgerRotationTests
{
    private static string Yield(string arm, ref Xoshiro256StarStar rng) =>
        (18 + 6 * rng.NextDouble() + (arm == "ALL" ? 3 : 0)).ToString("0.0", CultureInfo.InvariantCulture);

    [Fact]
    public void Rounds_compiled_from_the_ledger_keep_the_rotation_rules_even_after_the_arms_are_reordered()
    {
        using var trial = new LedgerTrial("bed-rotation.trial");
        for (var round = 1; round <= 2; round++)
        {
            trial.Issue(round);
            Assert.Equal(0, trial.Record(trial.Fill(round, 70 + (ulong)round, Yield)).ExitCode);
        }

        // Same trial, arms listed in another order: indices change, codes do not.
        var text = File.ReadAllText(trial.Design);
        var bra = "  arm BRA  \"Brassicas (kale, cabbage)\"\n";
        Assert.Contains(bra, text);
        File.WriteAllText(trial.Design, text.Replace(bra, "").Replace("  arm SAL  \"Salad leaves\"\n", "  arm SAL  \"Salad leaves\"\n" + bra));
        var amended = trial.Compile(3, "--amend", "arms listed by family name");
        Assert.True(amended.ExitCode == 0, amended.Error);
        Assert.Equal(0, trial.Record(trial.Fill(3, 73, Yield)).ExitCode);
        trial.Issue(4);

        var byPlot = Enumerable.Range(1, 4)
            .SelectMany(r => trial.SheetRows(r).Skip(1).Select(row => (Round: r, Plot: row[Plot], Arm: row[Arm])))
            .GroupBy(x => x.Plot);
        foreach (var plot in byPlot)
        {
            var arms = plot.OrderBy(x => x.Round).Select(x => x.Arm).ToList();
            Assert.Equal(4, arms.Count);
            for (var r = 1; r < arms.Count; r++)
            {
                // 'rotation every arm rest 2 rounds': not the arm of either of the two rounds before.
                Assert.NotEqual(arms[r - 1], arms[r]);
                if (r >= 2) Assert.NotEqual(arms[r - 2], arms[r]);
                // 'rotation SAL not after BRA'.
                Assert.False(arms[r - 1] == "BRA" && arms[r] == "SAL", $"{plot.Key}: SAL after BRA in round {r + 1}");
            }
        }
        Assert.Equal(0, trial.Verify().ExitCode);
    }
}
