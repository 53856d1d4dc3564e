using System.Globalization;
using DesignCompiler.Randomness;

namespace DesignCompiler.Tests.Ledger;

/// <summary>
/// Three ledgers, made once for all bad-sheet cases: the cover-crop trial (bernoulli) with round 1
/// recorded and round 2 issued, the aphid trial (counts) and the wheat trial (normal) with round 1
/// issued. Each comes with a correctly filled sheet that a case spoils in one way.
/// </summary>
public sealed class BadSheetFixture : IDisposable
{
    public BadSheetFixture()
    {
        Cover = new LedgerTrial("cover-crops.trial");
        Cover.Issue(1);
        CoverRound1File = Cover.FillBernoulli(1, 5, new Dictionary<string, double> { ["OV"] = 0.6, ["RC"] = 0.7, ["MP"] = 0.5, ["BP"] = 0.6 });
        var recorded = Cover.Record(CoverRound1File);
        Assert.True(recorded.ExitCode == 0, recorded.Error);
        Cover.Issue(2);
        CoverRound2 = Lines(Cover.FillBernoulli(2, 6, new Dictionary<string, double> { ["OV"] = 0.6, ["RC"] = 0.7, ["MP"] = 0.5, ["BP"] = 0.6 }));

        Aphids = new LedgerTrial("aphid-margins.trial");
        Aphids.Issue(1);
        AphidRound1 = Lines(Aphids.Fill(1, 7, (string _, ref Xoshiro256StarStar rng) => rng.NextInt(40).ToString(CultureInfo.InvariantCulture)));

        Wheat = new LedgerTrial("nitrogen-rates.trial");
        Wheat.Issue(1);
        WheatRound1 = Lines(Wheat.Fill(1, 8, (string _, ref Xoshiro256StarStar rng) =>
            (6 + 3 * rng.NextDouble()).ToString("0.00", CultureInfo.InvariantCulture)));
    }

    public LedgerTrial Cover { get; }
    public LedgerTrial Aphids { get; }
    public LedgerTrial Wheat { get; }
    public string CoverRound1File { get; }
    public IReadOnlyList<string> CoverRound2 { get; }
    public IReadOnlyList<string> AphidRound1 { get; }
    public IReadOnlyList<string> WheatRound1 { get; }

    private static List<string> Lines(string path) =>
        File.ReadAllText(path).Split("\r\n").Where(l => l.Length > 0).ToList();

    public void Dispose()
    {
        Cover.Dispose();
        Aphids.Dispose();
        Wheat.Dispose();
    }
}
