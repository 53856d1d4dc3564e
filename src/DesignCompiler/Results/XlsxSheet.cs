using System.Globalization;
using System.IO.Packaging;
using System.Xml;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;

namespace DesignCompiler.Results;

/// <summary>
/// A returned .xlsx workbook as a <see cref="SheetTable"/>. Every worksheet that holds a plot
/// table is one section: its header is the first row whose column A reads <c>round</c> with more
/// cells filled beside it (the rows above are the sheet's title block), and every row under it is
/// a plot row, read from column A to I. Numbers are read as the workbook stores them (never as the
/// spreadsheet displayed them), so a German spreadsheet's 7,25 arrives as 7.25. Every cell keeps
/// its sheet and reference, so a problem is reported as <c>file.xlsx:north!H7</c>.
/// </summary>
public static class XlsxSheet
{
    /// <summary>A worksheet part larger than this is not a crew sheet; refusing it keeps a zip bomb from filling memory.</summary>
    private const long MaxCharactersInPart = 32L * 1024 * 1024;

    public static bool LooksLikeZip(byte[] bytes) =>
        bytes.Length >= 4 && bytes[0] == 0x50 && bytes[1] == 0x4B && bytes[2] == 0x03 && bytes[3] == 0x04;

    /// <summary>The OLE compound file that old .xls workbooks and password-protected .xlsx files are stored in.</summary>
    public static bool LooksLikeLegacyOffice(byte[] bytes) =>
        bytes.Length >= 8 && bytes.AsSpan(0, 8).SequenceEqual((ReadOnlySpan<byte>)[0xD0, 0xCF, 0x11, 0xE0, 0xA1, 0xB1, 0x1A, 0xE1]);

    public static (SheetTable? Table, IReadOnlyList<Diagnostic> Problems) Read(string path, byte[] bytes)
    {
        try
        {
            using var stream = new MemoryStream(bytes, writable: false);
            using var document = SpreadsheetDocument.Open(stream, false, new OpenSettings { MaxCharactersInPart = MaxCharactersInPart });
            if (document.WorkbookPart is not { Workbook: { } workbook } workbookPart)
                return Refused(path, "it is a zip file without a spreadsheet inside; return the .xlsx workbook trialc wrote, or the sheet saved as 'CSV UTF-8'");
            return ReadWorkbook(path, workbookPart, workbook);
        }
        catch (Exception e) when (e is OpenXmlPackageException or InvalidDataException or XmlException or FileFormatException
                                      or IOException or InvalidOperationException or ArgumentException or NotSupportedException or FormatException)
        {
            return Refused(path, Damage(e) + "; open it in the spreadsheet and save it again as 'Excel workbook (.xlsx)', or save the sheet as 'CSV UTF-8'");
        }
    }

    /// <summary>
    /// What is wrong with a workbook the reader gave up on, in trialc's words: the reader's own messages name its
    /// internals (element prefixes, stream classes), which tell a trial manager nothing about what to do.
    /// </summary>
    private static string Damage(Exception e) => e switch
    {
        XmlException xml when xml.LineNumber > 0 =>
            FormattableString.Invariant($"it is an .xlsx workbook, but a part of it is damaged or cut short (its XML breaks off at line {xml.LineNumber}, position {xml.LinePosition})"),
        XmlException => "it is an .xlsx workbook, but a part of it is damaged or cut short",
        InvalidDataException or IOException or FileFormatException or OpenXmlPackageException =>
            "it is a zip archive, but damaged or incomplete, as after a download or copy that stopped early",
        // The package names a part (a worksheet, the shared strings) that the archive does not hold.
        InvalidOperationException => "it is a zip archive, but a part of the workbook it lists is missing from it",
        _ => "it is a zip archive, but a part of it holds a value an .xlsx workbook does not allow",
    };

    private static (SheetTable?, IReadOnlyList<Diagnostic>) ReadWorkbook(string path, WorkbookPart workbookPart, Workbook workbook)
    {
        var strings = workbookPart.SharedStringTablePart?.SharedStringTable?.Elements<SharedStringItem>().Select(ItemText).ToList() ?? [];
        var dates = DateStyles(workbookPart.WorkbookStylesPart?.Stylesheet);
        var sections = new List<SheetSection>();
        var problems = new List<Diagnostic>();
        var sheets = workbook.Sheets?.Elements<Sheet>().ToList() ?? [];
        CellReference? end = null;

        for (var index = 0; index < sheets.Count; index++)
        {
            var sheet = sheets[index];
            var name = sheet.Name?.Value ?? "";
            if (sheet.Id?.Value is not { } id || workbookPart.GetPartById(id) is not WorksheetPart part) continue;
            var rows = ReadRows(part, strings, dates);
            var headerAt = rows.FindIndex(r => r.Cells.TryGetValue(1, out var a) && a.Text.Trim().Equals("round", StringComparison.OrdinalIgnoreCase)
                                               && r.Cells.Values.Count(c => c.Text.Trim().Length > 0) >= 2);
            if (headerAt < 0)
            {
                var filled = rows.SelectMany(r => r.Cells.Where(c => c.Value.Text.Trim().Length > 0).Select(c => (r.Row, Column: c.Key))).FirstOrDefault();
                if (filled != default)
                    problems.Add(new Diagnostic(LedgerDiagnostics.NoHeaderRow, Location(path, name, index, filled.Row, filled.Column), [name, SheetColumns.Header]));
                continue;
            }

            var header = rows[headerAt];
            var headerWidth = header.Cells.Where(c => c.Value.Text.Trim().Length > 0).Max(c => c.Key);
            var section = new SheetSection(
                Row(path, name, index, header, headerWidth),
                Location(path, name, index, header.Row, headerWidth + 1),
                rows.Skip(headerAt + 1).Select(r => Row(path, name, index, r, Math.Max(SheetColumns.Count, LastFilled(r)))).ToList());
            sections.Add(section);
            end = new CellReference(name, index, (rows.Count == 0 ? header.Row : rows[^1].Row) + 1, 1);
        }

        if (problems.Count > 0) return (null, problems);
        if (sections.Count == 0 || end is null)
            return (null, [new Diagnostic(LedgerDiagnostics.EmptySheet, SourceLocation.File(path), [SheetColumns.Header])]);
        return (new SheetTable(sections, SourceLocation.At(path, end), SourceLocation.File(path)), []);
    }

    /// <summary>One cell as read: its text, and whether the workbook formats it as a date or time.</summary>
    private readonly record struct CellText(string Text, bool IsDate);

    private sealed record RowCells(int Row, SortedDictionary<int, CellText> Cells);

    private static List<RowCells> ReadRows(WorksheetPart part, List<string> strings, HashSet<uint> dates)
    {
        var rows = new List<RowCells>();
        var data = part.Worksheet?.GetFirstChild<SheetData>();
        if (data is null) return rows;
        var rowNumber = 0;
        foreach (var row in data.Elements<Row>())
        {
            rowNumber = row.RowIndex?.Value is { } r ? (int)r : rowNumber + 1;
            var cells = new SortedDictionary<int, CellText>();
            var column = 0;
            foreach (var cell in row.Elements<Cell>())
            {
                column = ColumnOf(cell.CellReference?.Value) ?? column + 1;
                var isDate = cell.StyleIndex?.Value is { } style && dates.Contains(style);
                cells[column] = Text(cell, strings, isDate);
            }
            rows.Add(new RowCells(rowNumber, cells));
        }
        return rows;
    }

    private static CellText Text(Cell cell, List<string> strings, bool dateStyle)
    {
        var raw = cell.CellValue?.Text;
        var type = cell.DataType?.Value;
        if (type == CellValues.SharedString)
            return new(int.TryParse(raw, NumberStyles.None, CultureInfo.InvariantCulture, out var k) && k < strings.Count ? strings[k] : "", false);
        if (type == CellValues.InlineString)
            return new(cell.InlineString is { } inline ? ItemText(inline) : "", false);
        if (type == CellValues.Boolean) return new(raw == "1" ? "TRUE" : raw is null ? "" : "FALSE", false);
        if (type == CellValues.Date) return new(raw ?? "", true);
        if (type == CellValues.String || type == CellValues.Error) return new(raw ?? "", false);
        if (raw is null) return new(cell.CellFormula?.Text is { Length: > 0 } formula ? "=" + formula : "", false);
        // A number, stored with a decimal point whatever the spreadsheet's language; the shortest text that reads back to it.
        return double.TryParse(raw, NumberStyles.Float, CultureInfo.InvariantCulture, out var number)
            ? new(number.ToString("R", CultureInfo.InvariantCulture), dateStyle)
            : new(raw, false);
    }

    private static string ItemText(OpenXmlElement item) =>
        item.GetFirstChild<DocumentFormat.OpenXml.Spreadsheet.Text>()?.Text ?? string.Concat(item.Elements<Run>().Select(r => r.Text?.Text ?? ""));

    private static int LastFilled(RowCells row) =>
        row.Cells.Where(c => c.Value.Text.Trim().Length > 0).Select(c => c.Key).DefaultIfEmpty(0).Max();

    private static SheetRow Row(string path, string sheet, int index, RowCells row, int width)
    {
        var cells = Enumerable.Range(1, width)
            .Select(c => row.Cells.TryGetValue(c, out var cell)
                ? new SheetCell(cell.Text, Location(path, sheet, index, row.Row, c), cell.IsDate)
                : new SheetCell("", Location(path, sheet, index, row.Row, c)))
            .ToList();
        var start = new CellReference(sheet, index, row.Row, 1);
        return new SheetRow(cells, SourceLocation.At(path, start), start.Text, row.Row);
    }

    private static SourceLocation Location(string path, string sheet, int index, int row, int column) =>
        SourceLocation.At(path, new CellReference(sheet, index, row, column));

    /// <summary>The column of a reference such as <c>H12</c>: letters in bijective base 26.</summary>
    private static int? ColumnOf(string? reference)
    {
        if (string.IsNullOrEmpty(reference)) return null;
        var column = 0;
        foreach (var c in reference)
        {
            if (!char.IsAsciiLetter(c)) break;
            column = column * 26 + (char.ToUpperInvariant(c) - 'A' + 1);
            if (column > 16_384) return null;
        }
        return column == 0 ? null : column;
    }

    /// <summary>
    /// The cell styles whose number format shows a date or time: the built-in formats ECMA-376
    /// Part 1 §18.8.30 lists as dates and times (14–22, 45–47), and custom formats with a day,
    /// month, year, hour or second code outside quoted text and [bracketed] sections.
    /// </summary>
    private static HashSet<uint> DateStyles(Stylesheet? styles)
    {
        var result = new HashSet<uint>();
        if (styles?.CellFormats is not { } formats) return result;
        var custom = styles.NumberingFormats?.Elements<NumberingFormat>()
            .Where(f => f.NumberFormatId?.Value is not null)
            .ToDictionary(f => f.NumberFormatId!.Value, f => f.FormatCode?.Value ?? "") ?? [];
        uint index = 0;
        foreach (var format in formats.Elements<CellFormat>())
        {
            var id = format.NumberFormatId?.Value ?? 0;
            if (id is >= 14 and <= 22 or >= 45 and <= 47 || custom.TryGetValue(id, out var code) && IsDateCode(code)) result.Add(index);
            index++;
        }
        return result;
    }

    private static bool IsDateCode(string code)
    {
        var quoted = false;
        var bracket = false;
        for (var i = 0; i < code.Length; i++)
        {
            var c = code[i];
            if (c == '"') quoted = !quoted;
            else if (quoted) continue;
            else if (c == '\\') i++;
            else if (c == '[') bracket = true;
            else if (c == ']') bracket = false;
            else if (!bracket && "dmyhsDMYHS".Contains(c)) return true;
        }
        return false;
    }

    private static (SheetTable?, IReadOnlyList<Diagnostic>) Refused(string path, string why) =>
        (null, [new Diagnostic(LedgerDiagnostics.NotAWorkbook, SourceLocation.File(path), [why])]);
}
