using System.Globalization;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Results;
using DesignCompiler.Text;

namespace DesignCompiler.Analysis.Trial;

/// <summary>
/// Reads results kept elsewhere in the tidy CSV that <c>trialc export</c> writes (columns round,
/// block, plot, row, column, arm, outcome, missing_reason, recorded_at; only round, block, arm and
/// outcome are used), checking every row against the design. Rows with an empty outcome and a
/// missing reason are lost plots; rows with neither are plots not recorded yet and are skipped.
/// </summary>
public static class TidyDataReader
{
    public static (IReadOnlyList<AnalysisPlot> Plots, IReadOnlyList<Diagnostic> Problems) Read(SourceText source, CheckedDesign design)
    {
        var (records, problems) = CsvReader.Read(source);
        var found = new List<Diagnostic>(problems);
        var plots = new List<AnalysisPlot>();
        if (found.Count > 0) return (plots, found);
        var rows = records.Where(r => !r.IsBlank).ToList();
        if (rows.Count == 0)
        {
            found.Add(AnalysisDiagnostics.At(AnalysisDiagnostics.DataEmpty, SourceLocation.File(source.Path), "give a CSV with the header " + LedgerExport.Header + ", as 'trialc export' writes it"));
            return (plots, found);
        }

        var header = rows[0].Fields.Select(f => f.Value).ToList();
        int Column(string name) => header.IndexOf(name);
        var (roundAt, blockAt, armAt, outcomeAt, reasonAt) = (Column("round"), Column("block"), Column("arm"), Column("outcome"), Column("missing_reason"));
        foreach (var (name, at) in new[] { ("round", roundAt), ("block", blockAt), ("arm", armAt), ("outcome", outcomeAt) })
            if (at < 0)
                found.Add(AnalysisDiagnostics.At(AnalysisDiagnostics.DataColumnMissing, SourceLocation.In(source, rows[0].Span), "the export format's header is " + LedgerExport.Header, name));
        if (found.Count > 0) return (plots, found);

        var arms = design.Arms.ToDictionary(a => a.Code, a => a.Index, StringComparer.Ordinal);
        var blocks = design.Blocks.Select((b, j) => (b.Name, j)).ToDictionary(x => x.Name, x => x.j, StringComparer.Ordinal);
        foreach (var row in rows.Skip(1))
        {
            CsvField? Field(int at) => at < row.Fields.Count ? row.Fields[at] : null;
            var roundField = Field(roundAt);
            var blockField = Field(blockAt);
            var armField = Field(armAt);
            var outcomeField = Field(outcomeAt);
            if (roundField is null || blockField is null || armField is null || outcomeField is null)
            {
                found.Add(AnalysisDiagnostics.At(AnalysisDiagnostics.DataRowShort, SourceLocation.In(source, row.Span), "give every row the header's columns (empty fields are fine)", header.Count, row.Fields.Count));
                continue;
            }
            if (!int.TryParse(roundField.Value, NumberStyles.None, CultureInfo.InvariantCulture, out var round) || round < 1 || round > design.Rounds)
            {
                found.Add(AnalysisDiagnostics.At(AnalysisDiagnostics.DataBadRound, SourceLocation.In(source, roundField.Span), FormattableString.Invariant($"rounds are whole numbers from 1 to {design.Rounds}"), roundField.Value));
                continue;
            }
            if (!blocks.TryGetValue(blockField.Value, out var block))
            {
                found.Add(AnalysisDiagnostics.At(AnalysisDiagnostics.DataUnknownBlock, SourceLocation.In(source, blockField.Span),
                    "blocks of this design: " + string.Join(", ", design.Blocks.Select(b => b.Name)), blockField.Value));
                continue;
            }
            if (!arms.TryGetValue(armField.Value, out var arm))
            {
                found.Add(AnalysisDiagnostics.At(AnalysisDiagnostics.DataUnknownArm, SourceLocation.In(source, armField.Span),
                    "arms of this design: " + string.Join(", ", design.Arms.Select(a => a.Code)), armField.Value));
                continue;
            }
            var text = outcomeField.Value;
            if (text.Length == 0)
            {
                // A lost plot carries a reason; a plot with neither value nor reason is not recorded yet.
                if (Field(reasonAt) is { Value.Length: > 0 }) plots.Add(new AnalysisPlot(round, block, arm, null));
                continue;
            }
            if (!double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) || !double.IsFinite(value))
            {
                found.Add(AnalysisDiagnostics.At(AnalysisDiagnostics.DataBadValue, SourceLocation.In(source, outcomeField.Span), "write the outcome as a plain number with a decimal point (e.g. 5.31), or leave it empty and give a missing_reason", text));
                continue;
            }
            plots.Add(new AnalysisPlot(round, block, arm, value));
        }
        return (plots, found);
    }
}
