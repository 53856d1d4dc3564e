using System.CommandLine;
using DesignCompiler.Cli.Commands;

namespace DesignCompiler.Cli;

/// <summary>
/// The command line: builds the commands, parses, and maps every outcome to an exit code.
/// Output goes to the writers given, so tests can run trialc in-process.
/// </summary>
public static class TrialcApp
{
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr)
    {
        var console = new CliConsole(stdout, stderr);
        var root = new RootCommand("trialc: compile adaptive field-trial designs into round-by-round allocation sheets.");
        root.Subcommands.Add(CheckCommand.Create(console));
        root.Subcommands.Add(CompileCommand.Create(console));
        root.Subcommands.Add(RecordCommand.Create(console));
        root.Subcommands.Add(StatusCommand.Create(console));
        root.Subcommands.Add(ExportCommand.Create(console));
        root.Subcommands.Add(VerifyCommand.Create(console));
        root.Subcommands.Add(SimulateCommand.Create(console));
        root.Subcommands.Add(CompareCommand.Create(console));
        root.Subcommands.Add(MergeCommand.Create(console));
        root.Subcommands.Add(AnalyzeCommand.Create(console));

        var parsed = root.Parse(args);
        if (parsed.Errors.Count > 0)
        {
            foreach (var error in parsed.Errors) stderr.WriteLine("trialc: " + error.Message);
            stderr.WriteLine("Run 'trialc --help' for the commands and their options.");
            return ExitCodes.Usage;
        }

        try
        {
            return parsed.Invoke(new InvocationConfiguration { Output = stdout, Error = stderr, EnableDefaultExceptionHandler = false });
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            // Bad input never gets here: it is reported as diagnostics. This is a bug.
            stderr.WriteLine($"trialc: internal error: {e.GetType().Name}: {e.Message}");
            stderr.WriteLine("This is a bug in trialc, not in your input; please report it with the design file.");
            return ExitCodes.InternalError;
        }
    }
}
