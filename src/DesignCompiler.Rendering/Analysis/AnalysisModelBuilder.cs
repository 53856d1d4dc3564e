using System.Globalization;
using DesignCompiler.Analysis.Estimates;
using DesignCompiler.Analysis.Rcbd;
using DesignCompiler.Analysis.Trial;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Rendering.Simulation;
using DesignCompiler.Simulation.Accumulators;

namespace DesignCompiler.Rendering.Analysis;

/// <summary>Formats an analysis report into the model its templates see. Formatting only.</summary>
public static class AnalysisModelBuilder
{
    public static AnalysisModel Build(AnalysisReport report, string toolVersion)
    {
        var codes = report.Arms.Select(a => a.Code).ToList();
        return new AnalysisModel(
            report.Trial, report.DesignHash, report.DesignHash[..Math.Min(12, report.DesignHash.Length)],
            report.Seed.ToString(CultureInfo.InvariantCulture), toolVersion,
            report.OutcomeName, report.OutcomeUnit ?? "", report.OutcomeFamily,
            report.RoundsWithData, report.PlotsRecorded, report.PlotsMissing, report.ModelText,
            report.Arms.Select(a => new ArmRowModel(a.Code, a.Label, Estimate(a.Naive), Estimate(a.RoundStratified), Estimate(a.Model))).ToList(),
            report.Rcbd.Anova is not null, report.Rcbd.Reason ?? "",
            report.Rcbd.Anova is { } anova ? Rcbd(anova, report.Rcbd.Replicates, codes) : null,
            report.Simulated.Select(s => new SimulatedScenarioModel(s.Name, NumberText.Whole(s.Replications),
                s.Arms.Select(a => new SimulatedArmModel(a.Code, Figure(a.Naive), Figure(a.RoundStratified), Figure(a.Model))).ToList())).ToList());
    }

    private static EstimateTextModel Estimate(ArmEstimate e)
    {
        var status = e.Status switch
        {
            EstimateStatus.Estimated => "estimated",
            EstimateStatus.MeanOnly => "mean only",
            EstimateStatus.NoData => "no data",
            _ => "unidentified",
        };
        var text = e.Mean is not { } mean ? "-"
            : e.Lower is { } lo && e.Upper is { } hi ? $"{Sig(mean)} ({Sig(lo)} to {Sig(hi)})"
            : Sig(mean);
        if (e.Status == EstimateStatus.NoData && e.Mean is not null) text += " (prior only)";
        return new EstimateTextModel(status, NumberText.Whole(e.Plots), Exact(e.Mean), Exact(e.Lower), Exact(e.Upper), text);
    }

    private static RcbdModel Rcbd(RcbdAnova a, IReadOnlyList<string> replicates, IReadOnlyList<string> codes)
    {
        var lines = new List<AnovaLineModel>
        {
            Line("replication", a.Replication), Line("treatment", a.Treatment), Line("error", a.Error), Line("total", a.Total),
        };
        var estimated = (a.Missing?.Plots ?? []).Select(p => new EstimatedPlotModel(codes[p.Treatment], replicates[p.Block],
            NumberText.Exact(p.Value), FigureText.Fixed(p.Value, 2))).ToList();
        return new RcbdModel(a.Treatments, a.Blocks, replicates, lines,
            NumberText.Exact(a.GrandMean), Grouped(a.GrandMean, 0),
            Exact(a.CvPercent), a.CvPercent is { } cv ? FigureText.Fixed(cv, 1) + " %" : "-",
            Exact(a.RelativeEfficiency), a.RelativeEfficiency is { } re ? FigureText.Fixed(re, 2) : "-",
            a.TreatmentMeans.Select((m, i) => new TreatmentMeanModel(codes[i], NumberText.Exact(m), Grouped(m, 0))).ToList(),
            estimated);
    }

    private static AnovaLineModel Line(string source, AnovaLine l) => new(source, l.Df,
        NumberText.Exact(l.SumOfSquares), Exact(l.MeanSquare), Exact(l.F), Exact(l.P),
        Grouped(l.SumOfSquares, 0), l.MeanSquare is { } ms ? Grouped(ms, 0) : "",
        l.F is { } f ? FigureText.Fixed(f, 2) : "", l.P is { } p ? FigureText.Fixed(p, 3) : "");

    private static SimulatedFigureModel Figure(EstimatorFigure f) => new(
        NumberText.Whole(f.Trials), NumberText.Exact(f.Bias), NumberText.Exact(f.BiasSe), NumberText.Exact(f.Coverage), NumberText.Exact(f.CoverageSe),
        FigureText.WithError(new DesignCompiler.Simulation.Accumulators.Estimate(f.Bias, f.BiasSe, f.Trials)),
        double.IsFinite(f.Coverage) ? FigureText.WithError(new DesignCompiler.Simulation.Accumulators.Estimate(f.Coverage, f.CoverageSe, f.IntervalTrials)) : "-");

    private static string Exact(double? value) => value is { } v && double.IsFinite(v) ? NumberText.Exact(v) : "null";

    private static string Sig(double value) => FigureText.Significant(value);

    /// <summary>"1,944,361": sums of squares of yields in kg/ha read like the handbook's tables.</summary>
    private static string Grouped(double value, int decimals) =>
        value.ToString("N" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
}
