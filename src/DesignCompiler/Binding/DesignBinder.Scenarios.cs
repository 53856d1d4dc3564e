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
            var effects = BindFieldEffects(statement, arms, outcome);
            if (statement.FromPrior)
            {
                if (effects is not null) result.Add(new ScenarioSpec(name, true, [], null, statement.Span) { Effects = effects });
                continue;
            }
            var scenario = BindScenarioValues(statement, arms, outcome);
            if (scenario is not null && effects is not null) result.Add(scenario with { Effects = effects });
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
            if (IsFieldEffect(entry.Kind)) continue;
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

    private static bool IsFieldEffect(ScenarioEntryKind kind) => kind is ScenarioEntryKind.Season or ScenarioEntryKind.Interaction
        or ScenarioEntryKind.BlockEffect or ScenarioEntryKind.Missing or ScenarioEntryKind.Dispersion;

    /// <summary>The scenario's season, block, missing-plot and dispersion entries, or null after reporting a problem.</summary>
    private FieldEffects? BindFieldEffects(ScenarioStatementSyntax statement, IReadOnlyList<ArmSpec> arms, OutcomeSpec? outcome)
    {
        double season = 0, interaction = 0, block = 0, missing = 0;
        double? dispersion = null;
        var byArm = new double?[arms.Count];
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var ok = true;
        foreach (var entry in statement.Entries.Where(e => IsFieldEffect(e.Kind)))
        {
            var key = entry.Kind switch
            {
                ScenarioEntryKind.Season => "season sd",
                ScenarioEntryKind.Interaction => "interaction sd",
                ScenarioEntryKind.BlockEffect => "block sd",
                ScenarioEntryKind.Dispersion => "dispersion",
                _ => "missing" + (entry.Arm is null ? "" : " " + entry.Arm.Name),
            };
            if (!seen.Add(key))
            {
                Report(DiagnosticCatalog.ScenarioRepeatedArm, entry.Span, statement.Name.Value, key);
                ok = false;
                continue;
            }
            switch (entry.Kind)
            {
                case ScenarioEntryKind.Season:
                    ok &= Assign(ref season, Real(entry.Value, "a season sd", "0 or more", v => v >= 0));
                    break;
                case ScenarioEntryKind.Interaction:
                    ok &= Assign(ref interaction, Real(entry.Value, "an interaction sd", "0 or more", v => v >= 0));
                    break;
                case ScenarioEntryKind.BlockEffect:
                    ok &= Assign(ref block, Real(entry.Value, "a block sd", "0 or more", v => v >= 0));
                    break;
                case ScenarioEntryKind.Dispersion:
                    if (outcome is not null && outcome.Family != OutcomeFamily.Count)
                    {
                        Report(DiagnosticCatalog.ScenarioDispersionNotCount, entry.Span, outcome.FamilyText);
                        ok = false;
                        break;
                    }
                    dispersion = Positive(entry.Value, "a dispersion shape");
                    ok &= dispersion is not null;
                    break;
                default:
                    // Below 100 %: a scenario in which every plot is lost has nothing to simulate.
                    var share = Real(entry.Value, "a missing-plot percentage", "0 or more and below 100", v => v is >= 0 and < 100) / 100;
                    if (share is null) { ok = false; break; }
                    if (entry.Arm is null) missing = share.Value;
                    else if (ResolveArm(entry.Arm, arms) is { } index) byArm[index] = share.Value;
                    else ok = false;
                    break;
            }
        }
        if (!ok) return null;
        if (season == 0 && interaction == 0 && block == 0 && missing == 0 && dispersion is null && byArm.All(v => v is null))
            return FieldEffects.None;
        var perArm = byArm.Select(v => Math.Max(v ?? 0, missing)).ToList();
        return new FieldEffects(season, interaction, block, missing, perArm, dispersion);
    }

    private static bool Assign(ref double target, double? value)
    {
        if (value is null) return false;
        target = value.Value;
        return true;
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
