using DesignCompiler.Binding;

namespace DesignCompiler.Analysis.Trial;

/// <summary>Puts the end-of-trial analysis together from the recorded plots (and, from the caller, the simulated estimator figures).</summary>
public static class TrialAnalysis
{
    public static AnalysisReport Build(CheckedDesign design, IReadOnlyList<AnalysisPlot> plots, IReadOnlyList<EstimatorScenario> simulated)
    {
        var (arms, modelText) = TrialEstimates.Of(design, plots);
        var recorded = plots.Where(p => p.Value is not null).ToList();
        return new AnalysisReport(
            design.Name, design.Hash, design.Seed, design.Outcome.Name, design.Outcome.Unit, design.Outcome.FamilyText,
            recorded.Select(p => p.Round).Distinct().Count(), recorded.Count, plots.Count - recorded.Count,
            modelText, arms, RcbdFromTrial.Of(design, plots), simulated);
    }
}
