using System.CommandLine;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Numerics;
using DesignCompiler.Planning;
using DesignCompiler.Rendering;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Rendering.Output;

namespace DesignCompiler.Cli.Commands;

/// <summary>
/// <c>trialc compile DESIGN --out DIR</c>: the next round's crew sheets (CSV, HTML, .xlsx), the
/// plan (JSON), a summary (Markdown), the round report (HTML with charts), and one file for each
/// <c>--template</c>. With <c>--format json</c> the plan goes to standard output.
/// Without <c>--ledger</c> it compiles round 1 from the design alone; with it, the trial's next
/// round from what the ledger holds (see <see cref="LedgerCompile"/>).
/// </summary>
internal static class CompileCommand
{
    public static Command Create(CliConsole console)
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (*.trial)." };
        var output = new Option<string?>("--out") { Description = "Folder for the sheets; created if missing." };
        var format = new Option<string>("--format")
        {
            Description = "files: write sheets to --out (default); json: print the round plan to standard output.",
            DefaultValueFactory = _ => "files",
        };
        format.AcceptOnlyFromAmong("files", "json");
        var ledger = new Option<string?>("--ledger")
        {
            Description = "The trial's ledger: compile its next round (or re-issue the round awaiting results) and record it there. Created with round 1.",
        };
        var amend = new Option<string?>("--amend")
        {
            Description = "With --ledger: accept a design text changed since the last round, recording this reason.",
        };
        var round = new Option<int?>("--round")
        {
            Description = "With --ledger: the round expected to be compiled; refused when it is not the next one.",
        };
        var templates = new Option<string[]>("--template")
        {
            Description = "A Scriban template of your own (FILE.sbn), rendered from the same model as the sheets and written beside them as STEM-roundN.FILE; may be given more than once (docs/templates.md).",
            DefaultValueFactory = _ => [],
        };

        var command = new Command("compile", "Compile the next round of a design into allocation sheets.");
        command.Arguments.Add(design);
        command.Options.Add(output);
        command.Options.Add(format);
        command.Options.Add(ledger);
        command.Options.Add(amend);
        command.Options.Add(round);
        command.Options.Add(templates);
        command.SetAction(parse => Run(console, parse.GetValue(design)!, parse.GetValue(output), parse.GetValue(format)!,
            parse.GetValue(ledger), parse.GetValue(amend), parse.GetValue(round), parse.GetValue(templates) ?? []));
        return command;
    }

    private static int Run(CliConsole console, string path, string? outDirectory, string format, string? ledger, string? amend, int? round,
        string[] templatePaths)
    {
        QuadratureWarmUp.Start();
        if (format == "files" && string.IsNullOrWhiteSpace(outDirectory))
        {
            console.Error.WriteLine("trialc: compile needs --out DIR for the sheets, or --format json to print the plan");
            return ExitCodes.Usage;
        }
        if (format == "json" && templatePaths.Length > 0)
        {
            console.Error.WriteLine("trialc: --template writes a file beside the sheets; give --out DIR instead of --format json");
            return ExitCodes.Usage;
        }

        var (checkedDesign, diagnostics) = DesignLoader.Load(path);
        if (console.Report(diagnostics) || checkedDesign is null) return ExitCodes.InputErrors;

        // Templates are read and parsed before anything is planned or written, so a broken one leaves nothing behind.
        var templates = new List<UserTemplate>();
        var templateProblems = new List<Diagnostic>();
        foreach (var templatePath in templatePaths)
        {
            var (template, problems) = UserTemplate.Load(templatePath);
            templateProblems.AddRange(problems);
            if (template is not null) templates.Add(template);
        }
        if (console.Report(templateProblems)) return ExitCodes.InputErrors;

        var (planner, problem) = RoundPlanner.For(checkedDesign);
        if (planner is null)
        {
            console.Report([problem!]);
            return ExitCodes.InputErrors;
        }

        if (ledger is not null)
            return LedgerCompile.Run(console, path, checkedDesign, planner, ledger, outDirectory, format, amend, round, templates);
        if (amend is not null || round is not null)
        {
            console.Error.WriteLine("trialc: --amend and --round apply to a trial's ledger; give --ledger LEDGER as well");
            return ExitCodes.Usage;
        }
        if (File.Exists(LedgerCommandSupport.DefaultPath(path)))
            console.Error.WriteLine($"trialc: note: {LedgerCommandSupport.DefaultPath(path)} is this design's ledger; without --ledger this compiles round 1 from the design alone");

        var state = new TrialState(checkedDesign.Arms.Count);
        var result = planner.Plan(state, 1);
        if (console.Report(result.Diagnostics) || result.Plan is null)
        {
            if (result.StopReason is not null) console.Out.WriteLine(result.StopReason);
            return result.Plan is null && result.StopReason is not null ? ExitCodes.Ok : ExitCodes.InputErrors;
        }

        var plan = result.Plan;
        if (format == "json")
        {
            console.Out.Write(RoundOutputs.Json(plan, checkedDesign));
            return ExitCodes.Ok;
        }

        var stem = Path.GetFileNameWithoutExtension(path);
        var (files, renderProblems) = RoundOutputs.Render(plan, checkedDesign, stem, null, RoundFigures.FromDesign(checkedDesign), templates);
        if (console.Report(renderProblems)) return ExitCodes.InputErrors;
        var failure = AtomicOutput.WriteAll(outDirectory!, files);
        if (failure is not null)
        {
            console.Report([new Diagnostic(DiagnosticCatalog.OutputUnwritable, SourceLocation.File(outDirectory!), [failure])]);
            return ExitCodes.InputErrors;
        }

        PlanSummary.Write(console.Out, plan);
        foreach (var (name, _) in files) console.Out.WriteLine("  wrote " + Path.Combine(outDirectory!, name));
        return ExitCodes.Ok;
    }
}

/// <summary>The few lines a person reads after compiling: plots and P(best) per arm.</summary>
internal static class PlanSummary
{
    public static void Write(TextWriter writer, RoundPlan plan)
    {
        writer.WriteLine(FormattableString.Invariant($"{plan.Trial}: round {plan.Round} of {plan.Rounds}, {plan.Plots} plots, policy {plan.Policy}"));
        writer.WriteLine(FormattableString.Invariant($"  design {plan.DesignHash[..12]} · seed {plan.Seed} · trialc {RoundOutputs.ToolVersion}"));
        writer.WriteLine("  arm       plots  P(best)  mean      95% interval          status");
        foreach (var arm in plan.Arms)
        {
            writer.WriteLine(FormattableString.Invariant(
                $"  {arm.Code,-9} {arm.Plots,5}  {NumberText.Probability(arm.ProbabilityBest),7}  {NumberText.Significant(arm.PosteriorMean),-8}  {NumberText.Significant(arm.CredibleLower) + " to " + NumberText.Significant(arm.CredibleUpper),-20}  {SheetModelBuilder.StatusText(arm.Status)}"));
        }
    }
}
