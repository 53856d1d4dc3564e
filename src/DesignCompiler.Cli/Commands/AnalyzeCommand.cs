using System.CommandLine;
using DesignCompiler.Analysis.Trial;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Numerics;
using DesignCompiler.Planning;
using DesignCompiler.Rendering.Analysis;
using DesignCompiler.Simulation.Estimators;
using DesignCompiler.Text;

namespace DesignCompiler.Cli.Commands;

/// <summary>
/// <c>trialc analyze DESIGN (--ledger L | --data FILE)</c>: the end-of-trial estimates per arm
/// (naive, round-stratified, model posterior) with intervals; the classical RCBD table where the
/// allocation was balanced; and the simulated bias and coverage of each estimator under the
/// design's scenarios.
/// </summary>
internal static class AnalyzeCommand
{
    /// <summary>Tidy data files larger than this are refused: a season's results are far smaller.</summary>
    private const long MaxDataBytes = 32L * 1024 * 1024;

    public static Command Create(CliConsole console)
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (*.trial) the trial ran under." };
        var ledger = new Option<string?>("--ledger") { Description = "The trial's ledger (default: beside the design, extension .ledger)." };
        var data = new Option<string?>("--data") { Description = "A tidy CSV in the format 'trialc export' writes, instead of a ledger." };
        var reps = new Option<long>("--reps")
        {
            Description = "Simulated trials per scenario for the estimators' bias and coverage (0 leaves them out).",
            DefaultValueFactory = _ => 200,
        };
        reps.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<long>() is < 0 or > 1_000_000) r.AddError("--reps takes a whole number from 0 to 1000000");
        });
        var format = SimulationCli.FormatOption("text", "json");
        var output = SimulationCli.OutOption("Write the analysis to this file instead of standard output.");
        var command = new Command("analyze", "Estimate every arm at the end of a trial, three ways, with the estimators' simulated bias and coverage.");
        command.Arguments.Add(design);
        foreach (var option in new Option[] { ledger, data, reps, format, output }) command.Options.Add(option);
        command.SetAction(parse =>
        {
            if (parse.GetValue(ledger) is not null && parse.GetValue(data) is not null)
            {
                console.Error.WriteLine("trialc: analyze reads either --ledger or --data, not both");
                return ExitCodes.Usage;
            }
            return Run(console, parse.GetValue(design)!, parse.GetValue(ledger), parse.GetValue(data), parse.GetValue(reps),
                parse.GetValue(format)!, parse.GetValue(output));
        });
        return command;
    }

    private static int Run(CliConsole console, string designPath, string? ledgerPath, string? dataPath, long reps, string format, string? outPath)
    {
        QuadratureWarmUp.Start();
        var (planner, exit) = SimulationCli.LoadPlanner(console, designPath);
        if (planner is null) return exit;
        var checkedDesign = planner.Design;

        IReadOnlyList<AnalysisPlot> plots;
        if (dataPath is not null)
        {
            var (text, problem) = SourceFiles.Read(dataPath, MaxDataBytes, "a results data file");
            if (text is null)
            {
                console.Report([problem!]);
                return ExitCodes.InputErrors;
            }
            var (read, problems) = TidyDataReader.Read(text, checkedDesign);
            if (console.Report(problems)) return ExitCodes.InputErrors;
            plots = read;
        }
        else
        {
            ledgerPath ??= LedgerCommandSupport.DefaultPath(designPath);
            using var ledger = LedgerCommandSupport.Open(console, ledgerPath, create: false);
            if (ledger is null) return ExitCodes.InputErrors;
            var history = ledger.Read();
            if (console.Report(history.Diagnostics) || history.Value is null) return ExitCodes.InputErrors;
            var (read, unknown) = LedgerPlots.Of(checkedDesign, history.Value);
            if (unknown.Count > 0)
            {
                console.Report([AnalysisDiagnostics.At(AnalysisDiagnostics.UnknownInLedger, SourceLocation.File(designPath),
                    "analyse the ledger under the design it was issued from, or amend the design to name them", string.Join(", ", unknown))]);
                return ExitCodes.InputErrors;
            }
            plots = read;
        }
        if (!plots.Any(p => p.Value is not null))
        {
            console.Report([AnalysisDiagnostics.At(AnalysisDiagnostics.NothingRecorded, SourceLocation.File(dataPath ?? ledgerPath ?? designPath),
                "record at least one round ('trialc record'), or give --data with outcomes")]);
            return ExitCodes.InputErrors;
        }

        var simulated = reps == 0 ? [] : EstimatorCheck.Run(planner, checkedDesign.Scenarios, checkedDesign.Seed, reps);
        var report = TrialAnalysis.Build(checkedDesign, plots, simulated);
        var rendered = AnalysisOutputs.Render(report, format);
        if (console.Report(rendered.Diagnostics) || rendered.Text is null) return ExitCodes.InputErrors;
        return LedgerCommandSupport.WriteOutput(console, outPath, rendered.Text) ? ExitCodes.Ok : ExitCodes.InputErrors;
    }
}
