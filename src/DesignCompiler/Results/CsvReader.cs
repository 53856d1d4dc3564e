using System.Text;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Text;

namespace DesignCompiler.Results;

/// <summary>
/// Splits a CSV text into records and fields per RFC 4180: fields separated by commas, a field
/// in double quotes may hold commas, quotes (doubled) and line breaks. Line ends may be CRLF,
/// LF or CR, since sheets come back from every kind of spreadsheet and editor. Every field keeps
/// its span, so a problem is reported at the line and column where the field starts.
/// </summary>
public static class CsvReader
{
    /// <summary>
    /// Splits the text; past <paramref name="maxRecords"/> records it stops with a problem at the first
    /// record too many, so a file of millions of short lines costs no more than a sheet of the largest round.
    /// </summary>
    public static (IReadOnlyList<CsvRecord> Records, IReadOnlyList<Diagnostic> Problems) Read(
        SourceText source, int maxRecords = int.MaxValue, Func<int, Diagnostic>? tooMany = null)
    {
        var text = source.Content;
        var records = new List<CsvRecord>();
        var problems = new List<Diagnostic>();
        var position = 0;
        while (position < text.Length)
        {
            if (records.Count == maxRecords)
            {
                problems.Add(tooMany?.Invoke(position) ?? new Diagnostic(LedgerDiagnostics.CsvMalformed,
                    SourceLocation.In(source, new TextSpan(position, 0)),
                    [FormattableString.Invariant($"the file has more than {maxRecords} records")]));
                break;
            }
            var start = position;
            var fields = new List<CsvField>();
            while (true)
            {
                var field = ReadField(source, position, problems);
                fields.Add(field);
                position = field.Span.End;
                if (position < text.Length && text[position] == ',')
                {
                    position++;
                    continue;
                }
                break;
            }
            records.Add(new CsvRecord(TextSpan.FromBounds(start, position), fields));
            position = SkipLineBreak(text, position);
        }
        return (records, problems);
    }

    private static CsvField ReadField(SourceText source, int start, List<Diagnostic> problems)
    {
        var text = source.Content;
        var quote = start;
        // People editing by hand sometimes leave a blank before an opening quote; the field is still quoted.
        while (quote < text.Length && (text[quote] == ' ' || text[quote] == '\t')) quote++;
        if (quote >= text.Length || text[quote] != '"')
        {
            var end = start;
            while (end < text.Length && !IsSeparator(text[end])) end++;
            return new CsvField(text[start..end], TextSpan.FromBounds(start, end), false);
        }

        var value = new StringBuilder();
        var i = quote + 1;
        while (true)
        {
            if (i >= text.Length)
            {
                problems.Add(new Diagnostic(LedgerDiagnostics.CsvMalformed, SourceLocation.In(source, new TextSpan(quote, 1)),
                    ["the quoted field that starts here is never closed; a field that opens with '\"' must end with '\"'"]));
                return new CsvField(value.ToString(), TextSpan.FromBounds(start, text.Length), true);
            }
            if (text[i] == '"')
            {
                if (i + 1 < text.Length && text[i + 1] == '"')
                {
                    value.Append('"');
                    i += 2;
                    continue;
                }
                i++;
                break;
            }
            value.Append(text[i++]);
        }

        var after = i;
        while (after < text.Length && (text[after] == ' ' || text[after] == '\t')) after++;
        if (after < text.Length && !IsSeparator(text[after]))
        {
            var junk = after;
            while (after < text.Length && !IsSeparator(text[after])) after++;
            problems.Add(new Diagnostic(LedgerDiagnostics.CsvMalformed, SourceLocation.In(source, TextSpan.FromBounds(junk, after)),
                ["text follows the closing quote of a field; put the whole field in quotes and double the quotes inside it"]));
        }
        return new CsvField(value.ToString(), TextSpan.FromBounds(start, after), true);
    }

    private static bool IsSeparator(char c) => c is ',' or '\r' or '\n';

    private static int SkipLineBreak(string text, int position)
    {
        if (position < text.Length && text[position] == '\r') position++;
        if (position < text.Length && text[position] == '\n') position++;
        return position;
    }
}
