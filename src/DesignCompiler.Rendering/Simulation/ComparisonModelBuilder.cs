using System.Globalization;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Comparisons;
using DesignCompiler.Simulation.Reports;

namespace DesignCompiler.Rendering.Simulation;

/// <summary>Formats a comparison report into the model its templates see. Formatting and chart geometry only.</summary>
public static class ComparisonModelBuilder
{
    public static ComparisonModel Build(ComparisonReport report, string toolVersion)
    {
        var (a, b) = (report.A, report.B);
        var scenarios = report.Scenarios.Select((s, i) => Scenario(report, s, "c" + (i + 1).ToString(CultureInfo.InvariantCulture))).ToList();
        return new ComparisonModel(Side(a), Side(b), a.Seed.ToString(CultureInfo.InvariantCulture), toolVersion,
            FigureText.Whole(a.Replications), FigureText.Whole(report.Finished), report.CutShort,
            SimulationModelBuilder.CutShortText(report.CutShort, report.Finished, a.Replications),
            NumberText.Exact(a.Margin), a.MarginRule, report.Notes, scenarios);
    }

    private static DesignSideModel Side(SimulationSetup s) => new(
        s.Trial, s.DesignHash, s.DesignHash[..Math.Min(12, s.DesignHash.Length)], s.Policy, s.OutcomeFamily, s.ValueUnit ?? "",
        s.Rounds, s.PlotsPerRound, s.Arms.Select(x => new ArmInfoModel(x.Code, x.Label, x.IsControl)).ToList());

    private static ComparedScenarioModel Scenario(ComparisonReport report, ComparedScenario s, string id)
    {
        var equal = s.A.Scenario.AllArmsEqual && s.B.Scenario.AllArmsEqual;
        var unit = report.A.ValueUnit ?? "";
        var figures = Figures(s, equal, unit);
        var verdicts = figures.Where(f => f.Clear).Select(f => f.Verdict).ToList();
        return new ComparedScenarioModel(s.Name,
            SimulationModelBuilder.WorldText(report.A, s.A.Scenario), SimulationModelBuilder.WorldText(report.B, s.B.Scenario),
            equal, FigureText.Whole(s.A.Replications), figures, verdicts, Charts(report, s, id),
            SimulationModelBuilder.Scenario(report.A, s.A, id + "a"), SimulationModelBuilder.Scenario(report.B, s.B, id + "b"));
    }

    /// <summary>Each compared figure for A, B and the paired difference, with the plain-words verdict where it is clear.</summary>
    public static List<FigureModel> Figures(ComparedScenario s, bool equal, string unit, string nameA = "A", string nameB = "B") =>
        s.Figures.Select(f =>
        {
            var d = f.Difference;
            return new FigureModel(ComparisonWords.Key(f.Figure), ComparisonWords.Label(f.Figure, equal),
                FigureText.Model(f.A), FigureText.Model(f.B), FigureText.Model(d),
                NumberText.Exact(d.Lower95), NumberText.Exact(d.Upper95),
                FigureText.Signed(d.Mean, d.StandardError),
                double.IsFinite(d.StandardError)
                    ? FigureText.AtPrecision(d.Lower95, d.StandardError) + " to " + FigureText.AtPrecision(d.Upper95, d.StandardError)
                    : "-",
                f.IsClear, ComparisonWords.Verdict(f, equal, unit, nameA, nameB));
        }).ToList();

    /// <summary>Both designs on the same axes: A as a solid line with circles, B dashed with squares.</summary>
    private static IReadOnlyList<ChartModel> Charts(ComparisonReport report, ComparedScenario s, string id)
    {
        var rounds = Math.Max(report.A.Rounds, report.B.Rounds);
        var unit = string.IsNullOrEmpty(report.A.ValueUnit) ? "value units" : report.A.ValueUnit;
        var charts = new List<ChartModel>
        {
            SvgChartBuilder.Build(id + "-regret", "Cumulative regret by round, A and B",
                "Mean regret summed over the rounds so far for each design, with 95 % Monte Carlo bands.",
                "round", "regret (" + unit + ")", rounds,
                [
                    SimulationModelBuilder.Band("A", s.A.ByRound.Select(r => r.CumulativeRegret).ToList(), 0),
                    SimulationModelBuilder.Band("B", s.B.ByRound.Select(r => r.CumulativeRegret).ToList(), 1),
                ]),
            SvgChartBuilder.Build(id + "-selection", "Probability of selecting the best arm if the trial ended after each round, A and B",
                "Share of simulated trials whose leading arm is truly best, for each design.",
                "round", "probability", rounds,
                [
                    new ChartSeries("A", s.A.ByRound.Select(r => r.CorrectSelection.Mean).ToList(), Style: 0),
                    new ChartSeries("B", s.B.ByRound.Select(r => r.CorrectSelection.Mean).ToList(), Style: 1),
                ], fixedMaximum: 1),
        };
        foreach (var arm in report.A.Arms)
        {
            var ia = IndexOf(report.A, arm.Code);
            var ib = IndexOf(report.B, arm.Code);
            var series = new List<ChartSeries> { SimulationModelBuilder.PlotSeries("A", s.A.Arms[ia], 0) };
            if (ib >= 0) series.Add(SimulationModelBuilder.PlotSeries("B", s.B.Arms[ib], 1));
            charts.Add(SvgChartBuilder.Build(id + "-plots-" + ia.ToString(CultureInfo.InvariantCulture), $"Plots of {arm.Code} by round, A and B",
                "Mean plots of the arm in each round for each design; bands run from the 5 % to the 95 % quantile.",
                "round", "plots", rounds, series, fixedMaximum: Math.Max(report.A.PlotsPerRound, report.B.PlotsPerRound), size: ChartSize.Small));
        }
        return charts;
    }

    private static int IndexOf(SimulationSetup setup, string code)
    {
        for (var i = 0; i < setup.Arms.Count; i++) if (setup.Arms[i].Code == code) return i;
        return -1;
    }
}
