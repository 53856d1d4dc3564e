using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Simulation.Reports;

/// <summary>
/// Turns exact summaries into figures. It reads only the setup and the summaries, so one run,
/// any thread count and merged shards all give the same report.
/// </summary>
public static class ReportBuilder
{
    public static SimulationReport Build(SimulationResult result)
    {
        var report = Build(result.Setup, result.Scenarios, result.CutShort);
        if (result.Twin is not { } twin) return report;
        var compared = report.Scenarios.Select((s, i) => Comparisons.ComparisonReport.Compare(
            s, Scenario(twin.Setup, twin.Setup.Scenarios[i], twin.Scenarios[i]), twin.Differences[i])).ToList();
        return report with { EqualTwin = compared };
    }

    public static SimulationReport Build(SimulationSetup setup, IReadOnlyList<ScenarioAccumulator> summaries, bool cutShort) =>
        new(setup, setup.Scenarios.Select((s, i) => Scenario(setup, s, summaries[i])).ToList(), cutShort);

    public static ScenarioReport Scenario(SimulationSetup setup, ScenarioInfo scenario, ScenarioAccumulator summary)
    {
        var n = summary.Replications;
        var rounds = setup.Rounds;
        var last = rounds - 1;
        var stopped = summary.StoppedAfterRound.Total;
        var infeasible = summary.InfeasibleAtRound.Total;
        var ranAll = n - stopped - infeasible;

        var byRound = Enumerable.Range(0, rounds).Select(r => new RoundFigure(r + 1,
            summary.CumulativeRegret[r].Estimate(),
            Estimate.FromCount(n, summary.CorrectAfterRound[r]),
            Estimate.FromCount(n, summary.WithinMarginAfterRound[r]))).ToList();

        var stopRounds = Enumerable.Range(1, rounds).Select(r =>
            new StopRoundFigure(r, summary.StoppedAfterRound[r], n == 0 ? double.NaN : (double)summary.StoppedAfterRound[r] / n)).ToList();

        var arms = setup.Arms.Select((arm, a) => new ArmFigure(
            arm.Code,
            scenario.TrueMeans?[a],
            scenario.Values?[a],
            scenario.Values is { } v ? v[a] == v.Max() : null,
            summary.Bias[a].Estimate(),
            summary.PlotsTotal[a].Mean(),
            summary.PlotsTotal[a].Quantile(95),
            Enumerable.Range(0, rounds).Select(r =>
            {
                var h = summary.Plots(a, r);
                return new PlotQuantiles(r + 1, h.Mean(), h.Quantile(5), h.Quantile(50), h.Quantile(95));
            }).ToList())).ToList();

        return new ScenarioReport(
            scenario, n,
            summary.CumulativeRegret[last].Estimate(),
            summary.NonBestPlots.Estimate(),
            summary.PlotsSown.Estimate(),
            summary.RoundsRun.Estimate(),
            byRound[last].CorrectSelection,
            byRound[last].WithinMargin,
            Estimate.FromCount(n, stopped),
            ranAll, infeasible, summary.FirstInfeasible?.Message,
            stopRounds, byRound, arms,
            scenario.FromPrior ? Calibration(summary.Calibration) : null);
    }

    private static IReadOnlyList<CalibrationFigure> Calibration(CalibrationBins bins) =>
        Enumerable.Range(0, CalibrationBins.BinCount).Select(b =>
        {
            var pairs = bins.Pairs(b);
            var frequency = pairs == 0 ? double.NaN : (double)bins.TrulyBest(b) / pairs;
            var meanProbability = pairs == 0 ? double.NaN : bins.ProbabilitySum(b).Value / pairs;
            // Binomial standard error of a frequency, evaluated at the bin's mean P(best) (the
            // value the frequency should have), so an empty-looking bin does not claim zero error.
            var se = pairs == 0 ? double.NaN : Math.Sqrt(meanProbability * (1 - meanProbability) / pairs);
            return new CalibrationFigure(b / (double)CalibrationBins.BinCount, (b + 1) / (double)CalibrationBins.BinCount,
                pairs, meanProbability, frequency, se);
        }).ToList();
}
