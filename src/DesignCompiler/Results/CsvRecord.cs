using DesignCompiler.Text;

namespace DesignCompiler.Results;

/// <summary>
/// One field of a CSV record: its text with the surrounding quotes removed and doubled quotes
/// undone, and its span in the file (from the first character after the preceding comma, so a
/// quoted field starts at its opening quote).
/// </summary>
public sealed record CsvField(string Text, TextSpan Span, bool Quoted)
{
    /// <summary>The text without the blanks people and spreadsheets put around values.</summary>
    public string Value => Text.Trim();
}

/// <summary>One record (usually one line) of a CSV file.</summary>
public sealed record CsvRecord(TextSpan Span, IReadOnlyList<CsvField> Fields)
{
    /// <summary>An empty line, or a row of empty fields as spreadsheets add below the data.</summary>
    public bool IsBlank => Fields.All(f => f.Value.Length == 0);
}
