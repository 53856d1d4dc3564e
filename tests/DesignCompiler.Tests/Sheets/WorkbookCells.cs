using System.Globalization;
using DesignCompiler.Results;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;

namespace DesignCompiler.Tests.Sheets;

/// <summary>
/// Reads and writes cells of a crew workbook with the Open XML SDK, the way a spreadsheet stores
/// what a crew types: numbers as number cells, text as shared strings.
/// </summary>
public static class WorkbookCells
{
    /// <summary>One plot row of a worksheet: the sheet, the row number, and the plot and arm written on it.</summary>
    public sealed record PlotRow(string Sheet, int Row, string Plot, string Arm);

    public static List<PlotRow> PlotRows(string path)
    {
        using var document = SpreadsheetDocument.Open(path, false);
        var rows = new List<PlotRow>();
        foreach (var (name, part) in Worksheets(document))
        {
            var header = HeaderRow(part);
            foreach (var row in part.Worksheet!.GetFirstChild<SheetData>()!.Elements<Row>().Where(r => r.RowIndex!.Value > header))
                rows.Add(new PlotRow(name, (int)row.RowIndex!.Value, Read(document, row, "C"), Read(document, row, "F")));
        }
        return rows;
    }

    /// <summary>Writes a number into a cell, as a spreadsheet stores a typed number (invariant text in &lt;v&gt;).</summary>
    public static void SetNumber(SpreadsheetDocument document, string sheet, string reference, double value, uint? style = null)
    {
        var cell = Cell(document, sheet, reference);
        cell.DataType = null;
        cell.InlineString = null;
        cell.CellValue = new CellValue(value.ToString("R", CultureInfo.InvariantCulture));
        if (style is not null) cell.StyleIndex = style;
    }

    /// <summary>Writes text into a cell through the shared-string table, as spreadsheets save typed text.</summary>
    public static void SetText(SpreadsheetDocument document, string sheet, string reference, string text)
    {
        var workbook = document.WorkbookPart!;
        var table = workbook.SharedStringTablePart ?? workbook.AddNewPart<SharedStringTablePart>();
        table.SharedStringTable ??= new SharedStringTable();
        table.SharedStringTable.Append(new SharedStringItem(new DocumentFormat.OpenXml.Spreadsheet.Text(text)));
        var index = table.SharedStringTable.Elements<SharedStringItem>().Count() - 1;
        var cell = Cell(document, sheet, reference);
        cell.InlineString = null;
        cell.DataType = CellValues.SharedString;
        cell.CellValue = new CellValue(index.ToString(CultureInfo.InvariantCulture));
    }

    public static string Read(SpreadsheetDocument document, string sheet, string reference)
    {
        var part = Worksheets(document).Single(w => w.Name == sheet).Part;
        var row = part.Worksheet!.GetFirstChild<SheetData>()!.Elements<Row>().Single(r => r.RowIndex!.Value == RowOf(reference));
        return Read(document, row, new string(reference.TakeWhile(char.IsAsciiLetter).ToArray()));
    }

    /// <summary>Adds a cell format that shows numbers as dates (built-in format 14, "m/d/yyyy"; ECMA-376 Part 1 §18.8.30) and returns its index.</summary>
    public static uint AddDateStyle(SpreadsheetDocument document)
    {
        var formats = document.WorkbookPart!.WorkbookStylesPart!.Stylesheet!.CellFormats!;
        formats.Append(new CellFormat { NumberFormatId = 14, FontId = 0, FillId = 0, BorderId = 0, ApplyNumberFormat = true });
        formats.Count = (uint)formats.Elements<CellFormat>().Count();
        return formats.Count.Value - 1;
    }

    public static IEnumerable<(string Name, WorksheetPart Part)> Worksheets(SpreadsheetDocument document)
    {
        var workbook = document.WorkbookPart!;
        foreach (var sheet in workbook.Workbook!.Sheets!.Elements<Sheet>())
            yield return (sheet.Name!.Value!, (WorksheetPart)workbook.GetPartById(sheet.Id!.Value!));
    }

    public static uint HeaderRow(WorksheetPart part) =>
        part.Worksheet!.GetFirstChild<SheetData>()!.Elements<Row>()
            .First(r => r.Elements<Cell>().FirstOrDefault()?.InlineString?.InnerText == SheetColumns.Name(0)).RowIndex!.Value;

    private static Cell Cell(SpreadsheetDocument document, string sheet, string reference)
    {
        var part = Worksheets(document).Single(w => w.Name == sheet).Part;
        var data = part.Worksheet!.GetFirstChild<SheetData>()!;
        var row = data.Elements<Row>().SingleOrDefault(r => r.RowIndex!.Value == RowOf(reference));
        if (row is null)
        {
            row = new Row { RowIndex = RowOf(reference) };
            data.Append(row);
        }
        var cell = row.Elements<Cell>().SingleOrDefault(c => c.CellReference!.Value == reference);
        if (cell is null)
        {
            cell = new Cell { CellReference = reference };
            row.Append(cell);
        }
        return cell;
    }

    private static string Read(SpreadsheetDocument document, Row row, string column)
    {
        var cell = row.Elements<Cell>().SingleOrDefault(c => c.CellReference!.Value == column + row.RowIndex!.Value.ToString(CultureInfo.InvariantCulture));
        if (cell is null) return "";
        if (cell.DataType?.Value == CellValues.InlineString) return cell.InlineString!.InnerText;
        if (cell.DataType?.Value == CellValues.SharedString)
            return document.WorkbookPart!.SharedStringTablePart!.SharedStringTable!.Elements<SharedStringItem>()
                .ElementAt(int.Parse(cell.CellValue!.Text, CultureInfo.InvariantCulture)).InnerText;
        return cell.CellValue?.Text ?? "";
    }

    private static uint RowOf(string reference) => uint.Parse(reference.SkipWhile(char.IsAsciiLetter).ToArray(), CultureInfo.InvariantCulture);
}
