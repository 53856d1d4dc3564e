using System.CommandLine;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Numerics;
using DesignCompiler.Results;

namespace DesignCompiler.Cli.Commands;

/// <summary>
/// <c>trialc record DESIGN --ledger L RESULTS</c>: takes a returned crew sheet (the CSV or the
/// .xlsx workbook) into the ledger if, and only if, it matches an issued round in every plot;
/// otherwise lists every problem with its line and column (sheet and cell for a workbook) and
/// leaves the ledger as it was.
/// </summary>
internal static class RecordCommand
{
    public static Command Create(CliConsole console)
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (*.trial) the trial runs under." };
        var results = new Argument<string>("RESULTS") { Description = "The returned crew sheet, CSV or .xlsx workbook, with the outcomes filled in." };
        var ledger = new Option<string?>("--ledger") { Description = "The trial's ledger (default: beside the design, extension .ledger)." };
        var command = new Command("record", "Record a returned sheet's outcomes in the trial's ledger.");
        command.Arguments.Add(design);
        command.Arguments.Add(results);
        command.Options.Add(ledger);
        command.SetAction(parse => Run(console, parse.GetValue(design)!, parse.GetValue(results)!, parse.GetValue(ledger)));
        return command;
    }

    private static int Run(CliConsole console, string designPath, string resultsPath, string? ledgerPath)
    {
        QuadratureWarmUp.Start();
        var (checkedDesign, diagnostics) = DesignLoader.Load(designPath);
        if (console.Report(diagnostics) || checkedDesign is null) return ExitCodes.InputErrors;
        var (file, problems) = ResultFile.Read(resultsPath);
        if (file is null)
        {
            console.Report(problems);
            return ExitCodes.InputErrors;
        }

        ledgerPath ??= LedgerCommandSupport.DefaultPath(designPath);
        using var ledger = LedgerCommandSupport.Open(console, ledgerPath, create: false);
        if (ledger is null) return ExitCodes.InputErrors;

        var result = ledger.Update(LedgerCommandSupport.Actor(), (history, appender) =>
        {
            if (history.CurrentDesignHash is { } current && current != checkedDesign.Hash)
                return LedgerResult<RecordedSheet>.Fail(new Diagnostic(LedgerDiagnostics.DesignChanged,
                    SourceLocation.File(designPath), [FormattableString.Invariant($"the ledger's last entry ({history.Entries[^1].Describe()})"),
                        current[..12], checkedDesign.ShortHash]));
            return ResultRecording.Record(file, checkedDesign, history, appender);
        });
        if (console.Report(result.Diagnostics) || result.Value is not { Entry: var entry, Sheet: var sheet }) return ExitCodes.InputErrors;

        console.Out.WriteLine(FormattableString.Invariant(
            $"recorded round {sheet.Round} from {resultsPath}: {sheet.Results.Count} plots ({sheet.Results.Count - sheet.Missing} with results, {sheet.Missing} missing)"));
        console.Out.WriteLine(FormattableString.Invariant($"  ledger {ledgerPath}: entry {entry.Seq}, {entry.At} by {entry.User}"));
        console.Out.WriteLine($"  next: trialc compile {designPath} --ledger {ledgerPath} --out DIR");
        return ExitCodes.Ok;
    }
}
