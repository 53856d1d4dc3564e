using System.Globalization;
using System.Text;

namespace DesignCompiler.Diagnostics;

/// <summary>
/// Renders diagnostics the way compilers do: <c>file:line:col: error TD2011: message</c>
/// (<c>file:sheet!cell: …</c> for a workbook),
/// then the source line with carets under the span, then the hint and related notes.
/// </summary>
public static class DiagnosticFormatter
{
    public static string Format(Diagnostic diagnostic)
    {
        var builder = new StringBuilder();
        AppendHeadline(builder, diagnostic.Location, $"{SeverityWord(diagnostic.Severity)} {diagnostic.Id}: {diagnostic.Message}");
        AppendSnippet(builder, diagnostic.Location);
        if (diagnostic.Hint is { } hint) builder.Append("  = hint: ").Append(hint).Append('\n');
        foreach (var related in diagnostic.RelatedLocations)
        {
            AppendHeadline(builder, related.Location, "note: " + related.Note);
            AppendSnippet(builder, related.Location);
        }
        return builder.ToString();
    }

    public static string FormatAll(IEnumerable<Diagnostic> diagnostics)
    {
        var list = diagnostics.ToList();
        var builder = new StringBuilder();
        foreach (var diagnostic in list) builder.Append(Format(diagnostic));
        var errors = list.Count(d => d.Severity == Severity.Error);
        var warnings = list.Count - errors;
        if (list.Count > 0)
            builder.Append(string.Create(CultureInfo.InvariantCulture,
                $"{errors} error{(errors == 1 ? "" : "s")}, {warnings} warning{(warnings == 1 ? "" : "s")}\n"));
        return builder.ToString();
    }

    private static string SeverityWord(Severity severity) => severity == Severity.Error ? "error" : "warning";

    private static void AppendHeadline(StringBuilder builder, SourceLocation location, string text)
    {
        builder.Append(location.Path);
        if (location.Source is not null)
        {
            var start = location.Start;
            builder.Append(CultureInfo.InvariantCulture, $":{start.Line}:{start.Column}");
        }
        else if (location.Cell is { } cell)
        {
            builder.Append(':').Append(cell.Text);
        }
        builder.Append(": ").Append(text).Append('\n');
    }

    private static void AppendSnippet(StringBuilder builder, SourceLocation location)
    {
        if (location.Source is not { } source || source.Content.Length == 0 && location.Span.Length == 0) return;
        var start = location.Start;
        var line = source.LineText(start.Line);
        var lineEnd = source.PositionOf(location.Span.End);
        var width = lineEnd.Line == start.Line ? Math.Max(1, lineEnd.Column - start.Column) : Math.Max(1, line.Length - start.Column + 1);
        var number = start.Line.ToString(CultureInfo.InvariantCulture);
        var gutter = new string(' ', number.Length);
        builder.Append(' ').Append(number).Append(" | ").Append(line.Replace('\t', ' ')).Append('\n');
        builder.Append(' ').Append(gutter).Append(" | ")
            .Append(new string(' ', Math.Max(0, start.Column - 1))).Append(new string('^', width)).Append('\n');
    }
}
