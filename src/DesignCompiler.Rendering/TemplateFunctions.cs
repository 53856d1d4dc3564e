using System.Text;
using Scriban.Runtime;

namespace DesignCompiler.Rendering;

/// <summary>
/// Escaping functions for the built-in and user templates. Escaping belongs to the output
/// format, so it is done here once, right, rather than by hand in each template.
/// </summary>
internal static class TemplateFunctions
{
    public static IReadOnlyList<string> Names { get; } = ["csv", "json", "html", "md", "crlf"];

    public static void AddTo(ScriptObject globals)
    {
        globals.Import("csv", new Func<object?, string>(Csv));
        globals.Import("json", new Func<object?, string>(Json));
        globals.Import("html", new Func<object?, string>(Html));
        globals.Import("md", new Func<object?, string>(Markdown));
        globals.SetValue("crlf", "\r\n", true);
    }

    /// <summary>A CSV field per RFC 4180: quoted when it holds a comma, quote or line break; quotes doubled.</summary>
    public static string Csv(object? value)
    {
        var text = Convert.ToString(value, System.Globalization.CultureInfo.InvariantCulture) ?? "";
        return text.IndexOfAny([',', '"', '\r', '\n']) >= 0 ? "\"" + text.Replace("\"", "\"\"") + "\"" : text;
    }

    /// <summary>A JSON string literal (RFC 8259), quotes included.</summary>
    public static string Json(object? value)
    {
        var text = Convert.ToString(value, System.Globalization.CultureInfo.InvariantCulture) ?? "";
        var builder = new StringBuilder("\"");
        foreach (var c in text)
        {
            switch (c)
            {
                case '"': builder.Append("\\\""); break;
                case '\\': builder.Append("\\\\"); break;
                case '\n': builder.Append("\\n"); break;
                case '\r': builder.Append("\\r"); break;
                case '\t': builder.Append("\\t"); break;
                default:
                    if (c < 0x20) builder.Append("\\u").Append(((int)c).ToString("x4", System.Globalization.CultureInfo.InvariantCulture));
                    else builder.Append(c);
                    break;
            }
        }
        return builder.Append('"').ToString();
    }

    public static string Html(object? value) =>
        System.Net.WebUtility.HtmlEncode(Convert.ToString(value, System.Globalization.CultureInfo.InvariantCulture) ?? "");

    /// <summary>Text safe inside a Markdown table cell.</summary>
    public static string Markdown(object? value) =>
        (Convert.ToString(value, System.Globalization.CultureInfo.InvariantCulture) ?? "").Replace("|", "\\|").Replace("\n", " ");
}
