using System.Text;
using DesignCompiler.Rendering.Simulation;

namespace DesignCompiler.Rendering.Analysis;

/// <summary>The end-of-trial analysis as readable text for a terminal.</summary>
public static class AnalysisText
{
    public static string Write(AnalysisModel m)
    {
        var o = new StringBuilder();
        o.Append($"{m.Trial}: analysis of {m.PlotsRecorded} recorded plots in {m.RoundsWithData} round(s)");
        if (m.PlotsMissing > 0) o.Append($", {m.PlotsMissing} lost");
        o.Append('\n');
        o.Append($"design {m.DesignHashShort}, seed {m.Seed}, trialc {m.ToolVersion}; outcome {m.OutcomeName}{(m.OutcomeUnit == "" ? "" : " (" + m.OutcomeUnit + ")")}, {m.OutcomeFamily}\n");
        o.Append($"model: {m.ModelText}\n\n");

        o.Append("Per-arm estimates, with 95 % intervals:\n");
        var arms = new TextTable().Row("arm", "plots", "naive mean", "round-stratified mean", "model posterior");
        foreach (var a in m.Arms) arms.Row(a.Code, a.Naive.Plots, a.Naive.Text, a.RoundStratified.Text, a.Model.Text);
        arms.WriteTo(o, "  ");
        o.Append("  naive: plain mean of the arm's plots (t interval); round-stratified: the arm's per-round means weighted by the\n");
        o.Append("  design's plots per round, not by how many plots the policy gave it; model: posterior mean and credible interval.\n");

        o.Append('\n');
        if (m.Rcbd is { } r)
        {
            o.Append($"Randomized complete block analysis of variance ({r.Treatments} treatments, {r.Replicates} replicates):\n");
            var table = new TextTable().Row("source", "df", "SS", "MS", "F", "P");
            foreach (var l in r.Lines) table.Row(l.Source, l.Df.ToString(System.Globalization.CultureInfo.InvariantCulture), l.SumOfSquaresText, l.MeanSquareText, l.FText, l.PText);
            table.WriteTo(o, "  ");
            o.Append($"  grand mean {r.GrandMeanText}; CV {r.CvText}; relative efficiency of blocking {r.RelativeEfficiencyText}\n");
            foreach (var p in r.EstimatedPlots) o.Append($"  missing plot of {p.Code} in {p.Replicate} estimated as {p.ValueText} (Yates's missing-plot formula)\n");
        }
        else o.Append("No classical analysis of variance: ").Append(m.RcbdReason).Append(".\n");

        foreach (var s in m.Simulated)
        {
            o.Append('\n').Append($"Simulated under scenario \"{s.Name}\" ({s.Replications} trials through the planner): bias (estimate − truth) and 95 % interval coverage\n");
            var t = new TextTable().Row("arm", "naive bias", "naive coverage", "stratified bias", "stratified coverage", "model bias", "model coverage");
            foreach (var a in s.Arms)
                t.Row(a.Code, a.Naive.BiasText, a.Naive.CoverageText, a.RoundStratified.BiasText, a.RoundStratified.CoverageText, a.Model.BiasText, a.Model.CoverageText);
            t.WriteTo(o, "  ");
        }
        return o.ToString();
    }
}
