using DesignCompiler.Diagnostics;
using DesignCompiler.Results;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Fuzz;

/// <summary>
/// Reading and checking a results file's bytes against the fixed issued round, shared by every
/// results format's target: the bytes are decoded to one table shape (CSV or workbook) and checked the same way.
/// </summary>
internal static class ResultsCheck
{
    public static void Run(byte[] input, string path)
    {
        var (file, problems) = ResultFile.Decode(path, input);
        if (file is null)
        {
            if (problems.Count == 0) throw new FuzzFinding("a file was refused without a problem");
            ThrowIfMisplaced(problems, path);
            _ = DiagnosticFormatter.FormatAll(problems);
            return;
        }
        Check(file.Table, path);
    }

    /// <summary>Checks a decoded sheet (CSV or workbook, one table shape) against the fixed issued round.</summary>
    public static void Check(SheetTable table, string path)
    {
        var round = IssuedRound.CoverCrops;
        var (sheet, diagnostics) = ResultSheetChecker.Check(table, round.Sheets, round.Design.Outcome, round.Model);
        _ = DiagnosticFormatter.FormatAll(diagnostics);
        ThrowIfMisplaced(diagnostics, path);
        if (sheet is null)
        {
            if (!diagnostics.Any(d => d.Severity == Severity.Error)) throw new FuzzFinding("a sheet was refused without an error");
            return;
        }
        if (diagnostics.Any(d => d.Severity == Severity.Error)) throw new FuzzFinding("a sheet was accepted despite an error");
        if (sheet.Results.Count != round.Sheets[0].Plots.Count) throw new FuzzFinding("an accepted sheet does not have one result per issued plot");
        foreach (var result in sheet.Results)
            if (result.Value is { } value && !round.Model.Accepts(value).Ok)
                throw new FuzzFinding($"plot {result.PlotId} was accepted with the value {value:R}, which the family refuses");
    }

    /// <summary>Every diagnostic must point inside the text it came from (a workbook cell carries no text and is skipped).</summary>
    private static void ThrowIfMisplaced(IEnumerable<Diagnostic> diagnostics, string path)
    {
        foreach (var d in diagnostics)
            Findings.ThrowIfAny(OutputInvariants.DiagnosticProblems(d.Location.Source ?? new Text.SourceText(path, ""), [d]));
    }
}
