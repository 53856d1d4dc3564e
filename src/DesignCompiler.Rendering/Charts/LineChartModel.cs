namespace DesignCompiler.Rendering.Charts;

/// <summary>
/// An SVG line chart (P(best) by round), laid out for black-and-white print: arms differ by
/// dash pattern and marker shape and are named at the end of their lines, never by colour alone.
/// Every coordinate is ready text; the template only places it.
/// </summary>
public sealed record LineChartModel(
    int Width,
    int Height,
    string FrameX,
    string FrameY,
    string FrameWidth,
    string FrameHeight,
    IReadOnlyList<ChartLineModel> Grid,
    IReadOnlyList<ChartLineModel> Ticks,
    IReadOnlyList<ChartLabelModel> Labels,
    IReadOnlyList<ChartSeriesModel> Series);

/// <summary>A line from (X1, Y1) to (X2, Y2) with its label at (LabelX, LabelY), anchored start, middle or end.</summary>
public sealed record ChartLineModel(string X1, string Y1, string X2, string Y2, string LabelX, string LabelY, string Anchor, string Label);

public sealed record ChartLabelModel(string X, string Y, string Anchor, string Text);

public sealed record ChartSeriesModel(
    string Code, string Points, string Dash, IReadOnlyList<ChartMarkerModel> Markers, ChartLabelModel EndLabel,
    ChartMarkerModel LegendMarker, ChartLineModel LegendLine);

/// <summary>One marker: an SVG path and its fill (white with a black outline, or black).</summary>
public sealed record ChartMarkerModel(string Path, string Fill);
