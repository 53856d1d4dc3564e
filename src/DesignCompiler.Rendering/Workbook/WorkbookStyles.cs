using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Spreadsheet;

namespace DesignCompiler.Rendering.Workbook;

/// <summary>
/// The workbook's few cell styles, by index into its cell formats. Black on white with thin
/// borders and a grey header, so a printed sheet reads like the HTML one. The notes column is
/// formatted as text, so "1/2 of plot flooded" is not turned into a date; the outcome column
/// stays General, so a typed number is stored as a number.
/// </summary>
internal static class WorkbookStyles
{
    public const uint Title = 1;
    public const uint Subtitle = 2;
    public const uint Trace = 3;
    public const uint Caution = 4;
    public const uint Header = 5;
    public const uint BodyText = 6;
    public const uint BodyNumber = 7;
    public const uint Outcome = 8;
    public const uint Notes = 9;
    public const uint Instruction = 10;

    /// <summary>The built-in number format "@" (text), ECMA-376 Part 1 §18.8.30.</summary>
    private const uint TextFormat = 49;

    public static Stylesheet Create() => new(
        new Fonts(
            Font(11, false), // 0: body
            Font(11, true),  // 1: bold
            Font(14, true),  // 2: title
            Font(9, false),  // 3: trace line
            Font(10, true))  // 4: caution
        { Count = 5 },
        new Fills(
            new Fill(new PatternFill { PatternType = PatternValues.None }),
            new Fill(new PatternFill { PatternType = PatternValues.Gray125 }),
            new Fill(new PatternFill(new ForegroundColor { Rgb = "FFE6E6E6" }, new BackgroundColor { Indexed = 64 }) { PatternType = PatternValues.Solid }))
        { Count = 3 },
        new Borders(
            new Border(new LeftBorder(), new RightBorder(), new TopBorder(), new BottomBorder(), new DiagonalBorder()),
            new Border(Edge<LeftBorder>(BorderStyleValues.Thin), Edge<RightBorder>(BorderStyleValues.Thin),
                Edge<TopBorder>(BorderStyleValues.Thin), Edge<BottomBorder>(BorderStyleValues.Thin), new DiagonalBorder()),
            new Border(Edge<LeftBorder>(BorderStyleValues.Medium), Edge<RightBorder>(BorderStyleValues.Medium),
                Edge<TopBorder>(BorderStyleValues.Medium), Edge<BottomBorder>(BorderStyleValues.Medium), new DiagonalBorder()))
        { Count = 3 },
        new CellStyleFormats(new CellFormat { NumberFormatId = 0, FontId = 0, FillId = 0, BorderId = 0 }) { Count = 1 },
        new CellFormats(
            Format(0, 0, 0),                                                   // 0: default
            Format(2, 0, 0),                                                   // 1: title
            Format(1, 0, 0),                                                   // 2: subtitle
            Format(3, 0, 0),                                                   // 3: trace
            Format(4, 0, 2, wrap: true),                                       // 4: caution
            Format(1, 2, 1),                                                   // 5: header
            Format(0, 0, 1),                                                   // 6: body text
            Format(0, 0, 1, horizontal: HorizontalAlignmentValues.Center),     // 7: body number
            Format(0, 0, 1, horizontal: HorizontalAlignmentValues.Center),     // 8: outcome (General)
            Format(0, 0, 1, wrap: true, numberFormat: TextFormat),             // 9: notes (text)
            Format(0, 0, 0, wrap: true))                                       // 10: instruction
        { Count = 11 },
        new CellStyles(new CellStyle { Name = "Normal", FormatId = 0, BuiltinId = 0 }) { Count = 1 });

    private static Font Font(double size, bool bold)
    {
        var font = new Font();
        if (bold) font.Append(new Bold());
        font.Append(new FontSize { Val = size }, new Color { Rgb = "FF000000" }, new FontName { Val = "Arial" }, new FontFamilyNumbering { Val = 2 });
        return font;
    }

    private static T Edge<T>(BorderStyleValues style) where T : BorderPropertiesType, new() =>
        new() { Style = style, Color = new Color { Rgb = "FF000000" } };

    private static CellFormat Format(uint font, uint fill, uint border, bool wrap = false,
        HorizontalAlignmentValues? horizontal = null, uint numberFormat = 0)
    {
        var format = new CellFormat
        {
            NumberFormatId = numberFormat, FontId = font, FillId = fill, BorderId = border, FormatId = 0,
            ApplyFont = font != 0, ApplyFill = fill != 0, ApplyBorder = border != 0, ApplyNumberFormat = numberFormat != 0,
        };
        if (wrap || horizontal is not null)
        {
            format.ApplyAlignment = true;
            format.Append(new Alignment { WrapText = wrap ? true : null, Horizontal = horizontal, Vertical = VerticalAlignmentValues.Top });
        }
        return format;
    }
}
