using System.CommandLine;
using DesignCompiler.Diagnostics;
using DesignCompiler.Rendering.Simulation;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Partials;
using DesignCompiler.Simulation.Reports;
using DesignCompiler.Text;

namespace DesignCompiler.Cli.Commands;

/// <summary>
/// <c>trialc merge PART…</c>: combines the partial summaries of a sharded simulation into
/// exactly the report one unsharded run gives.
/// </summary>
internal static class MergeCommand
{
    /// <summary>Partial summaries are megabytes at most; anything far larger is the wrong file.</summary>
    public const long MaxPartBytes = 512L * 1024 * 1024;

    public static Command Create(CliConsole console)
    {
        var parts = new Argument<string[]>("PART") { Description = "Partial summaries written by 'trialc simulate --shard k/n --out PART', one per shard.", Arity = ArgumentArity.OneOrMore };
        var format = SimulationCli.FormatOption("json", "text", "html");
        var output = SimulationCli.OutOption("Write the report to this file instead of standard output.");
        var command = new Command("merge", "Combine the partial summaries of a sharded simulation into one report.");
        command.Arguments.Add(parts);
        command.Options.Add(format);
        command.Options.Add(output);
        command.SetAction(parse => Run(console, parse.GetValue(parts)!, parse.GetValue(format)!, parse.GetValue(output)));
        return command;
    }

    private static int Run(CliConsole console, string[] paths, string format, string? outPath)
    {
        var files = new List<PartialFile>();
        var problems = new List<Diagnostic>();
        foreach (var path in paths)
        {
            var (text, problem) = SourceFiles.Read(path, MaxPartBytes, "a simulation part");
            if (text is null)
            {
                problems.Add(problem!);
                continue;
            }
            try
            {
                files.Add(new PartialFile(path, PartialReader.Read(text.Content)));
            }
            catch (FormatException e)
            {
                problems.Add(new Diagnostic(SimulationDiagnostics.PartialUnreadable, SourceLocation.File(path), [e.Message]));
            }
        }
        if (console.Report(problems)) return ExitCodes.InputErrors;

        var (merged, mergeProblems) = PartialMerge.Merge(files);
        if (console.Report(mergeProblems) || merged is null) return ExitCodes.InputErrors;
        return SimulationCli.Emit(console, SimulationOutputs.Render(ReportBuilder.Build(merged), format), outPath);
    }
}
