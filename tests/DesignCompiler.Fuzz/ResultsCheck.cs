using DesignCompiler.Diagnostics;
using DesignCompiler.Results;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Fuzz;

/// <summary>
/// Reading and checking a results file's bytes against the fixed issued round, shared by every
/// results format's target: a new format decodes its bytes to sheet text and calls <see cref="Check"/>.
/// </summary>
internal static class ResultsCheck
{
    public static void Run(byte[] input, string path)
    {
        var (file, problem) = ResultFile.Decode(path, input);
        if (file is null)
        {
            // A decoding problem points into the part of the file that did decode, its own text.
            var decoded = problem!.Location.Source ?? new Text.SourceText(path, "");
            Findings.ThrowIfAny(OutputInvariants.DiagnosticProblems(decoded, [problem]));
            _ = DiagnosticFormatter.Format(problem!);
            return;
        }
        Check(file.Text);
    }

    public static void Check(Text.SourceText text)
    {
        var round = IssuedRound.CoverCrops;
        var (sheet, diagnostics) = ResultSheetChecker.Check(text, round.Sheets, round.Design.Outcome, round.Model);
        _ = DiagnosticFormatter.FormatAll(diagnostics);
        Findings.ThrowIfAny(OutputInvariants.DiagnosticProblems(text, diagnostics));
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
}
