using DesignCompiler.Diagnostics;

namespace DesignCompiler.Results;

/// <summary>
/// One cell of a returned sheet, a CSV field or a workbook cell: its text and where it is.
/// <see cref="IsDate"/> marks a workbook cell formatted as a date or time, whose number is a day
/// count the spreadsheet made of what was typed, not the value itself.
/// </summary>
public sealed record SheetCell(string Text, SourceLocation Location, bool IsDate = false)
{
    /// <summary>The text without the blanks people and spreadsheets put around values.</summary>
    public string Value => Text.Trim();
}

/// <summary>
/// One row of a returned sheet. <see cref="Name"/> is how a message refers to the row ("line 7"
/// in a CSV file, "north!A7" in a workbook); <see cref="Line"/> is the number the ledger keeps
/// (the line in a CSV file, the row on its worksheet in a workbook).
/// </summary>
public sealed record SheetRow(IReadOnlyList<SheetCell> Cells, SourceLocation Start, string Name, int Line)
{
    /// <summary>An empty line, or a row of empty cells as spreadsheets add below the data.</summary>
    public bool IsBlank => Cells.All(c => c.Value.Length == 0);
}

/// <summary>A header row and the rows under it: the whole of a CSV sheet, or one worksheet of a workbook.</summary>
public sealed record SheetSection(SheetRow Header, SourceLocation HeaderEnd, IReadOnlyList<SheetRow> Rows);

/// <summary>
/// A returned sheet in the same shape whatever file it came in, so CSV and workbook sheets pass
/// through the very same checks. <see cref="End"/> is the place past the last row, where a
/// message about a plot with no row points; <see cref="Whole"/> stands for the file as a whole.
/// </summary>
public sealed record SheetTable(IReadOnlyList<SheetSection> Sections, SourceLocation End, SourceLocation Whole);
