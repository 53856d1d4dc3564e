using System.Diagnostics;
using System.Text;

namespace DesignCompiler.Tests.Ledger;

/// <summary>
/// The built trialc run as a separate process (<c>dotnet trialc.dll</c>, copied beside the test
/// assembly by the project reference), for what cannot happen in-process: being killed, or two
/// commands holding the ledger at once.
/// </summary>
public sealed class TrialcChild : IDisposable
{
    private readonly Process _process;
    private readonly StringBuilder _error = new();
    private readonly StringBuilder _output = new();
    private readonly TaskCompletionSource _paused = new(TaskCreationOptions.RunContinuationsAsynchronously);

    private TrialcChild(Process process) => _process = process;

    public static TrialcChild Start(IReadOnlyDictionary<string, string> environment, params string[] args)
    {
        var info = new ProcessStartInfo(Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } host ? host : "dotnet")
        {
            RedirectStandardError = true,
            RedirectStandardOutput = true,
            UseShellExecute = false,
        };
        info.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "trialc.dll"));
        foreach (var arg in args) info.ArgumentList.Add(arg);
        foreach (var (name, value) in environment) info.Environment[name] = value;

        var process = new Process { StartInfo = info };
        var child = new TrialcChild(process);
        process.ErrorDataReceived += (_, e) =>
        {
            if (e.Data is null) return;
            lock (child._error) child._error.Append(e.Data).Append('\n');
            if (e.Data.Contains("test pause", StringComparison.Ordinal)) child._paused.TrySetResult();
        };
        process.OutputDataReceived += (_, e) =>
        {
            if (e.Data is null) return;
            lock (child._output) child._output.Append(e.Data).Append('\n');
        };
        process.Start();
        process.BeginErrorReadLine();
        process.BeginOutputReadLine();
        return child;
    }

    /// <summary>Waits until trialc says it is holding its write transaction open (the test hook).</summary>
    public void WaitUntilInsideTransaction(TimeSpan timeout)
    {
        var finished = Task.WhenAny(_paused.Task, _process.WaitForExitAsync()).Wait(timeout);
        Assert.True(finished && _paused.Task.IsCompleted, "trialc never reached its transaction: " + Error);
    }

    /// <summary>SIGKILL: the process gets no chance to roll back or close anything.</summary>
    public void Kill()
    {
        _process.Kill(entireProcessTree: true);
        _process.WaitForExit();
    }

    public int WaitForExit(TimeSpan timeout)
    {
        Assert.True(_process.WaitForExit(timeout), "trialc did not finish: " + Error);
        _process.WaitForExit();
        return _process.ExitCode;
    }

    public string Error
    {
        get { lock (_error) return _error.ToString(); }
    }

    public string Output
    {
        get { lock (_output) return _output.ToString(); }
    }

    public void Dispose()
    {
        if (!_process.HasExited) _process.Kill(entireProcessTree: true);
        _process.Dispose();
    }
}
