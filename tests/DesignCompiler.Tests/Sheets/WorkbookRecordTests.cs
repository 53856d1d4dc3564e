using System.Globalization;
using System.IO.Compression;
using System.Text.Json;
using DesignCompiler.Randomness;
using DesignCompiler.Results;
using DesignCompiler.Tests.Ledger;
using DesignCompiler.Tests.Testing;
using DocumentFormat.OpenXml.Packaging;

namespace DesignCompiler.Tests.Sheets;

/// <summary>A filled-in crew workbook goes through <c>trialc record</c> exactly as the CSV sheet does.</summary>
public sealed class WorkbookRecordTests
{
    /// <summary>Bernoulli outcomes drawn from a seeded generator, with the first plot of the second sheet written 'missing: hail'.</summary>
    private static Dictionary<string, string> CoverOutcomes(IEnumerable<WorkbookCells.PlotRow> rows)
    {
        var rng = new Xoshiro256StarStar(77);
        var rates = new Dictionary<string, double> { ["OV"] = 0.6, ["RC"] = 0.75, ["MP"] = 0.4, ["BP"] = 0.5 };
        var outcomes = new Dictionary<string, string>();
        foreach (var row in rows)
            outcomes[row.Plot] = outcomes.Count == 20 ? "missing: hail" : rng.NextDouble() < rates[row.Arm] ? "1" : "0";
        return outcomes;
    }

    /// <summary>Copies the issued workbook and types every outcome in, numbers as numbers and text as text.</summary>
    private static string FilledWorkbook(LedgerTrial trial, Func<WorkbookCells.PlotRow, string> outcome, string name = "returned.xlsx")
    {
        var path = trial.File(name);
        File.Copy(Path.Combine(trial.OutFolder(1), trial.Stem + "-round1.xlsx"), path, overwrite: true);
        var rows = WorkbookCells.PlotRows(path);
        using var document = SpreadsheetDocument.Open(path, true);
        foreach (var row in rows)
        {
            var value = outcome(row);
            if (value.Length == 0) continue;
            if (double.TryParse(value, NumberStyles.Float, CultureInfo.InvariantCulture, out var number))
                WorkbookCells.SetNumber(document, row.Sheet, "H" + row.Row, number);
            else
                WorkbookCells.SetText(document, row.Sheet, "H" + row.Row, value);
        }
        return path;
    }

    [Fact]
    public void A_filled_workbook_is_recorded_and_status_shows_its_results_exactly_as_from_the_csv_sheet()
    {
        using var viaWorkbook = new LedgerTrial("cover-crops.trial");
        using var viaCsv = new LedgerTrial("cover-crops.trial");
        viaWorkbook.Issue(1);
        viaCsv.Issue(1);
        var rows = WorkbookCells.PlotRows(Path.Combine(viaWorkbook.OutFolder(1), "cover-crops-round1.xlsx"));
        Assert.Equal(36, rows.Count);
        var outcomes = CoverOutcomes(rows);

        var workbook = FilledWorkbook(viaWorkbook, r => outcomes[r.Plot]);
        var run = viaWorkbook.Record(workbook);
        Assert.True(run.ExitCode == 0, run.Error);
        Assert.Contains($"recorded round 1 from {workbook}: 36 plots (35 with results, 1 missing)", run.Out);

        // The same outcomes typed into the CSV sheet.
        var sheet = viaCsv.SheetRows(1);
        var lines = new List<string> { string.Join(",", sheet[0]) };
        lines.AddRange(sheet.Skip(1).Select(r => string.Join(",", r.Select((f, i) => i == SheetColumns.Outcome ? outcomes[r[SheetColumns.Plot]] : f.Contains(',') ? "\"" + f + "\"" : f))));
        var csv = viaCsv.File("returned.csv");
        LedgerTrial.WriteLines(csv, lines);
        Assert.Equal(0, viaCsv.Record(csv).ExitCode);

        var status = JsonDocument.Parse(viaWorkbook.Status().Out).RootElement;
        Assert.Equal(35, status.GetProperty("plotsRecorded").GetInt32());
        Assert.Equal(1, status.GetProperty("plotsMissing").GetInt32());
        Assert.Equal(JsonDocument.Parse(viaCsv.Status().Out).RootElement.GetProperty("arms").GetRawText(), status.GetProperty("arms").GetRawText());

        // Beta-Bernoulli conjugacy (Gelman et al., Bayesian Data Analysis, 3rd ed., §2.4): the posterior mean is
        // (a + successes) / (a + b + plots). OV has prior beta(2, 2); the other arms the default beta(1, 1).
        foreach (var arm in status.GetProperty("arms").EnumerateArray())
        {
            var code = arm.GetProperty("code").GetString()!;
            var values = rows.Where(r => r.Arm == code).Select(r => outcomes[r.Plot]).Where(v => !v.StartsWith("missing", StringComparison.Ordinal)).ToList();
            var (a, b) = code == "OV" ? (2.0, 2.0) : (1.0, 1.0);
            Assert.Equal((a + values.Count(v => v == "1")) / (a + b + values.Count), arm.GetProperty("posteriorMean").GetDouble(), 12);
        }

        var text = viaWorkbook.Status("text");
        Assert.StartsWith("Late-sown cover mixes: 1 of 4 rounds recorded (1 issued); 35 plots with results, 1 missing\n", text.Out);

        // The same file a second time is refused, naming the round it was recorded as.
        var again = viaWorkbook.Record(workbook);
        Assert.Equal(1, again.ExitCode);
        Assert.Contains($"{workbook}: error TD4013: this file is already recorded as round 1", again.Error);
    }

    [Fact]
    public void Numbers_stored_by_a_German_spreadsheet_and_a_decimal_comma_typed_as_text_are_read_right()
    {
        using var trial = new LedgerTrial("nitrogen-rates.trial");
        trial.Issue(1);
        var k = 0;
        // A number cell holds invariant text whatever the spreadsheet showed (ECMA-376 Part 1 §18.3.1.96, xsd:double);
        // text "6,5" follows the CSV rule for a decimal comma on a normal outcome.
        var workbook = FilledWorkbook(trial, _ => k++ switch { 0 => "7.25", 1 => "6,5", 2 => "missing: lodged", _ => "8" });
        var run = trial.Record(workbook);
        Assert.True(run.ExitCode == 0, run.Error);
        var export = Trialc.Invoke("export", "--ledger", trial.Ledger).Out.Split("\r\n");
        Assert.Contains(",7.25,,", export[1]);
        Assert.Contains(",6.5,,", export[2]);
        Assert.Contains(",,lodged,", export[3]);
    }

    public sealed record Spoilt(string Id, string Place);

    public static TheoryData<string> Cases() =>
    [
        "value 2 for bernoulli", "blank without missing", "wrong arm", "header changed", "date-formatted outcome", "text outside the table",
        "text value", "comma in a bernoulli value", "header row cleared", "several mistakes in workbook order",
    ];

    private static Spoilt Spoil(string name, SpreadsheetDocument document)
    {
        switch (name)
        {
            case "value 2 for bernoulli":
                WorkbookCells.SetNumber(document, "north", "H9", 2);
                return new("TD4022", "north!H9");
            case "blank without missing":
                WorkbookCells.SetText(document, "south", "H11", "  ");
                return new("TD4020", "south!H11");
            case "wrong arm":
                var arm = WorkbookCells.Read(document, "north", "F8");
                WorkbookCells.SetText(document, "north", "F8", arm == "OV" ? "RC" : "OV");
                return new("TD4016", "north!F8");
            case "header changed":
                WorkbookCells.SetText(document, "south", "H6", "result");
                return new("TD4004", "south!H6");
            case "date-formatted outcome":
                WorkbookCells.SetNumber(document, "north", "H10", 45_658, WorkbookCells.AddDateStyle(document));
                return new("TD4032", "north!H10");
            case "text outside the table":
                WorkbookCells.SetText(document, "north", "J12", "wet");
                return new("TD4006", "north!A12");
            case "text value":
                WorkbookCells.SetText(document, "north", "H7", "yes");
                return new("TD4021", "north!H7");
            case "comma in a bernoulli value":
                WorkbookCells.SetText(document, "south", "H7", "1,0");
                return new("TD4025", "south!H7");
            case "header row cleared":
                foreach (var column in "ABCDEFGHI") WorkbookCells.SetText(document, "north", column + "6", "");
                return new("TD4031", "north!A1");
            default:
                WorkbookCells.SetNumber(document, "south", "H8", 3);
                WorkbookCells.SetNumber(document, "north", "H20", 5);
                return new("TD4022", "north!H20");
        }
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void A_spoilt_workbook_is_refused_at_the_sheet_and_cell_of_the_mistake_and_the_ledger_is_unchanged(string name)
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var rows = WorkbookCells.PlotRows(Path.Combine(trial.OutFolder(1), "cover-crops-round1.xlsx"));
        var outcomes = CoverOutcomes(rows);
        var workbook = FilledWorkbook(trial, r => outcomes[r.Plot]);
        Spoilt expected;
        using (var document = SpreadsheetDocument.Open(workbook, true)) expected = Spoil(name, document);
        var before = File.ReadAllBytes(trial.Ledger);

        var run = trial.Record(workbook);

        Assert.Equal(1, run.ExitCode);
        Assert.StartsWith($"{workbook}:{expected.Place}: error {expected.Id}: ", run.Error);
        Assert.DoesNotContain("Exception", run.Error);
        Assert.Equal("", run.Out);
        Assert.Equal(before, File.ReadAllBytes(trial.Ledger));
        if (name == "several mistakes in workbook order")
            Assert.Matches($@"north!H20: error TD4022: [^\n]*\n(.|\n)*south!H8: error TD4022: ", run.Error);
    }

    public static TheoryData<string, byte[], string> NotWorkbooks() => new()
    {
        { "a zip of other files", ZipOf("notes.txt", "plot north-1-1 looked wet"), ": error TD4030: the file is not a workbook trialc can read: it is a zip file" },
        { "an old .xls or protected workbook", [0xD0, 0xCF, 0x11, 0xE0, 0xA1, 0xB1, 0x1A, 0xE1, 0, 0, 0, 0], ":1:1: error TD4030: the file is not a workbook trialc can read: it is an old-format (.xls) or password-protected workbook" },
        { "a cut-off download", [0x50, 0x4B, 0x03, 0x04, 0x14, 0x00, 0x00, 0x00, 0x08, 0x00], ": error TD4030: the file is not a workbook trialc can read: it is a zip archive, but damaged or incomplete, as after a download or copy that stopped early;" },
    };

    [Theory]
    [MemberData(nameof(NotWorkbooks))]
    public void A_file_that_is_not_a_workbook_is_refused_with_what_to_send_instead(string name, byte[] content, string expected)
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        var path = trial.File(name.Replace(' ', '-') + ".xlsx");
        File.WriteAllBytes(path, content);
        var run = trial.Record(path);
        Assert.Equal(1, run.ExitCode);
        Assert.StartsWith(path + expected, run.Error);
        Assert.Contains("CSV UTF-8", run.Error);
        Assert.DoesNotContain("   at ", run.Error);
    }

    [Fact]
    public void A_workbook_whose_sheet_is_cut_short_is_refused_with_where_its_xml_breaks_off()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        // The issued workbook rewritten with its first worksheet's XML cut in half, the zip itself intact:
        // what a sync tool that stopped mid-save leaves behind.
        var issued = File.ReadAllBytes(Path.Combine(trial.OutFolder(1), trial.Stem + "-round1.xlsx"));
        var path = trial.File("cut-sheet.xlsx");
        using (var source = new ZipArchive(new MemoryStream(issued), ZipArchiveMode.Read))
        using (var target = new ZipArchive(File.Create(path), ZipArchiveMode.Create))
        {
            foreach (var entry in source.Entries)
            {
                using var input = new MemoryStream();
                using (var stream = entry.Open()) stream.CopyTo(input);
                var bytes = input.ToArray();
                if (entry.FullName == "xl/worksheets/sheet1.xml") bytes = bytes[..(bytes.Length / 2)];
                using var output = target.CreateEntry(entry.FullName).Open();
                output.Write(bytes);
            }
        }
        var run = trial.Record(path);
        Assert.Equal(1, run.ExitCode);
        Assert.Matches(@": error TD4030: the file is not a workbook trialc can read: it is an \.xlsx workbook, but a part of it is damaged or cut short \(its XML breaks off at line \d+, position \d+\); open it in the spreadsheet and save it again", run.Error);
        Assert.DoesNotContain("not closed", run.Error);
        Assert.DoesNotContain("   at ", run.Error);
    }

    private static byte[] ZipOf(string name, string text)
    {
        using var buffer = new MemoryStream();
        using (var zip = new ZipArchive(buffer, ZipArchiveMode.Create, leaveOpen: true))
        using (var writer = new StreamWriter(zip.CreateEntry(name).Open()))
            writer.Write(text);
        return buffer.ToArray();
    }
}
