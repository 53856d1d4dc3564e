using System.CommandLine;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;

namespace DesignCompiler.Cli.Commands;

/// <summary><c>trialc verify --ledger L</c>: checks the ledger's hash chain; one line either way, naming the first broken entry.</summary>
internal static class VerifyCommand
{
    public static Command Create(CliConsole console)
    {
        var ledger = new Option<string>("--ledger") { Description = "The trial's ledger.", Required = true };
        var command = new Command("verify", "Check that a ledger is exactly as trialc wrote it.");
        command.Options.Add(ledger);
        command.SetAction(parse => Run(console, parse.GetValue(ledger)!));
        return command;
    }

    private static int Run(CliConsole console, string ledgerPath)
    {
        using var ledger = LedgerCommandSupport.Open(console, ledgerPath, create: false);
        if (ledger is null) return ExitCodes.InputErrors;
        var verified = ledger.Verify();
        if (console.Report(verified.Diagnostics) || verified.Value is not { } check) return ExitCodes.InputErrors;
        if (!check.Intact)
        {
            console.Report([new Diagnostic(LedgerDiagnostics.LedgerChanged, SourceLocation.File(ledgerPath), [check.Problem!])]);
            return ExitCodes.InputErrors;
        }

        var read = ledger.Read();
        if (console.Report(read.Diagnostics) || read.Value is not { } history) return ExitCodes.InputErrors;
        console.Out.WriteLine(FormattableString.Invariant(
            $"{ledgerPath}: ok: {check.Entries} {(check.Entries == 1 ? "entry" : "entries")}, {history.Rounds.Count} round(s) issued, {history.RecordedRounds} recorded, chain head {check.HeadHash[..12]}"));
        return ExitCodes.Ok;
    }
}
