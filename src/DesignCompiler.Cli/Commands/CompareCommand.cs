using System.CommandLine;
using DesignCompiler.Diagnostics;
using DesignCompiler.Numerics;
using DesignCompiler.Rendering.Simulation;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Comparisons;

namespace DesignCompiler.Cli.Commands;

/// <summary>
/// <c>trialc compare DESIGN_A DESIGN_B</c>: both designs simulated on the scenarios they share,
/// with common random numbers, reporting A, B and the paired difference B − A per figure.
/// </summary>
internal static class CompareCommand
{
    public static Command Create(CliConsole console)
    {
        var designA = new Argument<string>("DESIGN_A") { Description = "The first design (*.trial); its seed drives both simulations." };
        var designB = new Argument<string>("DESIGN_B") { Description = "The second design (*.trial)." };
        var scenario = SimulationCli.ScenarioOption();
        var reps = SimulationCli.RepsOption();
        var threads = SimulationCli.ThreadsOption();
        var seed = SimulationCli.SeedOption();
        var margin = SimulationCli.MarginOption();
        var format = SimulationCli.FormatOption("text", "json", "html");
        var output = SimulationCli.OutOption("Write the report to this file instead of standard output.");

        var command = new Command("compare", "Simulate two designs on the same scenarios with common random numbers and report their differences.");
        command.Arguments.Add(designA);
        command.Arguments.Add(designB);
        foreach (var option in new Option[] { scenario, reps, threads, seed, margin, format, output }) command.Options.Add(option);
        command.SetAction(parse => Run(console, parse.GetValue(designA)!, parse.GetValue(designB)!, parse.GetValue(scenario),
            parse.GetValue(reps), parse.GetValue(threads), parse.GetValue(seed), parse.GetValue(margin), parse.GetValue(format)!,
            parse.GetValue(output)));
        return command;
    }

    private static int Run(CliConsole console, string pathA, string pathB, string? scenarioName, long reps, int threads,
        ulong? seed, double? marginGiven, string format, string? outPath)
    {
        QuadratureWarmUp.Start();
        var (plannerA, exitA) = SimulationCli.LoadPlanner(console, pathA);
        var (plannerB, exitB) = SimulationCli.LoadPlanner(console, pathB);
        if (plannerA is null || plannerB is null) return Math.Max(exitA, exitB);
        var (a, b) = (plannerA.Design, plannerB.Design);
        if (SimulationCli.SelectScenarios(console, a, scenarioName) is null) return ExitCodes.InputErrors;

        var matching = ScenarioMatching.Of(a, b);
        if (scenarioName is not null)
            matching = matching with { Pairs = matching.Pairs.Where(p => p.A.Name == scenarioName).ToList() };
        if (matching.Pairs.Count == 0)
        {
            console.Report([new Diagnostic(SimulationDiagnostics.NothingToCompare, SourceLocation.File(pathB), [],
                string.Join("; ", matching.Notes.DefaultIfEmpty("give both designs a scenario of the same name")))]);
            return ExitCodes.InputErrors;
        }

        var (margin, rule) = SimulationCli.Margin(a, marginGiven);
        var settings = new SimulationSettings(reps, threads, seed ?? a.Seed, margin, rule, Shard.Whole);
        var result = SimulationCli.RunCancellable(console, reps * matching.Pairs.Count,
            (progress, cancel) => ComparisonRunner.Run(plannerA, plannerB, matching, settings, progress, cancel));
        return SimulationCli.Emit(console, SimulationOutputs.Render(ComparisonReport.Build(result), format), outPath);
    }
}
