using System.Text;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Planning;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Rendering.Workbook;

namespace DesignCompiler.Rendering;

/// <summary>The files a compiled round produces, rendered from one <see cref="SheetModel"/>.</summary>
public static class RoundOutputs
{
    public static string ToolVersion =>
        typeof(RoundOutputs).Assembly
            .GetCustomAttributes(typeof(System.Reflection.AssemblyInformationalVersionAttribute), false)
            .OfType<System.Reflection.AssemblyInformationalVersionAttribute>().FirstOrDefault()?.InformationalVersion ?? "0.0.0";

    /// <summary>
    /// Every file of a round: the crew sheet as CSV, HTML and .xlsx, the plan as JSON, the summary
    /// as Markdown, the round report (STEM-roundN-report.html) and one file for each of the user's
    /// templates (STEM-roundN.NAME). Nothing is returned when any template fails.
    /// </summary>
    /// <summary>Every built-in file of a round, without an issue date, with the report's charts drawn from the priors.</summary>
    public static (IReadOnlyList<(string Name, byte[] Content)> Files, IReadOnlyList<Diagnostic> Diagnostics) Render(
        RoundPlan plan, CheckedDesign design, string stem) =>
        Render(plan, design, stem, null, RoundFigures.FromDesign(design));

    public static (IReadOnlyList<(string Name, byte[] Content)> Files, IReadOnlyList<Diagnostic> Diagnostics) Render(
        RoundPlan plan, CheckedDesign design, string stem, string? dateIssued, RoundFigures figures, IReadOnlyList<UserTemplate>? templates = null)
    {
        var model = SheetModelBuilder.Build(plan, design, ToolVersion, dateIssued, figures);
        var files = new List<(string Name, byte[] Content)>();
        var diagnostics = new List<Diagnostic>();
        var prefix = FormattableString.Invariant($"{stem}-round{plan.Round}");
        foreach (var (template, name) in new[]
                 {
                     (BuiltInTemplates.CrewSheetCsv, prefix + ".csv"), (BuiltInTemplates.CrewSheetHtml, prefix + ".html"),
                     (BuiltInTemplates.PlanJson, prefix + ".json"), (BuiltInTemplates.SummaryMarkdown, prefix + ".md"),
                     (BuiltInTemplates.RoundReportHtml, prefix + "-report.html"),
                 })
        {
            var result = TemplateRenderer.RenderBuiltIn(template, model);
            diagnostics.AddRange(result.Diagnostics);
            if (result.Text is not null) files.Add((name, Utf8NoBom.GetBytes(result.Text)));
        }
        files.Add((prefix + ".xlsx", CrewWorkbook.Build(model, design.Outcome)));

        foreach (var template in templates ?? [])
        {
            var name = prefix + "." + template.OutputSuffix;
            if (files.Any(f => string.Equals(f.Name, name, StringComparison.OrdinalIgnoreCase)))
            {
                diagnostics.Add(new Diagnostic(TemplateDiagnostics.NameClash, SourceLocation.File(template.Source.Path), [name]));
                continue;
            }
            var result = TemplateRenderer.Render(template, model);
            diagnostics.AddRange(result.Diagnostics);
            if (result.Text is not null) files.Add((name, Utf8NoBom.GetBytes(result.Text)));
        }
        return diagnostics.Any(d => d.Severity == Severity.Error) ? ([], diagnostics) : (files, diagnostics);
    }

    public static string Json(RoundPlan plan, CheckedDesign design) =>
        TemplateRenderer.RenderBuiltIn(BuiltInTemplates.PlanJson, SheetModelBuilder.Build(plan, design, ToolVersion)).Text ?? "";

    private static readonly UTF8Encoding Utf8NoBom = new(false);
}
