using System.Diagnostics;

namespace DesignCompiler.Tests.Testing;

/// <summary>Runs the built trialc as a separate process, for what only a real process shows (environment, culture, signals).</summary>
public static class TrialcProcess
{
    public static string Dll => Path.Combine(AppContext.BaseDirectory, "trialc.dll");

    public static Trialc.Run Invoke(IReadOnlyDictionary<string, string> environment, params string[] args)
    {
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        start.ArgumentList.Add(Dll);
        foreach (var arg in args) start.ArgumentList.Add(arg);
        foreach (var (key, value) in environment) start.Environment[key] = value;
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(60_000)) process.Kill(entireProcessTree: true);
        return new Trialc.Run(process.ExitCode, output.Result, error.Result);
    }
}
