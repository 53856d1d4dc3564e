namespace DesignCompiler.Rendering.Output;

/// <summary>
/// Writes a set of output files so that none is ever seen half-written: each goes to a
/// temporary name in the target folder first, and only when all are written are they
/// renamed into place. On failure the temporary files are removed and the old outputs stay.
/// </summary>
public static class AtomicOutput
{
    public static string? WriteAll(string directory, IReadOnlyList<(string Name, byte[] Content)> files) =>
        WriteAll(directory, files, OpenTemporary);

    /// <summary>
    /// As <see cref="WriteAll(string, IReadOnlyList{ValueTuple{string, byte[]}})"/>, with the temporary files opened by
    /// <paramref name="open"/>: tests pass a stream that fails part-way, as a full disk or a pulled
    /// drive does, and check that nothing is left under a final name or a temporary one.
    /// </summary>
    public static string? WriteAll(string directory, IReadOnlyList<(string Name, byte[] Content)> files, Func<string, Stream> open)
    {
        var temporaries = new List<(string Temporary, string Final)>();
        try
        {
            Directory.CreateDirectory(directory);
            foreach (var (name, content) in files)
            {
                var final = Path.Combine(directory, name);
                var temporary = Path.Combine(directory, "." + name + ".partial-" + Environment.ProcessId);
                temporaries.Add((temporary, final));
                using (var stream = open(temporary))
                {
                    stream.Write(content);
                    if (stream is FileStream file) file.Flush(flushToDisk: true);
                    else stream.Flush();
                }
            }
            foreach (var (temporary, final) in temporaries) File.Move(temporary, final, overwrite: true);
            return null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            foreach (var (temporary, _) in temporaries)
            {
                try { File.Delete(temporary); } catch (IOException) { } catch (UnauthorizedAccessException) { }
            }
            return e is UnauthorizedAccessException ? $"permission denied writing to {directory}" : e.Message;
        }
    }

    private static Stream OpenTemporary(string path) => new FileStream(path, FileMode.Create, FileAccess.Write, FileShare.None);
}
