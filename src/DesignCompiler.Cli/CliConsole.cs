using DesignCompiler.Diagnostics;

namespace DesignCompiler.Cli;

/// <summary>The two output streams, and diagnostic printing shared by every command.</summary>
public sealed class CliConsole(TextWriter output, TextWriter error)
{
    public TextWriter Out { get; } = output;
    public TextWriter Error { get; } = error;

    /// <summary>Prints diagnostics to standard error; true when any is an error.</summary>
    public bool Report(IReadOnlyList<Diagnostic> diagnostics)
    {
        if (diagnostics.Count > 0) Error.Write(DiagnosticFormatter.FormatAll(diagnostics));
        return diagnostics.Any(d => d.Severity == Severity.Error);
    }
}
