namespace DesignCompiler.Rendering;

/// <summary>The templates shipped inside the assembly as embedded resources.</summary>
public static class BuiltInTemplates
{
    public const string CrewSheetHtml = "sheet.html.sbn";
    public const string CrewSheetCsv = "sheet.csv.sbn";
    public const string PlanJson = "plan.json.sbn";
    public const string SummaryMarkdown = "summary.md.sbn";
    public const string RoundReportHtml = "round-report.html.sbn";

    public static string Text(string name)
    {
        var assembly = typeof(BuiltInTemplates).Assembly;
        using var stream = assembly.GetManifestResourceStream("DesignCompiler.Rendering.Templates." + name)
            ?? throw new InvalidOperationException($"built-in template {name} is missing from the assembly");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
