using System.Text.RegularExpressions;
using DesignCompiler.Tests.Ledger;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Sheets;

/// <summary>
/// Inputs the fuzz harness's workbook target saved (tests/DesignCompiler.Fuzz, target xlsx), returned as
/// round 1 of the cover-crop trial through <c>trialc record</c>: the four it flagged as hangs and a few
/// of its final queue that reach different parts of the reader. Each is refused, the ledger unchanged,
/// with its first error at the place the reader names (a workbook cell, a line and column of text, or
/// the whole file); none throws, none takes long, and no NaN or infinity gets into an error.
/// </summary>
/// <remarks>
/// The files are in <c>fuzzed-workbooks/</c>, named for what they hold. The clock here is a hang
/// detector, as in ParserRobustnessTests: 30 s for a record that takes well under a second.
/// </remarks>
public sealed class FuzzedWorkbookTests
{
    private static string Folder => Path.Combine(RepoPaths.Root, "tests", "DesignCompiler.Tests", "Sheets", "fuzzed-workbooks");

    /// <summary>File, then what follows its path at the start of the first error.</summary>
    public static TheoryData<string, string> Inputs() => new()
    {
        // The four the first 30-minute run flagged as hangs (executions 37-77): a few bytes, not a zip, so read as CSV text.
        { "hang-lkpk-and-control-bytes.xlsx", ":1:1: error TD4004: column 1 of the header is 'LKPK' but must be 'round'" },
        { "hang-pk-only.xlsx", ":1:1: error TD4004: column 1 of the header is 'PK' but must be 'round'" },
        { "hang-one-control-byte.xlsx", ":1:1: error TD4004: column 1 of the header is '' but must be 'round'" },
        { "hang-p-and-control-bytes.xlsx", ":1:1: error TD4004: column 1 of the header is 'P' but must be 'round'" },
        // From the final queue, the issued workbook damaged: the zip, the package, the XML, a cell's type, the sheets.
        { "broken-zip-directory.xlsx", ": error TD4030: the file is not a workbook trialc can read: it is a zip archive, but a part of the workbook it lists is missing from it; open it in the spreadsheet and save it again" },
        { "workbook-xml-declaration-broken.xlsx", ": error TD4030: the file is not a workbook trialc can read: it is a zip file without a spreadsheet inside" },
        { "worksheet-data-damaged.xlsx", ": error TD4030: the file is not a workbook trialc can read: it is a zip archive, but damaged or incomplete, as after a download or copy that stopped early;" },
        { "cell-type-not-a-known-value.xlsx", ": error TD4030: the file is not a workbook trialc can read: it is a zip archive, but a part of it holds a value an .xlsx workbook does not allow;" },
        { "rows-damaged-no-cells-left.xlsx", ": error TD4003: the file is empty" },
        { "north-without-header-row.xlsx", ":north!A7: error TD4031: sheet 'north' has cells filled in but no header row" },
        { "sheet-without-a-name.xlsx", ":''!O1: error TD4031: sheet '' has cells filled in but no header row" },
        { "outcomes-left-blank.xlsx", ":north!H7: error TD4020: plot 'north-1-1' has no outcome" },
        // From the final queue, text: a quote never closed, and bytes that are not UTF-8 from the third on.
        { "lone-quote.xlsx", ":1:1: error TD4005: the quoted field that starts here is never closed" },
        { "not-utf8-at-column-3.xlsx", ":1:3: error TD4002: the file is not a CSV text sheet: it is not UTF-8 text from here on" },
    };

    [Theory]
    [MemberData(nameof(Inputs))]
    public async Task A_fuzzed_workbook_is_refused_at_the_place_of_its_first_error_and_nothing_throws(string file, string expected)
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var path = trial.File(file);
        File.Copy(Path.Combine(Folder, file), path);
        var before = File.ReadAllBytes(trial.Ledger);

        var record = Task.Run(() => trial.Record(path));
        Assert.True(await Task.WhenAny(record, Task.Delay(TimeSpan.FromSeconds(30))) == record, $"record did not finish within 30 s for {file}");
        var run = await record;

        Assert.DoesNotContain("   at ", run.Error);
        Assert.DoesNotContain("Exception", run.Error);
        Assert.Equal(1, run.ExitCode);
        Assert.Equal("", run.Out);
        Assert.Equal(before, File.ReadAllBytes(trial.Ledger));
        Assert.StartsWith(path + expected, run.Error);
        // Every error names the file and then, where there is one, its place: sheet!cell, or line:column.
        foreach (var line in run.Error.Split('\n').Where(l => l.Contains(": error TD", StringComparison.Ordinal)))
            Assert.Matches("^" + Regex.Escape(path) + @"(:[^:!\s]+![A-Z]+[0-9]+|:[0-9]+:[0-9]+)?: error TD[0-9]{4}: \S", line);
        foreach (var word in new[] { "NaN", "Infinity", "\u221E" })
            Assert.DoesNotContain(word, run.Error);
    }
}
