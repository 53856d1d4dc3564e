using System.CommandLine;
using System.CommandLine.Parsing;
using System.Runtime.InteropServices;
using System.Text;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning;
using DesignCompiler.Rendering;
using DesignCompiler.Rendering.Output;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Running;
using DesignCompiler.Text;

namespace DesignCompiler.Cli.Commands;

/// <summary>What simulate, compare and merge share: their options, loading, Ctrl-C, progress and writing the report.</summary>
internal static class SimulationCli
{
    public static Option<string?> ScenarioOption() => new("--scenario") { Description = "Simulate only the scenario of this name." };

    public static Option<long> RepsOption()
    {
        var option = new Option<long>("--reps")
        {
            Description = "Simulated trials per scenario; 2000 gives a standard error of at most 0.011 on every probability.",
            DefaultValueFactory = _ => SimulationSettings.DefaultReplications,
        };
        option.Validators.Add(r => { if (r.GetValueOrDefault<long>() < 1) r.AddError("--reps must be at least 1"); });
        return option;
    }

    public static Option<int> ThreadsOption()
    {
        var option = new Option<int>("--threads")
        {
            Description = "Worker threads (one per processor unless given); results never depend on it.",
            DefaultValueFactory = _ => Environment.ProcessorCount,
        };
        option.Validators.Add(r => { if (r.GetValueOrDefault<int>() < 1) r.AddError("--threads must be at least 1"); });
        return option;
    }

    public static Option<ulong?> SeedOption() => new("--seed") { Description = "Seed of the simulation streams (default: the design's seed)." };

    public static Option<double?> MarginOption()
    {
        var option = new Option<double?>("--margin")
        {
            Description = "Margin, in value units, for 'selected an arm within the margin of the best' (default: 2 percentage points for success rates, else 2 % of the average prior mean).",
        };
        option.Validators.Add(r =>
        {
            if (r.GetValueOrDefault<double?>() is { } m && !(m >= 0 && double.IsFinite(m))) r.AddError("--margin must be a number of 0 or more");
        });
        return option;
    }

    public static Option<string> FormatOption(params string[] formats)
    {
        var option = new Option<string>("--format") { Description = "Report format: " + string.Join(", ", formats) + ".", DefaultValueFactory = _ => formats[0] };
        option.AcceptOnlyFromAmong(formats);
        return option;
    }

    public static Option<string?> OutOption(string description) => new("--out") { Description = description };

    /// <summary>The design and its planner, or the exit code after reporting why not.</summary>
    public static (RoundPlanner? Planner, int Exit) LoadPlanner(CliConsole console, string path)
    {
        var (design, diagnostics) = DesignLoader.Load(path);
        if (console.Report(diagnostics) || design is null) return (null, ExitCodes.InputErrors);
        var (planner, problem) = RoundPlanner.For(design);
        if (planner is null)
        {
            console.Report([problem!]);
            return (null, ExitCodes.InputErrors);
        }
        return (planner, ExitCodes.Ok);
    }

    /// <summary>All scenarios, or the one named; null after reporting that there are none or the name is unknown.</summary>
    public static IReadOnlyList<ScenarioSpec>? SelectScenarios(CliConsole console, CheckedDesign design, string? name)
    {
        if (design.Scenarios.Count == 0)
        {
            console.Report([new Diagnostic(SimulationDiagnostics.NoScenarios, design.Locate(new TextSpan(0, 0)), [],
                "add one or more, e.g. scenario \"no difference\" { every arm 0.5 } or scenario \"prior\" { from prior }")]);
            return null;
        }
        if (name is null) return design.Scenarios;
        var match = design.Scenarios.FirstOrDefault(s => s.Name == name);
        if (match is not null) return [match];
        var names = design.Scenarios.Select(s => s.Name).ToList();
        var hint = Suggestions.DidYouMean(name, names) ?? "the design's scenarios: " + string.Join(", ", names.Select(n => $"'{n}'"));
        console.Report([new Diagnostic(SimulationDiagnostics.UnknownScenario, design.Locate(new TextSpan(0, 0)), [name], hint)]);
        return null;
    }

    public static (double Margin, string Rule) Margin(CheckedDesign design, double? given) =>
        given is { } m ? (m, DefaultMargin.Given(m, design)) : DefaultMargin.For(design);

    /// <summary>The --bench line: seconds, and µs per simulated round as thread time (seconds · threads / rounds).</summary>
    public static void ReportBench(CliConsole console, TimeSpan elapsed, long trials, int rounds, int threads)
    {
        var seconds = elapsed.TotalSeconds;
        var perRound = seconds * Math.Max(1, threads) * 1e6 / Math.Max(1, trials * rounds);
        console.Error.WriteLine(FormattableString.Invariant(
            $"bench: {trials} trials of {rounds} rounds on {threads} thread(s) in {seconds:F3} s ({perRound:F1} us per round per thread)"));
    }

    /// <summary>
    /// Runs a simulation that Ctrl-C (or a batch scheduler's SIGTERM) stops cleanly: no new
    /// replication starts, those running finish, and the caller reports what finished. A
    /// progress line is drawn only when standard error is a terminal.
    /// </summary>
    public static T RunCancellable<T>(CliConsole console, long total, Func<SimulationProgress, CancellationToken, T> run)
    {
        using var cancel = new CancellationTokenSource();
        ConsoleCancelEventHandler onCancel = (_, e) =>
        {
            e.Cancel = true;
            cancel.Cancel();
        };
        Console.CancelKeyPress += onCancel;
        using var term = PosixSignalRegistration.Create(PosixSignal.SIGTERM, context =>
        {
            context.Cancel = true;
            cancel.Cancel();
        });
        var progress = new SimulationProgress(total);
        var interactive = ReferenceEquals(console.Error, Console.Error) && !Console.IsErrorRedirected;
        var started = System.Diagnostics.Stopwatch.GetTimestamp();
        using var timer = interactive
            ? new Timer(_ => console.Error.Write("\r" + ProgressLine.Text(progress.Done, progress.Total, System.Diagnostics.Stopwatch.GetElapsedTime(started))), null, 500, 500)
            : null;
        try
        {
            return run(progress, cancel.Token);
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
            timer?.Dispose();
            if (interactive) console.Error.Write("\r" + new string(' ', ProgressLine.Width) + "\r");
            if (cancel.IsCancellationRequested)
                console.Error.WriteLine(FormattableString.Invariant($"trialc: interrupted; finished {progress.Done} of {progress.Total} trials, the report covers those and says it was cut short"));
        }
    }

    /// <summary>Writes a report to --out (atomically) or to standard output.</summary>
    public static int Emit(CliConsole console, RenderResult rendered, string? outPath)
    {
        if (console.Report(rendered.Diagnostics) || rendered.Text is null) return ExitCodes.InputErrors;
        return Write(console, rendered.Text, outPath);
    }

    public static int Write(CliConsole console, string text, string? outPath)
    {
        if (outPath is null)
        {
            console.Out.Write(text);
            return ExitCodes.Ok;
        }
        var full = Path.GetFullPath(outPath);
        var failure = AtomicOutput.WriteAll(Path.GetDirectoryName(full) ?? ".", [(Path.GetFileName(full), new UTF8Encoding(false).GetBytes(text))]);
        if (failure is not null)
        {
            console.Report([new Diagnostic(DiagnosticCatalog.OutputUnwritable, SourceLocation.File(outPath), [failure])]);
            return ExitCodes.InputErrors;
        }
        console.Out.WriteLine("wrote " + outPath);
        return ExitCodes.Ok;
    }

    /// <summary>Whether an option was written on the command line (not just defaulted).</summary>
    public static bool IsGiven(ParseResult parse, Option option) => parse.GetResult(option) is OptionResult { Implicit: false };
}
