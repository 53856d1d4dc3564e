using System.Text;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Rendering.Workbook;

namespace DesignCompiler.Rendering;

/// <summary>The files a compiled round produces: the built-in templates' CSV, HTML, JSON and Markdown, and the crew workbook.</summary>
public static class RoundOutputs
{
    public static string ToolVersion =>
        typeof(RoundOutputs).Assembly
            .GetCustomAttributes(typeof(System.Reflection.AssemblyInformationalVersionAttribute), false)
            .OfType<System.Reflection.AssemblyInformationalVersionAttribute>().FirstOrDefault()?.InformationalVersion ?? "0.0.0";

    public static (IReadOnlyList<(string Name, byte[] Content)> Files, IReadOnlyList<Diagnostic> Diagnostics) Render(
        RoundPlan plan, CheckedDesign design, string stem, string? dateIssued = null)
    {
        var model = SheetModelBuilder.Build(plan, design, ToolVersion, dateIssued);
        var files = new List<(string, byte[])>();
        var diagnostics = new List<Diagnostic>();
        var prefix = FormattableString.Invariant($"{stem}-round{plan.Round}");
        foreach (var (template, extension) in new[]
                 {
                     (BuiltInTemplates.CrewSheetCsv, "csv"), (BuiltInTemplates.CrewSheetHtml, "html"),
                     (BuiltInTemplates.PlanJson, "json"), (BuiltInTemplates.SummaryMarkdown, "md"),
                 })
        {
            var result = TemplateRenderer.RenderBuiltIn(template, model);
            diagnostics.AddRange(result.Diagnostics);
            if (result.Text is not null) files.Add((prefix + "." + extension, Utf8NoBom.GetBytes(result.Text)));
        }
        files.Add((prefix + ".xlsx", CrewWorkbook.Build(model, design.Outcome)));
        return (files, diagnostics);
    }

    public static string Json(RoundPlan plan, CheckedDesign design) =>
        TemplateRenderer.RenderBuiltIn(BuiltInTemplates.PlanJson, SheetModelBuilder.Build(plan, design, ToolVersion)).Text ?? "";

    private static readonly UTF8Encoding Utf8NoBom = new(false);
}
