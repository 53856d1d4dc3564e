using DesignCompiler.Analysis.Trial;

namespace DesignCompiler.Rendering.Analysis;

/// <summary>The text of an analysis in each format trialc writes.</summary>
public static class AnalysisOutputs
{
    public const string AnalysisJson = "analysis.json.sbn";

    public static RenderResult Render(AnalysisReport report, string format)
    {
        var model = AnalysisModelBuilder.Build(report, RoundOutputs.ToolVersion);
        return format == "json" ? TemplateRenderer.RenderBuiltIn(AnalysisJson, model) : new RenderResult(AnalysisText.Write(model), []);
    }
}
