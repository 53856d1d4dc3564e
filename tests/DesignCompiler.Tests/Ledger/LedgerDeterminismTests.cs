using System.Globalization;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Ledger;

/// <summary>The same ledger gives the same files byte for byte, under any culture; the plan JSON holds no date.</summary>
public sealed class LedgerDeterminismTests
{
    [Fact]
    public void The_same_ledger_gives_byte_identical_outputs_under_de_DE()
    {
        using var trial = new LedgerTrial("nitrogen-rates.trial");
        trial.Issue(1);
        var sheet = trial.Fill(1, 41, (string _, ref DesignCompiler.Randomness.Xoshiro256StarStar rng) =>
            (6.5 + 2.5 * rng.NextDouble()).ToString("0.000", CultureInfo.InvariantCulture));
        Assert.Equal(0, trial.Record(sheet).ExitCode);
        trial.Issue(2);

        var invariant = trial.File("invariant");
        var german = trial.File("german");
        var saved = (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture);
        Trialc.Run status, statusGerman, export, exportGerman;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.CurrentUICulture = CultureInfo.InvariantCulture;
            Assert.Equal(0, Trialc.Invoke("compile", trial.Design, "--ledger", trial.Ledger, "--out", invariant).ExitCode);
            status = trial.Status();
            export = Trialc.Invoke("export", "--ledger", trial.Ledger);
            CultureInfo.CurrentCulture = CultureInfo.CurrentUICulture = CultureInfo.GetCultureInfo("de-DE");
            Assert.Equal(0, Trialc.Invoke("compile", trial.Design, "--ledger", trial.Ledger, "--out", german).ExitCode);
            statusGerman = trial.Status();
            exportGerman = Trialc.Invoke("export", "--ledger", trial.Ledger);
        }
        finally
        {
            (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture) = saved;
        }

        var files = Directory.GetFiles(invariant).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(["nitrogen-rates-round2-report.html", "nitrogen-rates-round2.csv", "nitrogen-rates-round2.html", "nitrogen-rates-round2.json",
            "nitrogen-rates-round2.md", "nitrogen-rates-round2.xlsx"], files);
        foreach (var file in files)
        {
            Assert.Equal(File.ReadAllBytes(Path.Combine(trial.OutFolder(2), file!)), File.ReadAllBytes(Path.Combine(invariant, file!)));
            Assert.Equal(File.ReadAllBytes(Path.Combine(invariant, file!)), File.ReadAllBytes(Path.Combine(german, file!)));
        }
        Assert.Equal(status.Out, statusGerman.Out);
        Assert.Equal(export.Out, exportGerman.Out);
        Assert.Matches(@"\r\n1,\w+,[\w-]+,\d+,\d+,\w+,\d+\.\d+,,\d{4}-", export.Out);

        // The plan JSON is clock-free; only the printed sheet carries the date issued.
        var json = File.ReadAllText(Path.Combine(invariant, "nitrogen-rates-round2.json"));
        Assert.DoesNotMatch(@"\d{4}-\d{2}-\d{2}", json);
        Assert.Matches(@"Date issued: \d{4}-\d{2}-\d{2}<", File.ReadAllText(Path.Combine(invariant, "nitrogen-rates-round2.html")));
    }
}
