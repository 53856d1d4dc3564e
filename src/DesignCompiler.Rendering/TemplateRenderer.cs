using System.Globalization;
using System.Reflection;
using DesignCompiler.Diagnostics;
using DesignCompiler.Text;
using Scriban;
using Scriban.Runtime;

namespace DesignCompiler.Rendering;

/// <summary>The text a template produced, or the template's errors with their positions.</summary>
public sealed record RenderResult(string? Text, IReadOnlyList<Diagnostic> Diagnostics);

/// <summary>
/// Renders Scriban templates against a view model, safely: the template sees only the
/// model's properties and a few formatting functions, cannot include files (no template
/// loader), and runs under loop and recursion limits. Output is culture-invariant.
/// </summary>
public static class TemplateRenderer
{
    public static readonly DiagnosticDescriptor TemplateError = new("TD6001", Severity.Error, "template error: {0}");

    public static RenderResult RenderBuiltIn(string name, object model) =>
        Render(new SourceText("template:" + name, BuiltInTemplates.Text(name)), model);

    public static RenderResult Render(SourceText template, object model)
    {
        var parsed = Template.Parse(template.Content, template.Path);
        if (parsed.HasErrors) return Failed(template, parsed.Messages.Select(m => (m.Span, m.Message)));

        var globals = new ScriptObject();
        globals.Import(model, renamer: StandardMemberRenamer.Default);
        TemplateFunctions.AddTo(globals);

        var context = new TemplateContext
        {
            StrictVariables = true,
            LoopLimit = 2_000_000,
            RecursiveLimit = 50,
            LimitToString = 64 * 1024 * 1024,
            TemplateLoader = null,
            EnableRelaxedMemberAccess = false,
            MemberFilter = member => member is PropertyInfo,
            NewLine = "\n",
        };
        context.PushCulture(CultureInfo.InvariantCulture);
        context.PushGlobal(globals);
        try
        {
            return new RenderResult(parsed.Render(context), []);
        }
        catch (Scriban.Syntax.ScriptRuntimeException e)
        {
            return Failed(template, [(e.Span, e.OriginalMessage)]);
        }
    }

    private static RenderResult Failed(SourceText template, IEnumerable<(Scriban.Parsing.SourceSpan Span, string Message)> messages)
    {
        var diagnostics = messages.Select(m =>
        {
            var start = m.Span.Start;
            var offset = OffsetOf(template, start.Line + 1, start.Column + 1);
            return new Diagnostic(TemplateError, SourceLocation.In(template, new TextSpan(offset, Math.Max(1, m.Span.End.Offset - m.Span.Start.Offset + 1))), [m.Message]);
        }).ToList();
        return new RenderResult(null, diagnostics);
    }

    private static int OffsetOf(SourceText text, int line, int column)
    {
        var offset = 0;
        for (var l = 1; l < line && l <= text.LineCount; l++) offset += text.LineText(l).Length + 1;
        return Math.Min(text.Content.Length, offset + column - 1);
    }
}
