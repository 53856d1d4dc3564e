using System.Text;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning;
using DesignCompiler.Text;

namespace DesignCompiler.Tests.Language;

/// <summary>
/// Where the repository's files are. The environment variable TRIALC_REPO is checked first
/// (for a test project built outside the repository); otherwise the folder holding
/// DesignCompiler.sln is found by walking up from the test assembly's folder.
/// </summary>
internal static class LanguagePaths
{
    private static readonly Lazy<string> LazyRoot = new(FindRoot);

    public static string Root => LazyRoot.Value;

    public static string Cases => Path.Combine(Root, "tests", "Cases");

    public static string Examples => Path.Combine(Root, "examples");

    public static string Grammar => Path.Combine(Root, "grammar", "trial.ebnf");

    private static string FindRoot()
    {
        var fromEnvironment = Environment.GetEnvironmentVariable("TRIALC_REPO");
        if (!string.IsNullOrWhiteSpace(fromEnvironment) && File.Exists(Path.Combine(fromEnvironment, "DesignCompiler.sln")))
            return Path.GetFullPath(fromEnvironment);

        for (var directory = new DirectoryInfo(AppContext.BaseDirectory); directory is not null; directory = directory.Parent)
        {
            if (File.Exists(Path.Combine(directory.FullName, "DesignCompiler.sln")))
                return directory.FullName;
        }

        throw new InvalidOperationException(
            "cannot find the repository: no folder above " + AppContext.BaseDirectory +
            " holds DesignCompiler.sln; set TRIALC_REPO to the repository's folder");
    }
}

/// <summary>
/// Runs the checker the way the command line does: parse and bind, then the feasibility
/// check when binding produced a design. Diagnostics come back in the order they are printed.
/// </summary>
internal static class Checker
{
    /// <summary>UTF-8 that keeps a byte-order mark as a character, so that <see cref="SourceText"/> must skip it.</summary>
    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    public static IReadOnlyList<Diagnostic> Diagnose(SourceText source)
    {
        var bound = DesignBinder.Check(source);
        if (bound.Design is null) return bound.Diagnostics;
        return bound.Diagnostics.Concat(DesignFeasibility.Check(bound.Design)).ToList();
    }

    public static IReadOnlyList<Diagnostic> Diagnose(string text, string path = "design.trial") =>
        Diagnose(new SourceText(path, text));

    /// <summary>What the checker prints for the text.</summary>
    public static string Render(string text, string path = "design.trial") =>
        DiagnosticFormatter.FormatAll(Diagnose(text, path));

    /// <summary>Each diagnostic as "ID line:column", e.g. "TD2011 10:11".</summary>
    public static string[] IdsAndPositions(string text) =>
        Diagnose(text).Select(d => d.Id + " " + d.Location.Start).ToArray();

    /// <summary>A case file as the checker sees it: its bytes as UTF-8, a byte-order mark still in place.</summary>
    public static SourceText ReadCase(string fullPath) =>
        new(Path.GetFileName(fullPath), StrictUtf8.GetString(File.ReadAllBytes(fullPath)));

    /// <summary>The bound design of a text that must bind without errors.</summary>
    public static CheckedDesign Bind(string text)
    {
        var bound = DesignBinder.Check(new SourceText("design.trial", text));
        Assert.True(bound.Design is not null, "the design should bind, but:\n" + DiagnosticFormatter.FormatAll(bound.Diagnostics));
        return bound.Design!;
    }
}
