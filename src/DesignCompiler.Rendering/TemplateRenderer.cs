using System.Text.RegularExpressions;
using DesignCompiler.Diagnostics;
using DesignCompiler.Text;
using Scriban;
using Scriban.Runtime;
using Scriban.Syntax;

namespace DesignCompiler.Rendering;

/// <summary>The text a template produced, or the template's errors with their positions.</summary>
public sealed record RenderResult(string? Text, IReadOnlyList<Diagnostic> Diagnostics);

/// <summary>
/// Renders Scriban templates, built-in or the user's own, against a view model in the
/// <see cref="TemplateSandbox"/>: the template sees only the model's properties and a few
/// formatting functions. Output is culture-invariant. Every error names the template's file,
/// line and column, what went wrong and how to fix it.
/// </summary>
public static partial class TemplateRenderer
{
    public static RenderResult RenderBuiltIn(string name, object model) =>
        Render(new SourceText("template:" + name, BuiltInTemplates.Text(name)), model);

    public static RenderResult Render(SourceText template, object model)
    {
        var parsed = Template.Parse(template.Content, template.Path);
        return parsed.HasErrors ? new RenderResult(null, SyntaxErrors(template, parsed)) : Render(template, parsed, model);
    }

    public static RenderResult Render(UserTemplate template, object model) => Render(template.Source, template.Parsed, model);

    private static RenderResult Render(SourceText source, Template parsed, object model)
    {
        var context = TemplateSandbox.Context(model);
        try
        {
            return new RenderResult(parsed.Render(context), []);
        }
        catch (TemplateRefusal refusal)
        {
            return new RenderResult(null, [At(source, refusal.Span, TemplateDiagnostics.Refused, TemplateDiagnostics.RefusedHint, refusal.Function, refusal.Why)]);
        }
        catch (ScriptRuntimeException e)
        {
            var hint = NameHint(e.OriginalMessage, model) ?? TemplateDiagnostics.RuntimeHint;
            return new RenderResult(null, [At(source, e.Span, TemplateDiagnostics.Runtime, hint, Sentence(e.OriginalMessage))]);
        }
    }

    internal static IReadOnlyList<Diagnostic> SyntaxErrors(SourceText source, Template parsed) =>
        parsed.Messages.Where(m => m.Type == Scriban.Parsing.ParserMessageType.Error)
            .Select(m => At(source, m.Span, TemplateDiagnostics.Syntax, TemplateDiagnostics.SyntaxHint, Sentence(m.Message)))
            .ToList();

    /// <summary>"did you mean 'plot_list'?" when the message names a variable or member that is not in the model.</summary>
    private static string? NameHint(string message, object model)
    {
        var match = MissingName().Match(message);
        if (!match.Success) return null;
        var word = match.Groups["name"].Value.TrimEnd('.');
        var last = word[(word.LastIndexOf('.') + 1)..];
        var names = ModelNames.Of(model.GetType()).Concat(TemplateFunctions.Names).ToList();
        return (Family(last, names) ?? Suggestions.DidYouMean(last, names)) is { } hint
            ? hint + " A" + TemplateDiagnostics.RuntimeHint[1..]
            : null;
    }

    /// <summary>
    /// The model flattens a group into snake_case names ('next' is 'next_kind', 'next_round' and 'next_text'), so a
    /// name that is the start of some of them is better answered with those than with the nearest spelling ('text').
    /// </summary>
    private static string? Family(string word, IReadOnlyList<string> names)
    {
        var members = names.Where(n => n.StartsWith(word + "_", StringComparison.Ordinal)).Distinct().Order(StringComparer.Ordinal).ToList();
        return members.Count switch
        {
            0 => null,
            1 => $"did you mean '{members[0]}'?",
            _ => "did you mean one of " + string.Join(", ", members.Take(6).Select(m => $"'{m}'")) + (members.Count > 6 ? ", …" : "") + "?",
        };
    }

    /// <summary>Scriban names a missing variable in backquotes, a missing member after "with name".</summary>
    [GeneratedRegex(@"`(?<name>[^`]+)` was not found|member with name (?<name>[A-Za-z_][A-Za-z0-9_.]*)", RegexOptions.CultureInvariant)]
    private static partial Regex MissingName();

    /// <summary>Scriban's messages end with a full stop or not; ours read as one clause.</summary>
    private static string Sentence(string message) => message.Trim().TrimEnd('.');

    private static Diagnostic At(SourceText source, Scriban.Parsing.SourceSpan span, DiagnosticDescriptor descriptor, string hint, params object[] arguments)
    {
        // Scriban counts lines and columns from zero; SourceText maps one-based positions back to offsets.
        var offset = OffsetOf(source, span.Start.Line + 1, span.Start.Column + 1);
        var length = Math.Max(1, span.End.Offset - span.Start.Offset + 1);
        return new Diagnostic(descriptor, SourceLocation.In(source, new TextSpan(offset, Math.Min(length, Math.Max(1, source.Content.Length - offset)))), arguments, hint);
    }

    private static int OffsetOf(SourceText text, int line, int column)
    {
        var offset = 0;
        for (var l = 1; l < line && l <= text.LineCount; l++) offset += text.LineText(l).Length + LineBreakLength(text, offset + text.LineText(l).Length);
        return Math.Min(text.Content.Length, offset + column - 1);
    }

    private static int LineBreakLength(SourceText text, int at) =>
        at < text.Content.Length && text.Content[at] == '\r' && at + 1 < text.Content.Length && text.Content[at + 1] == '\n' ? 2
        : at < text.Content.Length ? 1 : 0;
}
