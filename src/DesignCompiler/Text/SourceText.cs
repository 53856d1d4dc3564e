namespace DesignCompiler.Text;

/// <summary>
/// The text of one input file with its name, and the map from offsets to lines.
/// Offsets are zero-based; lines and columns are printed one-based. A leading
/// byte-order mark is removed when the text is made, so offsets count characters
/// the user can see.
/// </summary>
public sealed class SourceText
{
    private readonly int[] _lineStarts;

    public SourceText(string path, string content)
    {
        Path = path;
        Content = content.Length > 0 && content[0] == '\uFEFF' ? content[1..] : content;
        _lineStarts = ComputeLineStarts(Content);
    }

    public string Path { get; }
    public string Content { get; }
    public int LineCount => _lineStarts.Length;

    public LinePosition PositionOf(int offset)
    {
        offset = Math.Clamp(offset, 0, Content.Length);
        var index = Array.BinarySearch(_lineStarts, offset);
        var line = index >= 0 ? index : ~index - 1;
        return new LinePosition(line + 1, offset - _lineStarts[line] + 1);
    }

    /// <summary>The text of a one-based line, without its line break.</summary>
    public string LineText(int line)
    {
        var start = _lineStarts[line - 1];
        var end = line < _lineStarts.Length ? _lineStarts[line] : Content.Length;
        while (end > start && (Content[end - 1] == '\n' || Content[end - 1] == '\r')) end--;
        return Content[start..end];
    }

    public string Slice(TextSpan span) =>
        Content.Substring(Math.Clamp(span.Start, 0, Content.Length),
            Math.Clamp(span.Length, 0, Math.Max(0, Content.Length - span.Start)));

    private static int[] ComputeLineStarts(string text)
    {
        var starts = new List<int> { 0 };
        for (var i = 0; i < text.Length; i++)
        {
            if (text[i] == '\n') starts.Add(i + 1);
            else if (text[i] == '\r' && (i + 1 >= text.Length || text[i + 1] != '\n')) starts.Add(i + 1);
        }
        return starts.ToArray();
    }
}
