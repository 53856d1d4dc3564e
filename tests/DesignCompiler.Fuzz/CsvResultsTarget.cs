using System.Text;
using DesignCompiler.Results;

namespace DesignCompiler.Fuzz;

/// <summary>
/// A returned results sheet's bytes, taken the way <c>trialc record</c> takes them: decoded,
/// split as CSV and checked against round 1 of the cover-crop example, every diagnostic formatted.
/// </summary>
internal sealed class CsvResultsTarget : IFuzzTarget
{
    public string Name => "csv";

    public string Description => "returned results sheet (CSV): reader and checker against round 1 of examples/cover-crops.trial";

    public IReadOnlyList<string> SeedPatterns => [];

    public void Run(byte[] input) => ResultsCheck.Run(input, "returned.csv");

    public IEnumerable<byte[]> WarmUpInputs() => GeneratedSeeds().Select(s => s.Content);

    public IEnumerable<(string Name, byte[] Content)> GeneratedSeeds()
    {
        var round = IssuedRound.CoverCrops;
        var blank = Encoding.UTF8.GetString(round.BlankSheet);
        var lines = blank.Split("\r\n").Where(l => l.Length > 0).ToList();
        var filled = lines.Select((l, i) => i == 0 ? l : Fill(l, (i * 7 % 5) < 3 ? "1" : "0")).ToList();
        yield return ("blank.csv", round.BlankSheet);
        yield return ("filled.csv", Join(filled));
        yield return ("filled-lf.csv", Encoding.UTF8.GetBytes(string.Join("\n", filled) + "\n"));
        yield return ("bom.csv", [0xEF, 0xBB, 0xBF, .. Join(filled)]);
        yield return ("missing.csv", Join(filled.Select((l, i) => i == 3 ? Fill(l, "missing: flooded") : l)));
        yield return ("quoted-notes.csv", Join(filled.Select((l, i) => i == 2 ? l + "\"wet, \"\"north\"\" corner\"" : l)));
        yield return ("semicolons.csv", Join(filled.Select(l => l.Replace(',', ';'))));
        yield return ("unclosed-quote.csv", Join(filled.Select((l, i) => i == 4 ? l + "\"wet corner" : l)));
        yield return ("value-2.csv", Join(filled.Select((l, i) => i == 1 ? Fill(l, "2") : l)));
        yield return ("header-only.csv", Join(filled.Take(1)));
        yield return ("row-missing.csv", Join(filled.Where((_, i) => i != 5)));
        yield return ("row-twice.csv", Join([.. filled, filled[3]]));
        yield return ("utf16.csv", Encoding.Unicode.GetPreamble().Concat(Encoding.Unicode.GetBytes(string.Join("\r\n", filled))).ToArray());
    }

    /// <summary>Writes the outcome column of a sheet line (the eighth of nine; notes stay empty).</summary>
    private static string Fill(string line, string outcome)
    {
        var fields = line.Split(',');
        fields[SheetColumns.Outcome] = outcome;
        return string.Join(',', fields);
    }

    private static byte[] Join(IEnumerable<string> lines) => Encoding.UTF8.GetBytes(string.Concat(lines.Select(l => l + "\r\n")));
}
