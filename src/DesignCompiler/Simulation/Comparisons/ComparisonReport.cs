using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Reports;

namespace DesignCompiler.Simulation.Comparisons;

/// <summary>Two designs' reports on the scenarios they share, with paired differences.</summary>
public sealed record ComparisonReport(
    SimulationSetup A,
    SimulationSetup B,
    IReadOnlyList<ComparedScenario> Scenarios,
    IReadOnlyList<string> Notes,
    bool CutShort)
{
    public long Finished => Scenarios.Count == 0 ? 0 : Scenarios.Min(s => s.A.Replications);

    public static ComparisonReport Build(ComparisonResult result)
    {
        var scenarios = result.A.Scenarios.Select((s, i) => Compare(
            ReportBuilder.Scenario(result.A, s, result.SummariesA[i]),
            ReportBuilder.Scenario(result.B, result.B.Scenarios[i], result.SummariesB[i]),
            result.Differences[i])).ToList();
        return new ComparisonReport(result.A, result.B, scenarios, result.Notes, result.CutShort);
    }

    /// <summary>One scenario's two reports side by side with the paired differences B − A.</summary>
    public static ComparedScenario Compare(ScenarioReport a, ScenarioReport b, PairedAccumulator differences)
    {
        var figures = Enum.GetValues<ComparedFigure>().Select(f =>
            new FigureComparison(f, Pick(a, f), Pick(b, f), differences.Difference(f).Estimate())).ToList();
        return new ComparedScenario(a.Scenario.Name, a, b, figures);
    }

    private static Estimate Pick(ScenarioReport report, ComparedFigure figure) => figure switch
    {
        ComparedFigure.Regret => report.Regret,
        ComparedFigure.NonBestPlots => report.NonBestPlots,
        ComparedFigure.PlotsSown => report.PlotsSown,
        ComparedFigure.RoundsRun => report.RoundsRun,
        ComparedFigure.CorrectSelection => report.CorrectSelection,
        ComparedFigure.WithinMargin => report.WithinMargin,
        _ => report.DeclaredWinner,
    };
}

/// <summary>One scenario of a comparison: each design's report and the paired figure differences.</summary>
public sealed record ComparedScenario(string Name, ScenarioReport A, ScenarioReport B, IReadOnlyList<FigureComparison> Figures);

/// <summary>
/// A figure for A and B and the mean paired difference B − A with its standard error. The
/// difference is clear when its 95 % interval (mean ± 1.96 SE) excludes zero.
/// </summary>
public sealed record FigureComparison(ComparedFigure Figure, Estimate A, Estimate B, Estimate Difference)
{
    public bool IsClear => Difference.StandardError >= 0 && (Difference.Lower95 > 0 || Difference.Upper95 < 0);
}
