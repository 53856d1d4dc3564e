using System.CommandLine;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Numerics;
using DesignCompiler.Planning;
using DesignCompiler.Rendering;
using DesignCompiler.Rendering.Status;

namespace DesignCompiler.Cli.Commands;

/// <summary>
/// <c>trialc status DESIGN --ledger L [--format text|json|html]</c>: where the trial stands —
/// per arm plots so far, posterior, P(best), expected loss; the stop and drop rules; stock;
/// P(best) after each round — computed from the ledger with the planner's own pieces.
/// </summary>
internal static class StatusCommand
{
    public static Command Create(CliConsole console)
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (*.trial) the trial runs under." };
        var ledger = new Option<string?>("--ledger") { Description = "The trial's ledger (default: beside the design, extension .ledger)." };
        var format = new Option<string>("--format")
        {
            Description = "text (default), json, or html (one printable page with a chart of P(best) by round).",
            DefaultValueFactory = _ => "text",
        };
        format.AcceptOnlyFromAmong([.. StatusOutputs.Formats]);
        var output = new Option<string?>("--out") { Description = "Write to this file instead of standard output." };
        var template = new Option<string?>("--template")
        {
            Description = "A Scriban template of your own (FILE.sbn) to render the status with, in place of --format (docs/templates.md).",
        };
        var command = new Command("status", "Show where a trial stands, from its ledger.");
        command.Arguments.Add(design);
        command.Options.Add(ledger);
        command.Options.Add(format);
        command.Options.Add(output);
        command.Options.Add(template);
        command.SetAction(parse => Run(console, parse.GetValue(design)!, parse.GetValue(ledger), parse.GetValue(format)!, parse.GetValue(output),
            parse.GetValue(template)));
        return command;
    }

    private static int Run(CliConsole console, string designPath, string? ledgerPath, string format, string? outPath, string? templatePath)
    {
        QuadratureWarmUp.Start();
        var (checkedDesign, diagnostics) = DesignLoader.Load(designPath);
        if (console.Report(diagnostics) || checkedDesign is null) return ExitCodes.InputErrors;
        UserTemplate? template = null;
        if (templatePath is not null)
        {
            var (loaded, problems) = UserTemplate.Load(templatePath);
            if (console.Report(problems) || loaded is null) return ExitCodes.InputErrors;
            template = loaded;
        }
        var (planner, problem) = RoundPlanner.For(checkedDesign);
        if (planner is null)
        {
            console.Report([problem!]);
            return ExitCodes.InputErrors;
        }

        ledgerPath ??= LedgerCommandSupport.DefaultPath(designPath);
        using var ledger = LedgerCommandSupport.Open(console, ledgerPath, create: false);
        if (ledger is null) return ExitCodes.InputErrors;
        var read = ledger.Read();
        if (console.Report(read.Diagnostics) || read.Value is not { } history) return ExitCodes.InputErrors;
        if (history.CurrentDesignHash is { } current && current != checkedDesign.Hash)
        {
            console.Report([new Diagnostic(LedgerDiagnostics.DesignChanged, SourceLocation.File(designPath),
                [FormattableString.Invariant($"the ledger's last entry ({history.Entries[^1].Describe()})"), current[..12], checkedDesign.ShortHash])]);
            return ExitCodes.InputErrors;
        }

        var status = TrialStatusBuilder.Build(planner, history);
        if (console.Report(status.Diagnostics) || status.Value is null) return ExitCodes.InputErrors;
        var rendered = template is null ? StatusOutputs.Render(status.Value, format) : StatusOutputs.Render(status.Value, template);
        if (console.Report(rendered.Diagnostics) || rendered.Text is null) return ExitCodes.InputErrors;
        return LedgerCommandSupport.WriteOutput(console, outPath, rendered.Text) ? ExitCodes.Ok : ExitCodes.InputErrors;
    }
}
