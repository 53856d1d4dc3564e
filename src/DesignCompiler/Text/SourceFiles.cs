using System.Text;
using DesignCompiler.Diagnostics;

namespace DesignCompiler.Text;

/// <summary>Reads an input file as text, turning every way that can fail into one clear diagnostic.</summary>
public static class SourceFiles
{
    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    public static (SourceText? Text, Diagnostic? Problem) Read(string path, long maxBytes)
    {
        try
        {
            if (Directory.Exists(path)) return Fail(path, "it is a directory, not a file");
            var info = new FileInfo(path);
            if (!info.Exists) return Fail(path, "no such file");
            if (info.Length > maxBytes)
                return Fail(path, FormattableString.Invariant($"it is {info.Length:N0} bytes; the limit is {maxBytes:N0}"));
            return Decode(path, File.ReadAllBytes(path));
        }
        catch (UnauthorizedAccessException)
        {
            return Fail(path, "permission denied");
        }
        catch (IOException e)
        {
            return Fail(path, e.Message);
        }
    }

    /// <summary>The text of a file's bytes, as <see cref="Read"/> takes them; the fuzz harness feeds bytes here directly.</summary>
    public static (SourceText? Text, Diagnostic? Problem) Decode(string path, byte[] bytes)
    {
        if (Array.IndexOf(bytes, (byte)0) >= 0) return Fail(path, "it is a binary file, not text");
        try
        {
            return (new SourceText(path, StrictUtf8.GetString(bytes)), null);
        }
        catch (DecoderFallbackException)
        {
            return Fail(path, "it is not UTF-8 text; save it as UTF-8");
        }
    }

    private static (SourceText?, Diagnostic?) Fail(string path, string why) =>
        (null, new Diagnostic(DiagnosticCatalog.FileUnreadable, SourceLocation.File(path), [why]));
}
