using System.CommandLine;
using DesignCompiler.Ledger;

namespace DesignCompiler.Cli.Commands;

/// <summary><c>trialc export --ledger L [--out FILE]</c>: the ledger as one tidy CSV, one row per plot and round.</summary>
internal static class ExportCommand
{
    public static Command Create(CliConsole console)
    {
        var ledger = new Option<string>("--ledger") { Description = "The trial's ledger.", Required = true };
        var output = new Option<string?>("--out") { Description = "Write the CSV to this file instead of standard output." };
        var command = new Command("export", "Export a ledger as one tidy CSV, one row per plot and round.");
        command.Options.Add(ledger);
        command.Options.Add(output);
        command.SetAction(parse => Run(console, parse.GetValue(ledger)!, parse.GetValue(output)));
        return command;
    }

    private static int Run(CliConsole console, string ledgerPath, string? outPath)
    {
        using var ledger = LedgerCommandSupport.Open(console, ledgerPath, create: false);
        if (ledger is null) return ExitCodes.InputErrors;
        var read = ledger.Read();
        if (console.Report(read.Diagnostics) || read.Value is not { } history) return ExitCodes.InputErrors;
        return LedgerCommandSupport.WriteOutput(console, outPath, LedgerExport.ToCsv(history)) ? ExitCodes.Ok : ExitCodes.InputErrors;
    }
}
