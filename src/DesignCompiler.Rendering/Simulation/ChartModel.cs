namespace DesignCompiler.Rendering.Simulation;

/// <summary>
/// A line chart ready to draw as SVG: coordinates are already in pixels, as text. Series are
/// told apart by dash pattern, marker shape and a label at the line's end, never by colour
/// alone, so a black-and-white print still reads.
/// </summary>
public sealed record ChartModel(
    string Id,
    string Title,
    string Description,
    int Width,
    int Height,
    string BottomLabel,
    string LeftLabel,
    string AxisPath,
    string BottomLabelAtX,
    string BottomLabelAtY,
    string LeftLabelAtX,
    string LeftLabelAtY,
    IReadOnlyList<TickModel> BottomTicks,
    IReadOnlyList<TickModel> LeftTicks,
    IReadOnlyList<SeriesModel> Series,
    IReadOnlyList<LegendModel> Legend,
    bool IsSmall);

/// <summary>A tick: where its label goes, the label, and a faint grid line.</summary>
public sealed record TickModel(string X, string Y, string Label, string GridPath);

/// <summary>
/// One line: its points, an optional band (a closed polygon, drawn hatched grey), its dash
/// pattern, the markers at its points and the label written at its end.
/// </summary>
public sealed record SeriesModel(
    string Label,
    string Dash,
    string StrokeWidth,
    string Points,
    bool HasBand,
    string BandPoints,
    string MarkerPath,
    bool MarkerFilled,
    string EndLabelX,
    string EndLabelY);

/// <summary>A legend row: a short sample of the line with its marker, and the label.</summary>
public sealed record LegendModel(string Label, string Dash, string StrokeWidth, string LinePath, string MarkerPath, bool MarkerFilled, string TextX, string TextY);
