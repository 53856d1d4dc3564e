using DesignCompiler.Ledger;

namespace DesignCompiler.Rendering.Status;

/// <summary>A trial's status as text, JSON or HTML, from the built-in <c>status.*.sbn</c> templates, or through a user's template.</summary>
public static class StatusOutputs
{
    public const string TextTemplate = "status.txt.sbn";
    public const string JsonTemplate = "status.json.sbn";
    public const string HtmlTemplate = "status.html.sbn";

    public static IReadOnlyList<string> Formats { get; } = ["text", "json", "html"];

    public static RenderResult Render(TrialStatus status, string format) =>
        TemplateRenderer.RenderBuiltIn(format switch
        {
            "json" => JsonTemplate,
            "html" => HtmlTemplate,
            _ => TextTemplate,
        }, StatusModelBuilder.Build(status, RoundOutputs.ToolVersion));

    /// <summary>The status through the user's own template, from the same model the built-in ones see.</summary>
    public static RenderResult Render(TrialStatus status, UserTemplate template) =>
        TemplateRenderer.Render(template, StatusModelBuilder.Build(status, RoundOutputs.ToolVersion));
}
