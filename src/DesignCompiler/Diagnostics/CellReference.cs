using System.Globalization;
using System.Text;

namespace DesignCompiler.Diagnostics;

/// <summary>
/// A cell of a spreadsheet workbook, where a returned sheet came as one: the worksheet's name and
/// its place in the workbook, and the one-based row and column. Printed the way spreadsheets
/// write references (<c>north!H5</c>, <c>'block 2'!H5</c>), so a crew can type it into the name box.
/// </summary>
public sealed record CellReference(string Sheet, int SheetIndex, int Row, int Column)
{
    public string Text => SheetText + "!" + ColumnLetters(Column) + Row.ToString(CultureInfo.InvariantCulture);

    /// <summary>An order that follows the workbook: sheet by sheet, row by row, then left to right.</summary>
    public long Order => ((long)SheetIndex << 40) | ((long)Row << 16) | (uint)Column;

    /// <summary>Spreadsheets quote a sheet name that is not a plain word, doubling any apostrophe in it.</summary>
    private string SheetText =>
        Sheet.Length > 0 && Sheet.All(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '.') && !char.IsAsciiDigit(Sheet[0])
            ? Sheet
            : "'" + Sheet.Replace("'", "''") + "'";

    /// <summary>1 → A, 26 → Z, 27 → AA: the bijective base-26 column names of spreadsheets.</summary>
    public static string ColumnLetters(int column)
    {
        var letters = new StringBuilder();
        for (var n = column; n > 0; n = (n - 1) / 26) letters.Insert(0, (char)('A' + (n - 1) % 26));
        return letters.ToString();
    }
}
