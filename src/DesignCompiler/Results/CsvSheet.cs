using DesignCompiler.Binding;
using System.Globalization;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Text;

namespace DesignCompiler.Results;

/// <summary>
/// A CSV sheet as a <see cref="SheetTable"/>: the first record that is neither blank nor a
/// comment is the header, every record after it a row. Records before the header whose first
/// field starts with <c>#</c> are comments: the issued sheet opens with one naming the trial,
/// round, design, seed and trialc version, so a printed or returned sheet can be traced.
/// </summary>
public static class CsvSheet
{
    public static (SheetTable? Table, IReadOnlyList<Diagnostic> Problems) Read(SourceText text)
    {
        // Bounded before anything is known of the trial: a round's plots at the design maximum, a header,
        // comments and the blank rows spreadsheets add; the checker then holds the file to the trial's own rounds.
        var (records, problems) = CsvReader.Read(text, DesignLimits.MaxPlotsPerRound + 1 + ResultSheetChecker.BlankRowAllowance + 100);
        if (problems.Count > 0) return (null, problems);

        var start = SourceLocation.In(text, new TextSpan(0, 0));
        var lines = records.SkipWhile(r => r.IsBlank || IsComment(r)).Where(r => !r.IsBlank).ToList();
        if (lines.Count == 0)
            return (null, [new Diagnostic(LedgerDiagnostics.EmptySheet, start, [SheetColumns.Header])]);

        var header = lines[0];
        var section = new SheetSection(Row(text, header), SourceLocation.In(text, new TextSpan(header.Span.End, 0)),
            lines.Skip(1).Select(r => Row(text, r)).ToList());
        return (new SheetTable([section], SourceLocation.In(text, new TextSpan(text.Content.Length, 0)), start), []);
    }

    private static bool IsComment(CsvRecord record) => record.Fields[0].Value.StartsWith('#');

    private static SheetRow Row(SourceText text, CsvRecord record)
    {
        var line = text.PositionOf(record.Span.Start).Line;
        return new SheetRow(
            record.Fields.Select(f => new SheetCell(f.Text, SourceLocation.In(text, f.Span))).ToList(),
            SourceLocation.In(text, new TextSpan(record.Span.Start, 0)),
            "line " + line.ToString(CultureInfo.InvariantCulture),
            line);
    }
}
