using System.CommandLine;

namespace DesignCompiler.Cli.Commands;

internal static class CompileCommand
{
    public static Command Create(CliConsole console)
    {
        var command = new Command("compile", "Compile the next round of a design into allocation sheets.");
        command.SetAction(_ => { console.Error.WriteLine("trialc: compile is not built yet"); return ExitCodes.InputErrors; });
        return command;
    }
}
