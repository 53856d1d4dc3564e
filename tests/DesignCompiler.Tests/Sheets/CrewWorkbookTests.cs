using System.IO.Compression;
using DesignCompiler.Rendering;
using DesignCompiler.Results;
using DesignCompiler.Tests.Testing;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using DocumentFormat.OpenXml.Validation;

namespace DesignCompiler.Tests.Sheets;

/// <summary>The crew workbook: valid SpreadsheetML, one worksheet per block, the outcome column validated, traceable, and the same bytes every time.</summary>
public sealed class CrewWorkbookTests
{
    public static TheoryData<string> Examples() =>
        [.. Directory.GetFiles(RepoPaths.Examples, "*.trial").Select(f => Path.GetFileName(f)).Order(StringComparer.Ordinal)];

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_example_gives_a_schema_valid_workbook_with_one_worksheet_per_block(string example)
    {
        using var round = new CompiledRound(example);
        using var document = SpreadsheetDocument.Open(round.File("xlsx"), false);

        // The Open XML SDK's own schema validator (ECMA-376 / ISO/IEC 29500 schemas) finds nothing wrong.
        var errors = new OpenXmlValidator(FileFormatVersions.Office2019).Validate(document).Select(e => e.Path?.XPath + ": " + e.Description).ToList();
        Assert.True(errors.Count == 0, string.Join("\n", errors));

        var sheets = WorkbookCells.Worksheets(document).ToList();
        Assert.Equal(round.Blocks.Select(b => b.Name), sheets.Select(s => s.Name));
        foreach (var ((name, part), (_, plots)) in sheets.Zip(round.Blocks))
        {
            var header = WorkbookCells.HeaderRow(part);
            Assert.Equal(SheetColumns.Header.Split(','), Enumerable.Range(0, SheetColumns.Count)
                .Select(c => WorkbookCells.Read(document, name, CellReference(c, header))));
            var rows = part.Worksheet!.GetFirstChild<SheetData>()!.Elements<Row>().Where(r => r.RowIndex!.Value > header).ToList();
            Assert.Equal(plots, rows.Count);

            // The header stays on screen: a frozen pane splits the sheet right under it (ECMA-376 Part 1 §18.3.1.66).
            var pane = part.Worksheet.Descendants<Pane>().Single();
            Assert.Equal(PaneStateValues.Frozen, pane.State!.Value);
            Assert.Equal((double)header, pane.VerticalSplit!.Value);

            // The outcome column of every plot row, and only those cells, carries the rule (ECMA-376 Part 1 §18.3.1.32).
            var validation = part.Worksheet.Descendants<DataValidation>().Single();
            Assert.Equal($"H{header + 1}:H{header + plots}", validation.SequenceOfReferences!.InnerText);
            Assert.Equal(DataValidationValues.Custom, validation.Type!.Value);
            Assert.Equal(DataValidationErrorStyleValues.Stop, validation.ErrorStyle!.Value);
            Assert.Contains("'missing: reason'", validation.Prompt!.Value);
        }
    }

    [Theory]
    // The families' values (common practice): bernoulli 0 or 1, binomial of N a whole 0..N, a count a whole ≥ 0, a normal
    // outcome any number; any of them may be "missing". IF evaluates only the branch it takes, while AND evaluates all of
    // its arguments, so INT of a text inside AND would be an error (spreadsheet function semantics, from memory).
    [InlineData("cover-crops.trial", "IF(ISNUMBER(H7),OR(H7=0,H7=1),LEFT(LOWER(TRIM(H7)),7)=\"missing\")")]
    [InlineData("germination.trial", "IF(ISNUMBER(H7),AND(H7=INT(H7),H7>=0,H7<=50),LEFT(LOWER(TRIM(H7)),7)=\"missing\")")]
    [InlineData("aphid-margins.trial", "IF(ISNUMBER(H7),AND(H7=INT(H7),H7>=0),LEFT(LOWER(TRIM(H7)),7)=\"missing\")")]
    [InlineData("nitrogen-rates.trial", "IF(ISNUMBER(H7),TRUE,LEFT(LOWER(TRIM(H7)),7)=\"missing\")")]
    public void The_outcome_column_takes_the_family_values_or_missing(string example, string formula)
    {
        using var round = new CompiledRound(example);
        using var document = SpreadsheetDocument.Open(round.File("xlsx"), false);
        foreach (var (_, part) in WorkbookCells.Worksheets(document))
            Assert.Equal(formula, part.Worksheet!.Descendants<DataValidation>().Single().Formula1!.Text);
    }

    [Fact]
    public void Every_worksheet_names_trial_round_design_seed_version_and_carries_the_caution()
    {
        using var round = new CompiledRound("nitrogen-rates.trial");
        using var document = SpreadsheetDocument.Open(round.File("xlsx"), false);
        foreach (var (name, part) in WorkbookCells.Worksheets(document))
        {
            var title = string.Join("\n", Enumerable.Range(1, (int)WorkbookCells.HeaderRow(part) - 1).Select(r => WorkbookCells.Read(document, name, "A" + r)));
            Assert.StartsWith(round.Plan.GetProperty("trial").GetString()! + "\n", title);
            Assert.Contains($"Round 1 of {round.Plan.GetProperty("rounds").GetInt32()} · block {name}", title);
            Assert.Contains($"design {round.DesignHashShort} · seed {round.Seed} · policy ", title);
            Assert.Contains("trialc " + RoundOutputs.ToolVersion, title);
            Assert.Contains("product label, local regulations and qualified agronomic advice", title);
            // The printed page header carries the same trace.
            Assert.Contains($"design {round.DesignHashShort} · seed {round.Seed}", part.Worksheet!.Descendants<OddHeader>().Single().Text);
        }
    }

    [Fact]
    public void The_zip_holds_no_save_time_and_no_document_properties()
    {
        using var round = new CompiledRound("cover-crops.trial");
        using var zip = ZipFile.OpenRead(round.File("xlsx"));
        // 1980-01-01 is the earliest time a zip entry's MS-DOS date can hold (PKWARE APPNOTE, section 4.4.6; from memory).
        Assert.All(zip.Entries, e => Assert.Equal(new DateTime(1980, 1, 1), e.LastWriteTime.DateTime));
        Assert.DoesNotContain(zip.Entries, e => e.FullName.StartsWith("docProps/", StringComparison.Ordinal));
        Assert.Equal("[Content_Types].xml", zip.Entries[0].FullName);
    }

    [Fact]
    public void A_real_process_under_de_DE_and_another_time_zone_writes_the_same_workbook_bytes()
    {
        var design = RepoPaths.Example("germination.trial");
        var folders = new[] { "C", "de" }.Select(_ => Path.Combine(Path.GetTempPath(), "trialc-xlsx-" + Guid.NewGuid().ToString("N"))).ToArray();
        try
        {
            var plain = TrialcProcess.Invoke(new Dictionary<string, string> { ["LC_ALL"] = "C.UTF-8", ["TZ"] = "UTC" }, "compile", design, "--out", folders[0]);
            var german = TrialcProcess.Invoke(new Dictionary<string, string> { ["LC_ALL"] = "de_DE.UTF-8", ["LANG"] = "de_DE.UTF-8", ["TZ"] = "Pacific/Auckland" },
                "compile", design, "--out", folders[1]);
            Assert.True(plain.ExitCode == 0 && german.ExitCode == 0, plain.Error + german.Error);
            foreach (var file in Directory.GetFiles(folders[0]))
                Assert.Equal(File.ReadAllBytes(file), File.ReadAllBytes(Path.Combine(folders[1], Path.GetFileName(file))));
            Assert.True(File.Exists(Path.Combine(folders[1], "germination-round1.xlsx")));
        }
        finally
        {
            foreach (var folder in folders)
                if (Directory.Exists(folder)) Directory.Delete(folder, true);
        }
    }

    private static string CellReference(int column, uint row) => DesignCompiler.Diagnostics.CellReference.ColumnLetters(column + 1) + row;
}
