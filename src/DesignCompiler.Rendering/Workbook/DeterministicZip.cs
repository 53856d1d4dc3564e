using System.IO.Compression;

namespace DesignCompiler.Rendering.Workbook;

/// <summary>
/// Rewrites a zip package so that the same content always gives the same bytes. The Open XML
/// SDK stamps every part with the time it was saved; here every entry gets the earliest time an
/// MS-DOS date in a zip header can hold (1980-01-01 00:00), and entries are written in a fixed
/// order: <c>[Content_Types].xml</c> first, where Office puts it and some readers look for it
/// (common practice), then <c>_rels/.rels</c>, then the rest by name.
/// </summary>
internal static class DeterministicZip
{
    private static readonly DateTimeOffset ZipEpoch = new(1980, 1, 1, 0, 0, 0, TimeSpan.Zero);

    public static byte[] Normalise(byte[] package)
    {
        var entries = new List<(string Name, byte[] Content)>();
        using (var input = new ZipArchive(new MemoryStream(package, writable: false), ZipArchiveMode.Read))
        {
            foreach (var entry in input.Entries)
            {
                using var stream = entry.Open();
                using var copy = new MemoryStream();
                stream.CopyTo(copy);
                entries.Add((entry.FullName, copy.ToArray()));
            }
        }

        using var output = new MemoryStream();
        using (var zip = new ZipArchive(output, ZipArchiveMode.Create, leaveOpen: true))
        {
            foreach (var (name, content) in entries.OrderBy(e => Rank(e.Name)).ThenBy(e => e.Name, StringComparer.Ordinal))
            {
                var entry = zip.CreateEntry(name, CompressionLevel.Optimal);
                entry.LastWriteTime = ZipEpoch;
                using var stream = entry.Open();
                stream.Write(content);
            }
        }
        return output.ToArray();
    }

    private static int Rank(string name) => name switch
    {
        "[Content_Types].xml" => 0,
        "_rels/.rels" => 1,
        _ => 2,
    };
}
