using System.Security.Cryptography;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning.Families;
using DesignCompiler.Results;

namespace DesignCompiler.Ledger;

/// <summary>A sheet taken into the ledger, and the entry that holds it.</summary>
public sealed record RecordedSheet(LedgerEntryInfo Entry, CheckedSheet Sheet);

/// <summary>
/// Checks a returned sheet against the ledger's issued rounds and, when it fits, appends it as
/// one record entry. Runs inside the ledger's write transaction, so a sheet recorded by another
/// command a moment earlier is seen as recorded.
/// </summary>
public static class ResultRecording
{
    public static LedgerResult<RecordedSheet> Record(
        ResultFileText file, CheckedDesign design, LedgerHistory history, LedgerAppender appender)
    {
        var sha = Convert.ToHexStringLower(SHA256.HashData(file.Bytes));
        if (history.RecordingOfFile(sha) is { } earlier)
        {
            var round = history.Rounds.First(r => r.Recording == earlier).Round;
            return Fail(new Diagnostic(LedgerDiagnostics.FileAlreadyRecorded, file.Table.Whole, [round, earlier.Entry.Describe()]));
        }

        var issued = history.Rounds.Select(r => new IssuedSheet(r.Round,
            r.Plots.Select((p, k) => new IssuedPlot(k, p.Block, p.PlotId, p.Row, p.Column, p.ArmCode)).ToList(),
            r.Recording?.Entry.Describe())).ToList();
        var (sheet, problems) = ResultSheetChecker.Check(file.Table, issued, design.Outcome, OutcomeModels.For(design.Outcome));
        if (sheet is null) return Fail(problems);

        var entry = appender.Record(sheet, Path.GetFileName(file.Path), sha, design.Hash);
        return LedgerResult<RecordedSheet>.Ok(new RecordedSheet(entry, sheet));
    }

    private static LedgerResult<RecordedSheet> Fail(params IReadOnlyList<Diagnostic> problems) =>
        LedgerResult<RecordedSheet>.Fail(problems);
}
