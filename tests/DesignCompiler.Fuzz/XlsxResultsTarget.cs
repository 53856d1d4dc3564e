namespace DesignCompiler.Fuzz;

/// <summary>
/// A returned crew workbook's bytes, taken the way <c>trialc record</c> takes them: recognised as a
/// zip, read sheet by sheet into the one table shape the CSV reader also produces, and checked against
/// round 1 of the cover-crop example, every diagnostic formatted.
/// </summary>
internal sealed class XlsxResultsTarget : IFuzzTarget
{
    public string Name => "xlsx";

    public string Description => "returned results workbook (XLSX): reader and checker against round 1 of examples/cover-crops.trial";

    public IReadOnlyList<string> SeedPatterns => [];

    public void Run(byte[] input) => ResultsCheck.Run(input, "returned.xlsx");

    public IEnumerable<(string Name, byte[] Content)> GeneratedSeeds()
    {
        var workbook = IssuedRound.CoverCrops.BlankWorkbook;
        yield return ("blank.xlsx", workbook);
        // A workbook cut short, as a sync that stopped half-way leaves it.
        yield return ("truncated.xlsx", workbook[..(workbook.Length / 2)]);
        // The CSV sheet under a workbook's name: the reader tells them apart by content, so this
        // reaches the text path that short mutated inputs take.
        yield return ("csv-named-xlsx.xlsx", IssuedRound.CoverCrops.BlankSheet);
    }

    public IEnumerable<byte[]> WarmUpInputs() => GeneratedSeeds().Select(s => s.Content);
}
