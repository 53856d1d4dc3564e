using DesignCompiler.Text;

namespace DesignCompiler.Diagnostics;

/// <summary>Where a diagnostic points: a span of a source text, or just a file when there is no text.</summary>
public sealed record SourceLocation(string Path, SourceText? Source, TextSpan Span)
{
    public static SourceLocation In(SourceText source, TextSpan span) => new(source.Path, source, span);

    public static SourceLocation File(string path) => new(path, null, new TextSpan(0, 0));

    public LinePosition Start => Source?.PositionOf(Span.Start) ?? new LinePosition(1, 1);
}
