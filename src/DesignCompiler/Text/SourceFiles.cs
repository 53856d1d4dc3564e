using System.Text;
using DesignCompiler.Diagnostics;

namespace DesignCompiler.Text;

/// <summary>Reads an input file as text, turning every way that can fail into one clear diagnostic.</summary>
public static class SourceFiles
{
    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    /// <summary>Reads the file; <paramref name="what"/> names the kind of file in the message when it is over <paramref name="maxBytes"/>.</summary>
    public static (SourceText? Text, Diagnostic? Problem) Read(string path, long maxBytes, string what)
    {
        try
        {
            if (Directory.Exists(path)) return Fail(path, "it is a directory, not a file");
            var info = new FileInfo(path);
            if (!info.Exists) return Fail(path, "no such file");
            if (info.Length > maxBytes)
                return Fail(path, TooLarge(info.Length, maxBytes, what));
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

    /// <summary>The message for a file over its size limit: its size, the limit, and what to do.</summary>
    public static string TooLarge(long length, long maxBytes, string what) => FormattableString.Invariant(
        $"it is {length:N0} bytes, over the limit of {maxBytes:N0} bytes for {what}; check that this is the right file, or split it into smaller ones");

    private static (SourceText?, Diagnostic?) Fail(string path, string why) =>
        (null, new Diagnostic(DiagnosticCatalog.FileUnreadable, SourceLocation.File(path), [why]));
}
