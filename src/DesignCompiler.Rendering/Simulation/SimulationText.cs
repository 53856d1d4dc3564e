using System.Text;

namespace DesignCompiler.Rendering.Simulation;

/// <summary>The simulation report as readable text for a terminal: one block of tables per scenario.</summary>
public static class SimulationText
{
    public static string Write(SimulationModel model)
    {
        var o = new StringBuilder();
        o.Append($"{model.Trial}: simulated with policy {model.Policy}, {model.Replications} replications per scenario, seed {model.Seed}\n");
        o.Append($"design {model.DesignHashShort}; {model.Rounds} rounds of {model.PlotsPerRound} plots; values in {Unit(model.ValueUnit)} per plot; trialc {model.ToolVersion}\n");
        o.Append($"margin {model.MarginRule}\n");
        if (model.CutShort) o.Append("*** ").Append(model.CutShortText).Append(" ***\n");
        foreach (var s in model.Scenarios) Scenario(o, s);
        foreach (var t in model.EqualTwin) Twin(o, t);
        o.Append('\n').Append("Figures are mean ± Monte Carlo standard error. Regret = Σ over sown plots of (best true value − the plot's arm's true value).\n");
        o.Append("The final selection is the arm with the highest P(best) after the last recorded round; a winner is declared when a stop rule fires.\n");
        return o.ToString();
    }

    private static void Scenario(StringBuilder o, ScenarioModel s)
    {
        o.Append('\n').Append($"Scenario \"{s.Name}\": {s.WorldText}; {s.Replications} trials\n");
        if (s.AllArmsEqual) o.Append("  every arm is equal: every arm counts as best, and a declared winner is a false positive\n");
        var headline = new TextTable()
            .Row("expected regret", s.Regret.Text)
            .Row("plots on arms that are not best", s.NonBestPlots.Text)
            .Row("plots sown", s.PlotsSown.Text)
            .Row("rounds run", s.RoundsRun.Text)
            .Row("P(final selection is a best arm)", s.CorrectSelection.Text)
            .Row("P(final selection within margin)", s.WithinMargin.Text)
            .Row(s.AllArmsEqual ? "false-positive rate (stop rule declared a winner)" : "P(a stop rule declared a winner)", s.DeclaredWinner.Text)
            .Row("trials that ran every round", s.RanAllRounds);
        if (s.Infeasible != "0") headline.Row("trials with a round the limits could not fill", s.Infeasible);
        headline.WriteTo(o, "  ");
        if (s.Infeasible != "0") o.Append("    first such round: ").Append(s.InfeasibleMessage).Append('\n');

        var stops = s.StopRounds.Where(r => r.Trials != "0").Select(r => $"after round {r.Round}: {r.Trials} ({r.ShareText})").ToList();
        o.Append("  stopped by a rule: ").Append(stops.Count == 0 ? "never" : string.Join("; ", stops)).Append('\n');

        o.Append("  plots per arm and round, mean (5/50/95 % quantiles):\n");
        var plots = new TextTable();
        plots.Row(["arm", "true mean", .. s.ByRound.Select(r => "round " + r.Round), "total", "order for (95 %)"]);
        foreach (var a in s.ArmFigures)
            plots.Row([a.Code + (a.IsBest ? " *" : ""), a.TrueMeanText, .. a.ByRound.Select(q => $"{q.MeanText} ({q.P5}/{q.P50}/{q.P95})"), a.PlotsTotalMeanText, a.PlotsTotal95]);
        plots.WriteTo(o, "    ");
        if (s.ArmFigures.Any(a => a.IsBest)) o.Append("    * best arm\n");

        o.Append("  by round, if the trial ended there:\n");
        var rounds = new TextTable().Row("round", "cumulative regret", "P(best arm selected)", "P(within margin)");
        foreach (var r in s.ByRound) rounds.Row(r.Round.ToString(System.Globalization.CultureInfo.InvariantCulture), r.CumulativeRegret.Text, r.CorrectSelection.Text, r.WithinMargin.Text);
        rounds.WriteTo(o, "    ");

        o.Append("  bias of the naive final mean (sample mean − true mean):\n");
        var bias = new TextTable().Row("arm", "bias", "trials with data");
        foreach (var a in s.ArmFigures) bias.Row(a.Code, a.Bias.Text, a.BiasTrials);
        bias.WriteTo(o, "    ");

        if (!s.HasCalibration) return;
        o.Append("  calibration of the final P(best) against how often the arm truly was best:\n");
        var calibration = new TextTable().Row("P(best) bin", "pairs", "mean P(best)", "truly best", "SE", "");
        foreach (var c in s.Calibration) calibration.Row(c.RangeText, c.Pairs, c.MeanProbabilityText, c.FrequencyText, c.SeText, c.Agreement);
        calibration.WriteTo(o, "    ");
    }

    private static void Twin(StringBuilder o, TwinScenarioModel t)
    {
        o.Append('\n').Append($"Against equal allocation, scenario \"{t.Name}\" (same plots, limits, rules and random numbers; difference = equal − this design):\n");
        var table = new TextTable().Row("figure", "this design", "equal allocation", "difference", "95 % interval");
        foreach (var f in t.Figures) table.Row(f.Label, f.A.Text, f.B.Text, f.DifferenceText, f.IntervalText);
        table.WriteTo(o, "  ");
        var bias = new TextTable().Row("arm", "bias, this design", "bias, equal allocation");
        foreach (var b in t.Bias) bias.Row(b.Code, b.Design.Text, b.Equal.Text);
        o.Append("  bias of the naive final mean:\n");
        bias.WriteTo(o, "    ");
        foreach (var v in t.Verdicts) o.Append("  ").Append(v).Append('\n');
        if (t.Verdicts.Count == 0) o.Append("  no figure differs clearly (every 95 % interval includes zero)\n");
    }

    private static string Unit(string unit) => unit == "" ? "units of the mean outcome (success probability for yes/no and counts out of N)" : unit;
}
