using DesignCompiler.Diagnostics;

namespace DesignCompiler.Rendering;

/// <summary>The TD6xxx diagnostics: templates, built-in or the user's own (<c>--template FILE.sbn</c>). Ids never change meaning.</summary>
public static class TemplateDiagnostics
{
    private static DiagnosticDescriptor Error(string id, string format) => new(id, Severity.Error, format);

    public static readonly DiagnosticDescriptor Syntax = Error("TD6001", "the template does not parse: {0}");
    public static readonly DiagnosticDescriptor Runtime = Error("TD6002", "the template failed while rendering: {0}");
    public static readonly DiagnosticDescriptor Refused = Error("TD6003", "'{0}' is not available in a trialc template: {1}");
    public static readonly DiagnosticDescriptor Unreadable = Error("TD6004", "cannot read the template: {0}");
    public static readonly DiagnosticDescriptor NameClash = Error("TD6005", "two templates would both write '{0}'; give them different file names");

    public const string SyntaxHint =
        "templates are Scriban: code goes between {{ and }}, and every 'for', 'if' and 'while' ends with 'end'";

    public const string RuntimeHint =
        "a template sees only the model in docs/templates.md, with snake_case names such as 'block.plot_list' and 'arm.probability_best_text'";

    public const string RefusedHint =
        "a template reads the model and nothing else: no files, no clock, no randomness; write fixed text into the template itself";
}
