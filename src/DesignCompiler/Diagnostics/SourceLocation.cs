using DesignCompiler.Text;

namespace DesignCompiler.Diagnostics;

/// <summary>
/// Where a diagnostic points: a span of a source text, a cell of a workbook, or just a file when
/// there is neither.
/// </summary>
public sealed record SourceLocation(string Path, SourceText? Source, TextSpan Span, CellReference? Cell = null)
{
    public static SourceLocation In(SourceText source, TextSpan span) => new(source.Path, source, span);

    public static SourceLocation File(string path) => new(path, null, new TextSpan(0, 0));

    public static SourceLocation At(string path, CellReference cell) => new(path, null, new TextSpan(0, 0), cell);

    public LinePosition Start => Source?.PositionOf(Span.Start) ?? new LinePosition(1, 1);

    /// <summary>The order a reader meets places in one file: by offset in a text, by sheet, row and column in a workbook.</summary>
    public long Order => Cell?.Order ?? Span.Start;
}
