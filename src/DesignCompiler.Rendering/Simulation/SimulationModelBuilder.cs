using System.Globalization;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Reports;

namespace DesignCompiler.Rendering.Simulation;

/// <summary>Formats a simulation report into the model its templates see. Formatting and chart geometry only.</summary>
public static class SimulationModelBuilder
{
    public static SimulationModel Build(SimulationReport report, string toolVersion)
    {
        var setup = report.Setup;
        var scenarios = report.Scenarios.Select((s, i) => Scenario(setup, s, "s" + (i + 1).ToString(CultureInfo.InvariantCulture))).ToList();
        return new SimulationModel(
            setup.Trial, setup.DesignHash, setup.DesignHash[..Math.Min(12, setup.DesignHash.Length)],
            setup.Seed.ToString(CultureInfo.InvariantCulture), toolVersion, setup.Policy,
            setup.OutcomeName, setup.OutcomeUnit ?? "", setup.OutcomeFamily, setup.ValueUnit ?? "",
            setup.Rounds, setup.PlotsPerRound, FigureText.Whole(setup.Replications), FigureText.Whole(report.Finished),
            report.CutShort, CutShortText(report.CutShort, report.Finished, setup.Replications),
            NumberText.Exact(setup.Margin), setup.MarginRule,
            setup.Arms.Select(a => new ArmInfoModel(a.Code, a.Label, a.IsControl)).ToList(), scenarios,
            report.EqualTwin is not null, (report.EqualTwin ?? []).Select((t, i) => Twin(setup, t, "t" + (i + 1).ToString(CultureInfo.InvariantCulture))).ToList());
    }

    private static TwinScenarioModel Twin(SimulationSetup setup, DesignCompiler.Simulation.Comparisons.ComparedScenario s, string id)
    {
        var equal = s.A.Scenario.AllArmsEqual;
        var unit = setup.ValueUnit ?? "";
        var figures = ComparisonModelBuilder.Figures(s, equal, unit, "this design", "Equal allocation");
        var bias = setup.Arms.Select((arm, a) => new TwinBiasModel(arm.Code, FigureText.Model(s.A.Arms[a].Bias), FigureText.Model(s.B.Arms[a].Bias))).ToList();
        var rounds = setup.Rounds;
        var valueUnit = string.IsNullOrEmpty(setup.ValueUnit) ? "value units" : setup.ValueUnit;
        ChartModel[] charts =
        [
            SvgChartBuilder.Build(id + "-regret", "Cumulative regret by round, this design and equal allocation",
                "Mean regret summed over the rounds so far, with 95 % Monte Carlo bands; same random numbers for both.",
                "round", "regret (" + valueUnit + ")", rounds,
                [
                    Band("this design", s.A.ByRound.Select(r => r.CumulativeRegret).ToList(), 0),
                    Band("equal", s.B.ByRound.Select(r => r.CumulativeRegret).ToList(), 1),
                ]),
            SvgChartBuilder.Build(id + "-selection", "Probability of selecting the best arm, this design and equal allocation",
                "Share of simulated trials whose leading arm is truly best if the trial ended after each round.",
                "round", "probability", rounds,
                [
                    new ChartSeries("this design", s.A.ByRound.Select(r => r.CorrectSelection.Mean).ToList(), Style: 0),
                    new ChartSeries("equal", s.B.ByRound.Select(r => r.CorrectSelection.Mean).ToList(), Style: 1),
                ], fixedMaximum: 1),
        ];
        return new TwinScenarioModel(s.Name, equal, figures, figures.Where(f => f.Clear).Select(f => f.Verdict).ToList(), bias, charts);
    }

    public static string CutShortText(bool cutShort, long finished, long requested) => cutShort
        ? FormattableString.Invariant($"cut short: only {finished} of {requested} replications per scenario finished; figures cover those")
        : "";

    public static ScenarioModel Scenario(SimulationSetup setup, ScenarioReport s, string id)
    {
        var n = s.Replications;
        var arms = setup.Arms.Select((arm, a) => Arm(arm, s.Arms[a], s.Scenario.FromPrior)).ToList();
        var calibration = (s.Calibration ?? []).Select(Calibration).ToList();
        return new ScenarioModel(
            s.Scenario.Name, s.Scenario.FromPrior, s.Scenario.AllArmsEqual, WorldText(setup, s.Scenario),
            FigureText.Whole(n),
            FigureText.Model(s.Regret), FigureText.Model(s.NonBestPlots), FigureText.Model(s.PlotsSown), FigureText.Model(s.RoundsRun),
            FigureText.Model(s.CorrectSelection), FigureText.Model(s.WithinMargin), FigureText.Model(s.DeclaredWinner),
            DeclaredLabel(s.Scenario),
            FigureText.Whole(s.RanAllRounds), FigureText.Whole(s.Infeasible), s.InfeasibleMessage ?? "",
            s.StopRounds.Where(r => r.Round < setup.Rounds || r.Trials > 0).Select(r => new StopRoundModel(r.Round, FigureText.Whole(r.Trials),
                NumberText.Exact(r.Share), FigureText.Share(r.Trials, n))).ToList(),
            s.ByRound.Select(r => new RoundModel(r.Round, FigureText.Model(r.CumulativeRegret),
                FigureText.Model(r.CorrectSelection), FigureText.Model(r.WithinMargin))).ToList(),
            arms, s.Calibration is not null, calibration, Charts(setup, s, id));
    }

    public static string DeclaredLabel(ScenarioInfo scenario) => scenario.AllArmsEqual
        ? "false-positive rate: a stop rule declared a winner although every arm is equal"
        : "probability that a stop rule declared a winner";

    public static string WorldText(SimulationSetup setup, ScenarioInfo scenario)
    {
        if (scenario.FromPrior) return "true values drawn from the arms' priors, anew for every simulated trial";
        var means = scenario.TrueMeans!;
        var text = means.All(m => m == means[0])
            ? "every arm " + FigureText.Significant(means[0])
            : string.Join(", ", setup.Arms.Select((a, i) => a.Code + " " + FigureText.Significant(means[i])));
        if (scenario.NoiseSd is { Count: > 0 } noise)
            text += noise.All(x => x == noise[0])
                ? "; plot-to-plot sd " + FigureText.Significant(noise[0])
                : "; plot-to-plot sd " + string.Join(", ", setup.Arms.Select((a, i) => a.Code + " " + FigureText.Significant(noise[i])));
        return text;
    }

    private static ArmFigureModel Arm(ArmInfo arm, ArmFigure f, bool fromPrior) => new(
        arm.Code, arm.Label,
        f.TrueMean is { } m ? NumberText.Exact(m) : "null",
        f.TrueMean is { } t ? FigureText.Significant(t) : fromPrior ? "drawn" : "-",
        f.TrueValue is { } v ? NumberText.Exact(v) : "null",
        f.IsBest == true,
        FigureText.Model(f.Bias), FigureText.Whole(f.Bias.Count),
        NumberText.Exact(f.PlotsTotalMean), FigureText.Fixed(f.PlotsTotalMean, 1), FigureText.Optional(f.PlotsTotal95),
        f.ByRound.Select(q => new PlotQuantilesModel(q.Round, NumberText.Exact(q.Mean), FigureText.Fixed(q.Mean, 1),
            FigureText.Optional(q.P5), FigureText.Optional(q.P50), FigureText.Optional(q.P95))).ToList());

    private static CalibrationModel Calibration(CalibrationFigure c)
    {
        var agreement = c.Pairs == 0 ? "no pairs"
            : Math.Abs(c.Frequency - c.MeanProbability) <= 2 * c.StandardError ? "within 2 SE"
            : "off by more than 2 SE";
        return new CalibrationModel(
            NumberText.Exact(c.From), NumberText.Exact(c.To), FigureText.Whole(c.Pairs),
            NumberText.Exact(c.MeanProbability), NumberText.Exact(c.Frequency), NumberText.Exact(c.StandardError),
            FigureText.Fixed(c.From, 1) + " to " + FigureText.Fixed(c.To, 1),
            c.Pairs == 0 ? "-" : FigureText.Fixed(c.MeanProbability, 3), c.Pairs == 0 ? "-" : FigureText.Fixed(c.Frequency, 3),
            c.Pairs == 0 ? "-" : FigureText.Fixed(c.StandardError, 3), agreement);
    }

    private static IReadOnlyList<ChartModel> Charts(SimulationSetup setup, ScenarioReport s, string id)
    {
        var rounds = setup.Rounds;
        var unit = string.IsNullOrEmpty(setup.ValueUnit) ? "value units" : setup.ValueUnit;
        var regret = SvgChartBuilder.Build(id + "-regret", "Cumulative regret by round",
            "Mean regret summed over the rounds so far, with its 95 % Monte Carlo interval as a grey band.",
            "round", "regret (" + unit + ")", rounds, [Band("mean regret", s.ByRound.Select(r => r.CumulativeRegret).ToList())]);

        var selection = SvgChartBuilder.Build(id + "-selection", "Probability of selecting the best arm if the trial ended after each round",
            "Share of simulated trials whose leading arm is truly best (solid) or within the margin of the best (dashed).",
            "round", "probability", rounds,
            [
                new ChartSeries("best arm", s.ByRound.Select(r => r.CorrectSelection.Mean).ToList()),
                new ChartSeries("within margin", s.ByRound.Select(r => r.WithinMargin.Mean).ToList()),
            ], fixedMaximum: 1);
        // One small chart per arm: bands of several arms drawn on one chart hide each other.
        var plots = setup.Arms.Select((arm, a) => SvgChartBuilder.Build(id + "-plots-" + a.ToString(CultureInfo.InvariantCulture),
            $"Plots of {arm.Code} by round",
            "Mean plots of the arm in each round; the grey band runs from the 5 % to the 95 % quantile over the simulated trials.",
            "round", "plots", rounds,
            [PlotSeries(arm.Code, s.Arms[a], 0)], fixedMaximum: setup.PlotsPerRound, size: ChartSize.Small));
        return [regret, selection, .. plots];
    }

    /// <summary>An arm's mean plots per round with its 5–95 % quantile band.</summary>
    public static ChartSeries PlotSeries(string label, ArmFigure arm, int style) => new(label,
        arm.ByRound.Select(q => q.Mean).ToList(),
        arm.ByRound.Select(q => (double?)q.P5 ?? double.NaN).ToList(),
        arm.ByRound.Select(q => (double?)q.P95 ?? double.NaN).ToList(), style);

    /// <summary>A line with its 95 % interval band.</summary>
    public static ChartSeries Band(string label, IReadOnlyList<Estimate> estimates, int style = -1) =>
        new(label, estimates.Select(e => e.Mean).ToList(),
            estimates.Select(e => double.IsFinite(e.StandardError) ? e.Lower95 : e.Mean).ToList(),
            estimates.Select(e => double.IsFinite(e.StandardError) ? e.Upper95 : e.Mean).ToList(), style);
}
