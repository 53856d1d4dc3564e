using System.Collections.Immutable;
using System.Globalization;
using System.Text;

namespace DesignCompiler.Rendering.Simulation;

/// <summary>One line to draw: a value per round, and optionally a band from <see cref="Lower"/> to <see cref="Upper"/>.</summary>
public sealed record ChartSeries(string Label, IReadOnlyList<double> Values, IReadOnlyList<double>? Lower = null, IReadOnlyList<double>? Upper = null, int Style = -1);

/// <summary>The size of a chart: full width, or small enough that several sit side by side (one per arm).</summary>
public sealed record ChartSize(int Width, double PlotHeight, double Right)
{
    public static ChartSize Full { get; } = new(660, 246, 150);
    public static ChartSize Small { get; } = new(330, 150, 40);
}

/// <summary>
/// Lays out a by-round line chart in pixels. Geometry only: the figures come from the report.
/// Each series gets its own dash pattern and marker shape, and its label at the line's end
/// (moved apart when ends crowd), so the chart needs no colour.
/// </summary>
public static class SvgChartBuilder
{
    private const double Left = 64, Top = 16;
    private const double LabelGap = 11;

    private static readonly ImmutableArray<string> Dashes = ["", "7 4", "2 3", "10 3 2 3", "4 4", "12 3 3 3 3 3", "1 4", "6 2 1 2 1 2"];
    private static readonly ImmutableArray<string> Markers = ["circle", "square", "triangle", "diamond", "cross", "circle-filled", "square-open", "triangle-filled"];

    public static ChartModel Build(string id, string title, string description, string xLabel, string yLabel,
        int rounds, IReadOnlyList<ChartSeries> series, double? fixedMaximum = null, ChartSize? size = null)
    {
        size ??= ChartSize.Full;
        var plotWidth = size.Width - Left - size.Right;
        var plotHeight = size.PlotHeight;
        var all = series.SelectMany(s => s.Values.Concat(s.Upper ?? []).Concat(s.Lower ?? [])).Where(double.IsFinite).ToList();
        var minimum = Math.Min(0, all.Count == 0 ? 0 : all.Min());
        // A flat line at 0 (no regret at all) still gets a readable 0-to-1 axis.
        var maximum = fixedMaximum ?? (all.Count == 0 || all.Max() <= minimum ? minimum + 1 : all.Max());
        var (ticks, step) = NiceTicks(minimum, maximum);
        var (low, high) = (ticks[0], ticks[^1]);

        double X(int round) => rounds <= 1 ? Left + plotWidth / 2 : Left + plotWidth * (round - 1) / (rounds - 1);
        double Y(double v) => Top + plotHeight * (1 - (v - low) / (high - low));

        var xTicks = Enumerable.Range(1, rounds).Select(r => new TickModel(P(X(r)), P(Top + plotHeight + 16),
            r.ToString(CultureInfo.InvariantCulture), $"M{P(X(r))},{P(Top)} V{P(Top + plotHeight)}")).ToList();
        var yTicks = ticks.Select(t => new TickModel(P(Left - 6), P(Y(t) + 4), TickText(t, step),
            $"M{P(Left)},{P(Y(t))} H{P(Left + plotWidth)}")).ToList();

        var models = new List<SeriesModel>();
        var legend = new List<LegendModel>();
        var ends = new List<(int Index, double Y)>();
        for (var i = 0; i < series.Count; i++)
        {
            var s = series[i];
            var style = s.Style >= 0 ? s.Style : i;
            var points = new List<(double X, double Y)>();
            for (var r = 0; r < rounds && r < s.Values.Count; r++)
                if (double.IsFinite(s.Values[r])) points.Add((X(r + 1), Y(s.Values[r])));
            var band = BandPoints(s, rounds, X, Y);
            var marker = Markers[style % Markers.Length];
            models.Add(new SeriesModel(s.Label, Dashes[style % Dashes.Length], "1.6",
                string.Join(" ", points.Select(p => P(p.X) + "," + P(p.Y))), band.Length > 0, band,
                string.Concat(points.Select(p => MarkerPath(marker, p.X, p.Y))), IsFilled(marker), P(Left + plotWidth + 8), "0"));
            ends.Add((i, points.Count > 0 ? points[^1].Y : Top + plotHeight));

            var (lx, ly) = LegendPosition(i, plotHeight, size);
            legend.Add(new LegendModel(s.Label, Dashes[style % Dashes.Length], "1.6", $"M{P(lx)},{P(ly)} H{P(lx + 34)}",
                MarkerPath(marker, lx + 17, ly), IsFilled(marker), P(lx + 42), P(ly + 4)));
        }

        // End labels in order of height, pushed apart so no two overlap.
        var placed = ends.OrderBy(e => e.Y).ToList();
        var y = double.NegativeInfinity;
        var labelY = new double[series.Count];
        foreach (var (index, endY) in placed)
        {
            y = Math.Max(endY + 4, y + LabelGap);
            labelY[index] = y;
        }
        for (var i = 0; i < models.Count; i++) models[i] = models[i] with { EndLabelY = P(labelY[i]) };

        var axis = $"M{P(Left)},{P(Top)} V{P(Top + plotHeight)} H{P(Left + plotWidth)}";
        var height = (int)Math.Ceiling(LegendPosition(Math.Max(series.Count - 1, 0), plotHeight, size).Y + 12);
        return new ChartModel(id, title, description, size.Width, height, xLabel, yLabel, axis,
            P(Left + plotWidth / 2), P(Top + plotHeight + 34), P(16), P(Top + plotHeight / 2), xTicks, yTicks, models, legend, size != ChartSize.Full);
    }

    /// <summary>Legend rows under the x-axis label, two entries per row (one on a small chart).</summary>
    private static (double X, double Y) LegendPosition(int index, double plotHeight, ChartSize size)
    {
        var perRow = size.Width >= 600 ? 2 : 1;
        return (Left + index % perRow * 270, Top + plotHeight + 52 + index / perRow * 15);
    }

    private static string BandPoints(ChartSeries s, int rounds, Func<int, double> x, Func<double, double> y)
    {
        if (s.Lower is null || s.Upper is null) return "";
        var upper = new List<string>();
        var lower = new List<string>();
        for (var r = 0; r < rounds && r < s.Upper.Count && r < s.Lower.Count; r++)
        {
            if (!double.IsFinite(s.Upper[r]) || !double.IsFinite(s.Lower[r])) continue;
            upper.Add(P(x(r + 1)) + "," + P(y(s.Upper[r])));
            lower.Add(P(x(r + 1)) + "," + P(y(s.Lower[r])));
        }
        if (upper.Count == 0) return "";
        lower.Reverse();
        return string.Join(" ", upper.Concat(lower));
    }

    /// <summary>Ticks at 1, 2 or 5 times a power of ten, about five of them, covering the range.</summary>
    internal static (double[] Ticks, double Step) NiceTicks(double low, double high)
    {
        var raw = (high - low) / 5;
        var power = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        var step = new[] { 1.0, 2.0, 5.0, 10.0 }.Select(m => m * power).First(s => s >= raw);
        var first = Math.Floor(low / step + 1e-9) * step;
        var last = Math.Ceiling(high / step - 1e-9) * step;
        var count = (int)Math.Round((last - first) / step) + 1;
        return (Enumerable.Range(0, count).Select(k => first + k * step).ToArray(), step);
    }

    internal static string TickText(double value, double step)
    {
        var decimals = Math.Max(0, -(int)Math.Floor(Math.Log10(step) + 1e-9));
        return FigureText.Fixed(value, decimals);
    }

    private static bool IsFilled(string marker) => marker is "square" or "diamond" or "circle-filled" or "triangle-filled";

    private static string MarkerPath(string marker, double x, double y)
    {
        var b = new StringBuilder();
        switch (marker)
        {
            case "circle" or "circle-filled":
                b.Append($"M{P(x - 3)},{P(y)} a3,3 0 1,0 6,0 a3,3 0 1,0 -6,0 ");
                break;
            case "square" or "square-open":
                b.Append($"M{P(x - 3)},{P(y - 3)} h6 v6 h-6 Z ");
                break;
            case "triangle" or "triangle-filled":
                b.Append($"M{P(x)},{P(y - 4)} L{P(x + 3.5)},{P(y + 2.5)} L{P(x - 3.5)},{P(y + 2.5)} Z ");
                break;
            case "diamond":
                b.Append($"M{P(x)},{P(y - 4)} L{P(x + 4)},{P(y)} L{P(x)},{P(y + 4)} L{P(x - 4)},{P(y)} Z ");
                break;
            default:
                b.Append($"M{P(x - 3)},{P(y - 3)} L{P(x + 3)},{P(y + 3)} M{P(x - 3)},{P(y + 3)} L{P(x + 3)},{P(y - 3)} ");
                break;
        }
        return b.ToString();
    }

    /// <summary>A pixel coordinate to one decimal, invariant.</summary>
    private static string P(double value) => value.ToString("0.#", CultureInfo.InvariantCulture);
}
