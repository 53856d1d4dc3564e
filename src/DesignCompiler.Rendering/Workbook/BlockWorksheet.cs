using System.Globalization;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Results;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Spreadsheet;

namespace DesignCompiler.Rendering.Workbook;

/// <summary>
/// One block's worksheet: a title block (trial, round and block; design, seed, policy and trialc
/// version; what to record; the caution), then the plot table with the CSV sheet's columns, so
/// <c>trialc record</c> reads either the same way. The title block and the header row stay frozen
/// on screen, the header row repeats on every printed page, and the page header prints the trace.
/// </summary>
internal static class BlockWorksheet
{
    public const int HeaderRow = 6;

    private static readonly double[] Widths = [7, 12, 14, 6, 7, 8, 30, 12, 36];

    public static Worksheet Build(SheetModel model, BlockModel block, OutcomeSpec outcome)
    {
        var data = new SheetData();
        data.Append(
            TextRow(1, model.Trial, WorkbookStyles.Title),
            TextRow(2, Invariant($"Round {model.Round} of {model.Rounds} · block {block.Name} · {block.Plots} plots"), WorkbookStyles.Subtitle),
            TextRow(3, SheetTrace.Line(model), WorkbookStyles.Trace),
            TextRow(4, Invariant($"Record {model.OutcomeName}{Unit(model)} for every plot: {model.OutcomeValues}."), WorkbookStyles.Instruction),
            TextRow(5, model.Caution, WorkbookStyles.Caution, height: 42));

        var header = new Row { RowIndex = HeaderRow };
        for (var c = 0; c < SheetColumns.Count; c++) header.Append(TextCell(c, HeaderRow, SheetColumns.Name(c), WorkbookStyles.Header));
        data.Append(header);

        var r = HeaderRow;
        foreach (var plot in block.PlotList)
        {
            r++;
            var row = new Row { RowIndex = (uint)r };
            row.Append(
                NumberCell(0, r, model.Round.ToString(CultureInfo.InvariantCulture)),
                TextCell(1, r, plot.Block, WorkbookStyles.BodyText),
                TextCell(2, r, plot.PlotId, WorkbookStyles.BodyText),
                NumberCell(3, r, plot.Row),
                NumberCell(4, r, plot.Column),
                TextCell(5, r, plot.Arm, WorkbookStyles.BodyText),
                TextCell(6, r, plot.Label, WorkbookStyles.BodyText),
                EmptyCell(7, r, WorkbookStyles.Outcome),
                EmptyCell(8, r, WorkbookStyles.Notes));
            data.Append(row);
        }

        var outcomeColumn = CellReference.ColumnLetters(SheetColumns.Outcome + 1);
        var first = outcomeColumn + (HeaderRow + 1).ToString(CultureInfo.InvariantCulture);
        var validation = OutcomeValidation.For(outcome, first);
        var lastColumn = CellReference.ColumnLetters(SheetColumns.Count);

        return new Worksheet(
            new SheetProperties(new PageSetupProperties { FitToPage = true }),
            new SheetViews(new SheetView(
                new Pane
                {
                    VerticalSplit = HeaderRow, TopLeftCell = "A" + (HeaderRow + 1).ToString(CultureInfo.InvariantCulture),
                    ActivePane = PaneValues.BottomLeft, State = PaneStateValues.Frozen,
                },
                new Selection { Pane = PaneValues.BottomLeft, ActiveCell = first, SequenceOfReferences = new ListValue<StringValue> { InnerText = first } })
            { WorkbookViewId = 0, TabSelected = block == model.Blocks[0] ? true : null }),
            new SheetFormatProperties { DefaultRowHeight = 15 },
            new Columns(Widths.Select((w, i) => new Column { Min = (uint)(i + 1), Max = (uint)(i + 1), Width = w, CustomWidth = true })),
            data,
            new MergeCells(
                new MergeCell { Reference = "A4:" + lastColumn + "4" },
                new MergeCell { Reference = "A5:" + lastColumn + "5" })
            { Count = 2 },
            new DataValidations(new DataValidation(new Formula1(validation.Formula))
            {
                Type = DataValidationValues.Custom,
                AllowBlank = true,
                ShowInputMessage = true,
                ShowErrorMessage = true,
                ErrorStyle = DataValidationErrorStyleValues.Stop,
                PromptTitle = Clip(model.OutcomeName, 32),
                Prompt = validation.Prompt,
                ErrorTitle = "Not a value this outcome takes",
                Error = validation.Error,
                SequenceOfReferences = new ListValue<StringValue> { InnerText = first + ":" + outcomeColumn + r.ToString(CultureInfo.InvariantCulture) },
            })
            { Count = 1 },
            new PageMargins { Left = 0.5, Right = 0.5, Top = 0.7, Bottom = 0.7, Header = 0.3, Footer = 0.3 },
            new PageSetup { Orientation = OrientationValues.Portrait, FitToWidth = 1, FitToHeight = 0 },
            new HeaderFooter(
                new OddHeader(Clip("&L&8" + Escape(Invariant($"{model.Trial} · round {model.Round} of {model.Rounds} · block {block.Name}")) +
                                   "&R&8" + Escape(SheetTrace.Line(model)), 255)),
                new OddFooter("&LRecorded by (name, signature): ____________________&RPage &P of &N")));
    }

    private static string Unit(SheetModel model) => model.OutcomeUnit == "" ? "" : " (" + model.OutcomeUnit + ")";

    private static Row TextRow(int r, string text, uint style, double? height = null)
    {
        var row = new Row(TextCell(0, r, text, style)) { RowIndex = (uint)r };
        if (height is { } h)
        {
            row.Height = h;
            row.CustomHeight = true;
        }
        return row;
    }

    private static Cell TextCell(int column, int row, string text, uint style) => new(
        new InlineString(new DocumentFormat.OpenXml.Spreadsheet.Text(XmlSafe(text)) { Space = SpaceProcessingModeValues.Preserve }))
    {
        CellReference = Reference(column, row), DataType = CellValues.InlineString, StyleIndex = style,
    };

    /// <summary>A whole number as a number cell; an empty text (a block without a layout has no row or column) as an empty cell.</summary>
    private static Cell NumberCell(int column, int row, string number) =>
        number.Length == 0
            ? EmptyCell(column, row, WorkbookStyles.BodyNumber)
            : new Cell(new CellValue(number)) { CellReference = Reference(column, row), StyleIndex = WorkbookStyles.BodyNumber };

    private static Cell EmptyCell(int column, int row, uint style) => new() { CellReference = Reference(column, row), StyleIndex = style };

    private static string Reference(int column, int row) => CellReference.ColumnLetters(column + 1) + row.ToString(CultureInfo.InvariantCulture);

    /// <summary>XML 1.0 has no control characters but tab and line breaks; a label cannot hold them anyway.</summary>
    private static string XmlSafe(string text) => new(text.Where(c => c >= 0x20 || c is '\t' or '\n' or '\r').ToArray());

    /// <summary>In a page header '&amp;' starts a code, so text doubles it.</summary>
    private static string Escape(string text) => XmlSafe(text).Replace("&", "&&");

    private static string Clip(string text, int length) => text.Length <= length ? text : text[..length];

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
