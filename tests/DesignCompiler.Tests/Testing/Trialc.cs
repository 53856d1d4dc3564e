using DesignCompiler.Cli;

namespace DesignCompiler.Tests.Testing;

/// <summary>Runs trialc in-process with captured output, as a user would from the shell.</summary>
public static class Trialc
{
    public sealed record Run(int ExitCode, string Out, string Error);

    public static Run Invoke(params string[] args)
    {
        var output = new StringWriter { NewLine = "\n" };
        var error = new StringWriter { NewLine = "\n" };
        var code = TrialcApp.Run(args, output, error);
        return new Run(code, output.ToString(), error.ToString());
    }
}
