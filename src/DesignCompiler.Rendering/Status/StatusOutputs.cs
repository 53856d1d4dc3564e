using DesignCompiler.Ledger;

namespace DesignCompiler.Rendering.Status;

/// <summary>A trial's status as text, JSON or HTML, from the built-in <c>status.*.sbn</c> templates.</summary>
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
}
