namespace DesignCompiler.Rendering.Charts;

/// <summary>
/// Posterior densities as stacked rows, one per arm, on one shared x axis and one vertical scale:
/// each row names its arm at the left and writes its mean and 95 % interval at the right, and a
/// bar under the curve spans the interval with a tick at the mean. Rows are told apart by place
/// and label, so the chart needs no colour. Every coordinate is ready text; the template only places it.
/// </summary>
public sealed record DensityChartModel(
    int Width,
    int Height,
    string AxisLabel,
    ChartLabelModel AxisLabelAt,
    string AxisPath,
    IReadOnlyList<ChartLineModel> Ticks,
    IReadOnlyList<ChartLineModel> Grid,
    IReadOnlyList<DensityRowModel> Rows);

/// <summary>
/// One arm's row: its curve (<see cref="Area"/>, a closed polygon to fill grey, and <see cref="Curve"/>,
/// the line on top), its baseline, the interval bar from (<see cref="IntervalX1"/>, <see cref="IntervalY"/>) to
/// (<see cref="IntervalX2"/>, <see cref="IntervalY"/>), the mean tick, and its texts.
/// </summary>
public sealed record DensityRowModel(
    string Code,
    string Area,
    string Curve,
    string Baseline,
    string IntervalX1,
    string IntervalX2,
    string IntervalY,
    string MeanPath,
    ChartLabelModel CodeText,
    ChartLabelModel LabelText,
    ChartLabelModel MeanText,
    ChartLabelModel IntervalText);
