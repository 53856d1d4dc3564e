using DesignCompiler.Simulation.Comparisons;

namespace DesignCompiler.Rendering.Simulation;

/// <summary>Names of the compared figures, and the plain sentence said when a difference is clear.</summary>
public static class ComparisonWords
{
    public static string Key(ComparedFigure figure) => figure switch
    {
        ComparedFigure.Regret => "regret",
        ComparedFigure.NonBestPlots => "plotsOnArmsNotBest",
        ComparedFigure.PlotsSown => "plotsSown",
        ComparedFigure.RoundsRun => "roundsRun",
        ComparedFigure.CorrectSelection => "correctSelection",
        ComparedFigure.WithinMargin => "withinMargin",
        _ => "declaredWinner",
    };

    public static string Label(ComparedFigure figure, bool allArmsEqual) => figure switch
    {
        ComparedFigure.Regret => "expected regret",
        ComparedFigure.NonBestPlots => "plots on arms that are not best",
        ComparedFigure.PlotsSown => "plots sown",
        ComparedFigure.RoundsRun => "rounds run",
        ComparedFigure.CorrectSelection => "P(final selection is a best arm)",
        ComparedFigure.WithinMargin => "P(final selection within margin)",
        _ => allArmsEqual ? "false-positive rate (stop rule declared a winner)" : "P(a stop rule declared a winner)",
    };

    /// <summary>
    /// "B has lower expected regret than A, by 1.2 EUR (95 % interval 0.9 to 1.5)." Only for a
    /// difference whose interval excludes zero; otherwise nothing is claimed.
    /// </summary>
    public static string Verdict(FigureComparison f, bool allArmsEqual, string valueUnit, string nameA = "A", string nameB = "B")
    {
        if (!f.IsClear) return "";
        var sentence = Sentence(f, allArmsEqual, valueUnit);
        // The sentence is written for "B … than A"; the names are swapped in at the two places they stand.
        return nameB + sentence[1..^0].Replace(" than A", " than " + nameA, StringComparison.Ordinal);
    }

    private static string Sentence(FigureComparison f, bool allArmsEqual, string valueUnit)
    {
        var d = f.Difference;
        var lower = d.Mean < 0;
        var size = FigureText.AtPrecision(Math.Abs(d.Mean), d.StandardError);
        var (from, to) = lower ? (-d.Upper95, -d.Lower95) : (d.Lower95, d.Upper95);
        var interval = $"(95 % interval {FigureText.AtPrecision(from, d.StandardError)} to {FigureText.AtPrecision(to, d.StandardError)})";
        var unit = valueUnit == "" ? "" : " " + valueUnit;
        var points = " percentage points";
        var pctSize = FigureText.AtPrecision(Math.Abs(d.Mean) * 100, d.StandardError * 100);
        var pctInterval = $"(95 % interval {FigureText.AtPrecision(from * 100, d.StandardError * 100)} to {FigureText.AtPrecision(to * 100, d.StandardError * 100)})";
        return f.Figure switch
        {
            ComparedFigure.Regret => $"B has {(lower ? "lower" : "higher")} expected regret than A, by {size}{unit} per trial {interval}.",
            ComparedFigure.NonBestPlots => $"B sows {(lower ? "fewer" : "more")} plots on arms that are not best than A, by {size} per trial {interval}.",
            ComparedFigure.PlotsSown => $"B sows {(lower ? "fewer" : "more")} plots in all than A, by {size} per trial {interval}.",
            ComparedFigure.RoundsRun => $"B runs {(lower ? "fewer" : "more")} rounds than A, by {size} on average {interval}.",
            ComparedFigure.CorrectSelection => $"B selects a best arm {(lower ? "less" : "more")} often than A, by {pctSize}{points} {pctInterval}.",
            ComparedFigure.WithinMargin => $"B selects an arm within the margin {(lower ? "less" : "more")} often than A, by {pctSize}{points} {pctInterval}.",
            _ when allArmsEqual => $"B has a {(lower ? "lower" : "higher")} false-positive rate than A, by {pctSize}{points} {pctInterval}.",
            _ => $"B declares a winner {(lower ? "less" : "more")} often than A, by {pctSize}{points} {pctInterval}.",
        };
    }
}
