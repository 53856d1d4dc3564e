using System.Text;
using DesignCompiler.Diagnostics;
using DesignCompiler.Text;
using Scriban;

namespace DesignCompiler.Rendering;

/// <summary>
/// A template of the user's own (<c>--template FILE.sbn</c>), read and parsed before anything is
/// planned or written, so a broken template stops the command with nothing written. Its output
/// is named after it: <c>letterhead.html.sbn</c> writes <c>STEM-roundN.letterhead.html</c>.
/// </summary>
public sealed class UserTemplate
{
    /// <summary>Far above any real template; a larger file is the wrong file.</summary>
    public const long MaxBytes = 1024 * 1024;

    private UserTemplate(SourceText source, Template parsed)
    {
        Source = source;
        Parsed = parsed;
    }

    public SourceText Source { get; }
    internal Template Parsed { get; }

    /// <summary>The output's name after the stem and a dot: the template's file name without ".sbn", with ".txt" added when that leaves no extension.</summary>
    public string OutputSuffix
    {
        get
        {
            var name = Path.GetFileName(Source.Path);
            if (name.EndsWith(".sbn", StringComparison.OrdinalIgnoreCase)) name = name[..^4];
            return name.Contains('.') ? name : name + ".txt";
        }
    }

    public static (UserTemplate? Template, IReadOnlyList<Diagnostic> Diagnostics) Load(string path)
    {
        byte[] bytes;
        try
        {
            if (Directory.Exists(path)) return Failed(path, "it is a directory, not a file");
            var info = new FileInfo(path);
            if (!info.Exists) return Failed(path, "no such file");
            if (info.Length > MaxBytes) return Failed(path, FormattableString.Invariant($"it is {info.Length:N0} bytes; a template is far smaller"));
            bytes = File.ReadAllBytes(path);
        }
        catch (UnauthorizedAccessException)
        {
            return Failed(path, "permission denied");
        }
        catch (IOException e)
        {
            return Failed(path, e.Message);
        }

        string text;
        try
        {
            text = new UTF8Encoding(false, throwOnInvalidBytes: true).GetString(bytes);
        }
        catch (DecoderFallbackException)
        {
            return Failed(path, "it is not UTF-8 text; save it as UTF-8");
        }
        var source = new SourceText(path, text);
        var parsed = Template.Parse(source.Content, path);
        if (parsed.HasErrors) return (null, TemplateRenderer.SyntaxErrors(source, parsed));
        return (new UserTemplate(source, parsed), []);
    }

    private static (UserTemplate?, IReadOnlyList<Diagnostic>) Failed(string path, string why) =>
        (null, [new Diagnostic(TemplateDiagnostics.Unreadable, SourceLocation.File(path), [why])]);
}
