using System.Globalization;
using DesignCompiler.Planning;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Rendering.Simulation;

namespace DesignCompiler.Rendering.Charts;

/// <summary>
/// Lays out the posterior densities of a round as stacked rows (see <see cref="DensityChartModel"/>).
/// All rows share one vertical scale, so a taller, narrower curve is an arm the data are surer
/// about. Layout only: every density, mean and interval comes from <see cref="PosteriorCurves"/>.
/// </summary>
internal static class DensityChartLayout
{
    private const int Width = 780;
    private const double Left = 190;
    private const double Right = 600;
    private const double Top = 12;
    private const double RowHeight = 50;
    private const double CurveHeight = 34;

    public static DensityChartModel Layout(PosteriorCurves curves, IReadOnlyList<ArmModel> arms, string axisLabel)
    {
        var grid = curves.Grid;
        var (low, high) = (grid[0], grid[^1]);
        // The axis runs from tick to tick around the grid, so 0 and 1 frame a probability and the curves stay inside.
        var (ticks, step) = SvgChartBuilder.NiceTicks(low, high);
        var (axisLow, axisHigh) = (ticks[0], ticks[^1]);
        double X(double v) => Left + (Right - Left) * (v - axisLow) / (axisHigh - axisLow);
        var tallest = curves.Arms.SelectMany(a => a.Density).DefaultIfEmpty(0).Max();
        var bottom = Top + RowHeight * curves.Arms.Count;

        var rows = curves.Arms.Select((curve, i) =>
        {
            var baseline = Top + RowHeight * (i + 1) - 12;
            double Y(double d) => tallest > 0 ? baseline - CurveHeight * d / tallest : baseline;
            var line = string.Join(" ", grid.Select((x, k) => P(X(x)) + "," + P(Y(curve.Density[k]))));
            var area = P(X(low)) + "," + P(baseline) + " " + line + " " + P(X(high)) + "," + P(baseline);
            var barY = baseline + 5;
            var arm = arms[i];
            return new DensityRowModel(
                arm.Code, area, line, P(baseline),
                P(X(Math.Max(low, curve.Lower))), P(X(Math.Min(high, curve.Upper))), P(barY),
                $"M{P(X(curve.Mean))},{P(barY - 4)} V{P(barY + 4)}",
                new ChartLabelModel("8", P(baseline - 16), "start", arm.Code + (arm.IsControl ? " (control)" : "")),
                new ChartLabelModel("8", P(baseline - 2), "start", Shorten(arm.Label, 30)),
                new ChartLabelModel(P(Right + 12), P(baseline - 16), "start", "mean " + NumberText.Significant(curve.Mean)),
                new ChartLabelModel(P(Right + 12), P(baseline - 2), "start",
                    "95 %: " + NumberText.Significant(curve.Lower) + " to " + NumberText.Significant(curve.Upper)));
        }).ToList();

        var tickLines = ticks.Select(t => new ChartLineModel(P(X(t)), P(bottom), P(X(t)), P(bottom + 4), P(X(t)), P(bottom + 16), "middle",
            SvgChartBuilder.TickText(t, step))).ToList();
        var gridLines = ticks.Select(t => new ChartLineModel(P(X(t)), P(Top), P(X(t)), P(bottom), "", "", "", "")).ToList();
        return new DensityChartModel(Width, (int)Math.Ceiling(bottom + 36), axisLabel,
            new ChartLabelModel(P((Left + Right) / 2), P(bottom + 32), "middle", axisLabel),
            $"M{P(Left)},{P(bottom)} H{P(Right)}", tickLines, gridLines, rows);
    }

    private static string Shorten(string text, int length) => text.Length <= length ? text : text[..(length - 1)] + "…";

    private static string P(double value) => value.ToString("0.#", CultureInfo.InvariantCulture);
}
