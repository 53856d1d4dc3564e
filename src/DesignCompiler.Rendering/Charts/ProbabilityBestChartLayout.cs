using System.Globalization;
using DesignCompiler.Ledger;

namespace DesignCompiler.Rendering.Charts;

/// <summary>
/// Lays out the P(best) chart: scales probabilities and rounds to SVG coordinates, gives each
/// arm a dash pattern and a marker shape (so it reads in black and white), and spreads the line
/// labels apart so arms that end level stay legible. Layout only: every figure is from the ledger.
/// </summary>
internal static class ProbabilityBestChartLayout
{
    private const int Width = 780;
    private const int Height = 330;
    private const double Left = 56;
    private const double Right = 600;
    private const double Top = 30;
    private const double Bottom = 290;
    private const double LabelGap = 13;


    /// <summary>The chart for a trial of <paramref name="trialRounds"/> rounds: one line per arm through its P(best) at each point of <paramref name="history"/>.</summary>
    public static LineChartModel Layout(int trialRounds, IReadOnlyList<string> codes, IReadOnlyList<RoundPoint> history)
    {
        var rounds = Math.Max(1, trialRounds);
        double X(int k) => Left + (Right - Left) * k / rounds;
        double Y(double p) => Bottom - (Bottom - Top) * Math.Clamp(p, 0, 1);

        var grid = new[] { 0, 0.25, 0.5, 0.75, 1 }
            .Select(p => new ChartLineModel(Text(Left), Text(Y(p)), Text(Right), Text(Y(p)), Text(Left - 6), Text(Y(p) + 4), "end",
                p.ToString("0.##", CultureInfo.InvariantCulture)))
            .ToList();
        var ticks = Enumerable.Range(0, rounds + 1)
            .Select(k => new ChartLineModel(Text(X(k)), Text(Bottom), Text(X(k)), Text(Bottom + 4), Text(X(k)), Text(Bottom + 17), "middle",
                k == 0 ? "prior" : k.ToString(CultureInfo.InvariantCulture)))
            .ToList();
        var labels = new List<ChartLabelModel>
        {
            new(Text(Left), Text(Height - 4), "start", "rounds recorded"),
            new("12", Text(Top - 6), "start", "P(best)"),
        };

        var last = history[^1];
        var labelY = SpreadLabels(codes.Select((_, i) => Y(last.ProbabilityBest[i])).ToList());
        var series = codes.Select((code, i) =>
        {
            var points = history.Select(h => (X: X(h.RoundsRecorded), Y: Y(h.ProbabilityBest[i]))).ToList();
            var legendY = Top + 10 + i * 16;
            return new ChartSeriesModel(
                code,
                string.Join(" ", points.Select(p => Text(p.X) + "," + Text(p.Y))),
                Dash(i),
                points.Select(p => Marker(i, p.X, p.Y)).ToList(),
                new ChartLabelModel(Text(X(last.RoundsRecorded) + 9), Text(labelY[i] + 4), "start", code),
                Marker(i, Right + 60, legendY),
                new ChartLineModel(Text(Right + 44), Text(legendY), Text(Right + 76), Text(legendY), Text(Right + 82), Text(legendY + 4), "start", code));
        }).ToList();

        return new LineChartModel(Width, Height, Text(Left), Text(Top), Text(Right - Left), Text(Bottom - Top), grid, ticks, labels, series);
    }

    /// <summary>A dash pattern per arm: solid, dashed, dotted, dash-dot, long dashes, sparse dots, then again.</summary>
    private static string Dash(int arm) => (arm % 6) switch
    {
        0 => "",
        1 => "7 4",
        2 => "2 3",
        3 => "9 3 2 3",
        4 => "14 5",
        _ => "1 6",
    };

    /// <summary>
    /// Moves label positions apart to at least <see cref="LabelGap"/> pixels, keeping their order and staying in the plot:
    /// a stack that would run past the bottom axis (many arms level near 0, as before any result) is moved up as a whole,
    /// so no label sits on the round axis's tick labels.
    /// </summary>
    private static double[] SpreadLabels(List<double> wanted)
    {
        var order = wanted.Select((y, i) => (y, i)).OrderBy(p => p.y).ThenBy(p => p.i).ToList();
        var placed = new double[wanted.Count];
        var previous = double.NegativeInfinity;
        foreach (var (y, i) in order)
        {
            placed[i] = Math.Max(y, previous + LabelGap);
            previous = placed[i];
        }
        var overflow = previous - (Bottom - 4);
        if (overflow > 0)
            foreach (var (_, i) in order) placed[i] -= overflow;
        return placed;
    }

    /// <summary>Arm <paramref name="arm"/>'s marker at (x, y): circle, square, triangle, diamond, down-triangle, cross; from the seventh arm on, filled.</summary>
    private static ChartMarkerModel Marker(int arm, double x, double y)
    {
        const double r = 4;
        string P(double value) => Text(value);
        var path = (arm % 6) switch
        {
            0 => $"M{P(x - r)},{P(y)} a{P(r)},{P(r)} 0 1,0 {P(2 * r)},0 a{P(r)},{P(r)} 0 1,0 {P(-2 * r)},0 Z",
            1 => $"M{P(x - r)},{P(y - r)} h{P(2 * r)} v{P(2 * r)} h{P(-2 * r)} Z",
            2 => $"M{P(x)},{P(y - r - 1)} L{P(x + r + 1)},{P(y + r)} L{P(x - r - 1)},{P(y + r)} Z",
            3 => $"M{P(x)},{P(y - r - 1)} L{P(x + r + 1)},{P(y)} L{P(x)},{P(y + r + 1)} L{P(x - r - 1)},{P(y)} Z",
            4 => $"M{P(x)},{P(y + r + 1)} L{P(x + r + 1)},{P(y - r)} L{P(x - r - 1)},{P(y - r)} Z",
            _ => $"M{P(x - r)},{P(y - r)} L{P(x + r)},{P(y + r)} M{P(x - r)},{P(y + r)} L{P(x + r)},{P(y - r)}",
        };
        return new ChartMarkerModel(path, arm / 6 % 2 == 1 ? "black" : "white");
    }

    private static string Text(double value) => value.ToString("0.#", CultureInfo.InvariantCulture);
}
