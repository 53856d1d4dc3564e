using DesignCompiler.Diagnostics;
using DesignCompiler.Simulation.Comparisons;
using DesignCompiler.Simulation.Reports;

namespace DesignCompiler.Rendering.Simulation;

/// <summary>The text of a simulation or comparison report in each format trialc writes.</summary>
public static class SimulationOutputs
{
    public const string SimulationJson = "simulation.json.sbn";
    public const string SimulationHtml = "simulation.html.sbn";
    public const string ComparisonJson = "comparison.json.sbn";
    public const string ComparisonHtml = "comparison.html.sbn";

    public static RenderResult Render(SimulationReport report, string format)
    {
        var model = SimulationModelBuilder.Build(report, RoundOutputs.ToolVersion);
        return format switch
        {
            "json" => TemplateRenderer.RenderBuiltIn(SimulationJson, model),
            "html" => TemplateRenderer.RenderBuiltIn(SimulationHtml, model),
            _ => new RenderResult(SimulationText.Write(model), []),
        };
    }

    public static RenderResult Render(ComparisonReport report, string format)
    {
        var model = ComparisonModelBuilder.Build(report, RoundOutputs.ToolVersion);
        return format switch
        {
            "json" => TemplateRenderer.RenderBuiltIn(ComparisonJson, model),
            "html" => TemplateRenderer.RenderBuiltIn(ComparisonHtml, model),
            _ => new RenderResult(ComparisonText.Write(model), []),
        };
    }

    /// <summary>Template problems are bugs in trialc's own templates; they are reported like any other diagnostic.</summary>
    public static bool Failed(RenderResult result) => result.Text is null || result.Diagnostics.Any(d => d.Severity == Severity.Error);
}
