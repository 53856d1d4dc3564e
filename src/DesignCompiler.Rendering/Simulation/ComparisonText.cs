using System.Text;

namespace DesignCompiler.Rendering.Simulation;

/// <summary>The comparison report as readable text: per scenario, A, B and B − A with its 95 % interval, then the clear differences in words.</summary>
public static class ComparisonText
{
    public static string Write(ComparisonModel model)
    {
        var o = new StringBuilder();
        o.Append($"Comparison with common random numbers, {model.Replications} paired replications per scenario, seed {model.Seed}, trialc {model.ToolVersion}\n");
        Side(o, "A", model.A);
        Side(o, "B", model.B);
        o.Append($"margin {model.MarginRule}\n");
        if (model.CutShort) o.Append("*** ").Append(model.CutShortText).Append(" ***\n");
        foreach (var note in model.Notes) o.Append("note: ").Append(note).Append('\n');
        foreach (var s in model.Scenarios)
        {
            o.Append('\n').Append($"Scenario \"{s.Name}\": {s.WorldTextA}; {s.Replications} paired trials\n");
            if (s.WorldTextB != s.WorldTextA) o.Append($"  in design B: {s.WorldTextB}\n");
            var table = new TextTable().Row("figure", "A", "B", "B − A", "95 % interval of B − A");
            foreach (var f in s.Figures) table.Row(f.Label, f.A.Text, f.B.Text, f.DifferenceText, f.IntervalText);
            table.WriteTo(o, "  ");
            if (s.Verdicts.Count == 0) o.Append("  no difference is clear at this number of replications\n");
            foreach (var v in s.Verdicts) o.Append("  - ").Append(v).Append('\n');
        }
        o.Append('\n').Append("Figures are mean ± Monte Carlo standard error; intervals are mean ± 1.96 SE of the paired differences.\n");
        return o.ToString();
    }

    private static void Side(StringBuilder o, string name, DesignSideModel side) =>
        o.Append($"  {name}: {side.Trial} (design {side.DesignHashShort}), policy {side.Policy}, {side.Rounds} rounds of {side.PlotsPerRound} plots\n");
}
