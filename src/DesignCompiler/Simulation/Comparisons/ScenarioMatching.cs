using DesignCompiler.Binding;

namespace DesignCompiler.Simulation.Comparisons;

/// <summary>A scenario of design A and the scenario of design B it is compared with.</summary>
public sealed record ScenarioPair(ScenarioSpec A, ScenarioSpec B);

/// <summary>
/// Which scenarios two designs are compared on: scenarios with fixed values that have the same
/// name in both, and the <c>from prior</c> scenarios when both designs have one and their
/// priors are identical (otherwise the worlds would differ, and so would any difference).
/// Everything left out is said in <see cref="Notes"/>.
/// </summary>
public sealed record ScenarioMatching(IReadOnlyList<ScenarioPair> Pairs, IReadOnlyList<string> Notes)
{
    public static ScenarioMatching Of(CheckedDesign a, CheckedDesign b)
    {
        var pairs = new List<ScenarioPair>();
        var notes = new List<string>();
        var priorA = a.Scenarios.FirstOrDefault(s => s.FromPrior);
        var priorB = b.Scenarios.FirstOrDefault(s => s.FromPrior);

        foreach (var scenario in a.Scenarios.Where(s => !s.FromPrior))
        {
            var other = b.Scenarios.FirstOrDefault(s => s.Name == scenario.Name);
            if (other is null) notes.Add($"scenario '{scenario.Name}' is only in design A; not compared");
            else if (other.FromPrior) notes.Add($"scenario '{scenario.Name}' has fixed values in design A but is 'from prior' in design B; not compared");
            else
            {
                pairs.Add(new ScenarioPair(scenario, other));
                var difference = ValueDifference(a, scenario, b, other);
                if (difference is not null) notes.Add($"scenario '{scenario.Name}': {difference}");
            }
        }
        foreach (var scenario in b.Scenarios.Where(s => !s.FromPrior && a.Scenarios.All(x => x.Name != s.Name)))
            notes.Add($"scenario '{scenario.Name}' is only in design B; not compared");

        if (priorA is not null && priorB is not null)
        {
            var mismatch = PriorMismatch(a, b);
            if (mismatch is null) pairs.Add(new ScenarioPair(priorA, priorB));
            else notes.Add($"'from prior' is not compared: the designs' priors differ ({mismatch})");
        }
        else if (priorA is not null || priorB is not null)
            notes.Add($"'from prior' is not compared: only design {(priorA is not null ? "A" : "B")} has such a scenario");

        return new ScenarioMatching(pairs, notes);
    }

    /// <summary>Why the priors differ, or null when both designs draw the same worlds from them.</summary>
    public static string? PriorMismatch(CheckedDesign a, CheckedDesign b)
    {
        if (a.Outcome.FamilyText != b.Outcome.FamilyText) return $"outcome {a.Outcome.FamilyText} against {b.Outcome.FamilyText}";
        if (a.Outcome.NoiseSd != b.Outcome.NoiseSd) return "different known noise";
        if (a.Arms.Count != b.Arms.Count) return $"{a.Arms.Count} arms against {b.Arms.Count}";
        for (var i = 0; i < a.Arms.Count; i++)
        {
            var (x, y) = (a.Arms[i], b.Arms[i]);
            if (x.Code != y.Code) return $"arm {i + 1} is {x.Code} in A and {y.Code} in B";
            if (PriorText(x.Prior) != PriorText(y.Prior)) return $"arm {x.Code}: {PriorText(x.Prior)} against {PriorText(y.Prior)}";
        }
        return null;
    }

    private static string PriorText(PriorSpec prior) => prior switch
    {
        NormalPriorSpec n => n.Describe() + FormattableString.Invariant($" noise {n.NoiseGuess?.ToString("R") ?? "-"} worth {n.Worth?.ToString("R") ?? "-"}"),
        _ => prior.Describe(),
    };

    private static string? ValueDifference(CheckedDesign a, ScenarioSpec sa, CheckedDesign b, ScenarioSpec sb)
    {
        foreach (var arm in a.Arms)
        {
            if (b.FindArm(arm.Code) is not { } other) continue;
            var (x, y) = (sa.TrueMeans[arm.Index], sb.TrueMeans[other.Index]);
            if (x != y) return FormattableString.Invariant($"arm {arm.Code} has true mean {x} in design A and {y} in design B");
        }
        return sa.NoiseSd != sb.NoiseSd ? "the designs give it different noise" : null;
    }
}
