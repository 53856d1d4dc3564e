using DesignCompiler.Diagnostics;
using DesignCompiler.Syntax;

namespace DesignCompiler.Binding;

public sealed partial class DesignBinder
{
    private List<ScenarioSpec> BindScenarios(IReadOnlyList<ScenarioStatementSyntax> statements, IReadOnlyList<ArmSpec> arms, OutcomeSpec? outcome)
    {
        var result = new List<ScenarioSpec>();
        var firstByName = new Dictionary<string, ScenarioStatementSyntax>(StringComparer.Ordinal);
        foreach (var statement in statements)
        {
            var name = statement.Name.Value;
            if (firstByName.TryGetValue(name, out var first))
            {
                Report(DiagnosticCatalog.DuplicateScenario, statement.Name.Span, name, LineOf(first.Span));
                continue;
            }
            firstByName[name] = statement;
            if (name.Trim().Length == 0)
            {
                Report(DiagnosticCatalog.EmptyName, statement.Name.Span, "a scenario's name");
                continue;
            }
            if (statement.FromPrior)
            {
                result.Add(new ScenarioSpec(name, true, [], null, statement.Span));
                continue;
            }
            var scenario = BindScenarioValues(statement, arms, outcome);
            if (scenario is not null) result.Add(scenario);
        }
        return result;
    }

    private ScenarioSpec? BindScenarioValues(ScenarioStatementSyntax statement, IReadOnlyList<ArmSpec> arms, OutcomeSpec? outcome)
    {
        var name = statement.Name.Value;
        var values = new double?[arms.Count];
        double? everyArm = null;
        double? noise = null;
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var ok = true;

        foreach (var entry in statement.Entries)
        {
            var key = entry.Kind switch
            {
                ScenarioEntryKind.EveryArm => "every arm",
                ScenarioEntryKind.Noise => "noise",
                _ => entry.Arm!.Name,
            };
            if (!seen.Add(key))
            {
                Report(DiagnosticCatalog.ScenarioRepeatedArm, entry.Span, name, key);
                ok = false;
                continue;
            }

            if (entry.Kind == ScenarioEntryKind.Noise)
            {
                if (outcome is not null && outcome.Family != OutcomeFamily.Normal)
                {
                    Report(DiagnosticCatalog.ScenarioNoiseNotNormal, entry.Span, outcome.FamilyText);
                    ok = false;
                    continue;
                }
                noise = Scale(entry.Value, "a scenario's noise sd");
                ok &= noise is not null;
                continue;
            }

            var value = ScenarioValue(entry, outcome);
            ok &= value is not null;
            if (entry.Kind == ScenarioEntryKind.EveryArm) everyArm = value;
            else if (ResolveArm(entry.Arm!, arms) is { } index) values[index] = value;
            else ok = false;
        }

        var missing = arms.Where(a => values[a.Index] is null && everyArm is null).Select(a => a.Code).ToList();
        if (ok && missing.Count > 0)
        {
            ReportWithHint(DiagnosticCatalog.ScenarioMissingArm, statement.Name.Span,
                "give each arm a value, or 'every arm V' for the arms not named", name,
                (missing.Count == 1 ? "arm " : "arms ") + string.Join(", ", missing));
            ok = false;
        }
        if (!ok) return null;
        return new ScenarioSpec(name, false, arms.Select(a => values[a.Index] ?? everyArm!.Value).ToList(), noise, statement.Span);
    }

    /// <summary>A true mean that the outcome family can take, or null after reporting it.</summary>
    private double? ScenarioValue(ScenarioEntrySyntax entry, OutcomeSpec? outcome)
    {
        var value = entry.Value.Value;
        var who = entry.Arm?.Name ?? "every arm";
        var (ok, support) = outcome?.Family switch
        {
            OutcomeFamily.Bernoulli or OutcomeFamily.Binomial => (value is >= 0 and <= 1, "a probability between 0 and 1"),
            OutcomeFamily.Count => (value is >= 0 and <= DesignLimits.MaxCount, $"a mean count from 0 to {DesignLimits.Text(DesignLimits.MaxCount)}"),
            _ => (Math.Abs(value) <= DesignLimits.MaxMagnitude, $"a number between -{DesignLimits.Text(DesignLimits.MaxMagnitude)} and {DesignLimits.Text(DesignLimits.MaxMagnitude)}"),
        };
        if (ok) return value;
        Report(DiagnosticCatalog.ScenarioOutsideSupport, entry.Value.Span, entry.Value.Text, who, outcome?.FamilyText ?? "", support);
        return null;
    }
}
