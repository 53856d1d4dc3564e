using System.CommandLine;
using DesignCompiler.Numerics;
using DesignCompiler.Planning;
using DesignCompiler.Rendering.Simulation;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Partials;
using DesignCompiler.Simulation.Reports;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Cli.Commands;

/// <summary>
/// <c>trialc simulate DESIGN</c>: Monte Carlo operating characteristics of a design in each of
/// its scenarios, by running many simulated trials through the planner. With <c>--shard k/n
/// --out PART</c> it runs one share of the replications and writes a partial summary for
/// <c>trialc merge</c>.
/// </summary>
internal static class SimulateCommand
{
    public static Command Create(CliConsole console)
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (*.trial)." };
        var scenario = SimulationCli.ScenarioOption();
        var reps = SimulationCli.RepsOption();
        var threads = SimulationCli.ThreadsOption();
        var seed = SimulationCli.SeedOption();
        var margin = SimulationCli.MarginOption();
        var format = SimulationCli.FormatOption("text", "json", "html");
        var output = SimulationCli.OutOption("Write the report (or, with --shard, the partial summary) to this file instead of standard output.");
        var shard = new Option<string?>("--shard") { Description = "Run shard k of n (replications i with i mod n = k - 1) and write a partial summary to --out, for 'trialc merge'." };
        shard.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<string?>() is { } text && Shard.Parse(text) is null) r.AddError($"--shard takes k/n with 1 <= k <= n, not '{text}'");
        });

        var skipTwin = new Option<bool>("--skip-equal")
        {
            Description = "Do not simulate the design's equal-allocation twin beside it (about halves the time; the report then has no 'against equal allocation' section).",
        };

        var bench = new Option<bool>("--bench") { Description = "Also print how long the simulation itself took (not start-up or loading) to standard error; the report is unchanged." };

        var command = new Command("simulate", "Simulate many trials of a design in each scenario and report its operating characteristics.");
        command.Arguments.Add(design);
        foreach (var option in new Option[] { scenario, reps, threads, seed, margin, format, output, shard, skipTwin, bench }) command.Options.Add(option);
        command.SetAction(parse =>
        {
            var shardText = parse.GetValue(shard);
            var outPath = parse.GetValue(output);
            if (shardText is not null && outPath is null)
            {
                console.Error.WriteLine("trialc: simulate --shard needs --out PART for the partial summary");
                return ExitCodes.Usage;
            }
            if (shardText is not null && SimulationCli.IsGiven(parse, format))
            {
                console.Error.WriteLine("trialc: a shard writes a partial summary (JSON) for 'trialc merge'; leave out --format, and give it to merge");
                return ExitCodes.Usage;
            }
            return Run(console, parse.GetValue(design)!, parse.GetValue(scenario), parse.GetValue(reps), parse.GetValue(threads),
                parse.GetValue(seed), parse.GetValue(margin), parse.GetValue(format)!, outPath,
                shardText is null ? Shard.Whole : Shard.Parse(shardText)!.Value, shardText is not null, !parse.GetValue(skipTwin), parse.GetValue(bench));
        });
        return command;
    }

    private static int Run(CliConsole console, string path, string? scenarioName, long reps, int threads, ulong? seed,
        double? marginGiven, string format, string? outPath, Shard shard, bool writePartial, bool withTwin, bool bench)
    {
        QuadratureWarmUp.Start();
        var (planner, exit) = SimulationCli.LoadPlanner(console, path);
        if (planner is null) return exit;
        var design = planner.Design;
        var scenarios = SimulationCli.SelectScenarios(console, design, scenarioName);
        if (scenarios is null) return ExitCodes.InputErrors;

        var (margin, rule) = SimulationCli.Margin(design, marginGiven);
        var settings = new SimulationSettings(reps, threads, seed ?? design.Seed, margin, rule, shard);
        var total = shard.Size(reps) * scenarios.Count;
        // The equal-allocation twin runs beside the design on the same random numbers, unless the
        // design already shares plots equally (then the twin would be the design itself).
        var twin = withTwin && design.Policy.Kind != Syntax.PolicyKind.Equal ? RoundPlanner.For(design.EqualTwin()).Planner : null;
        // The clock is read only for the --bench line, never for the report.
        var started = System.Diagnostics.Stopwatch.GetTimestamp();
        var result = SimulationCli.RunCancellable(console, total, (progress, cancel) => Simulator.Run(planner, scenarios, settings, progress, cancel, twin));
        if (bench) SimulationCli.ReportBench(console, System.Diagnostics.Stopwatch.GetElapsedTime(started), total * (twin is null ? 1 : 2), design.Rounds, threads);

        if (writePartial) return SimulationCli.Write(console, PartialWriter.Write(result), outPath);
        return SimulationCli.Emit(console, SimulationOutputs.Render(ReportBuilder.Build(result), format), outPath);
    }
}
