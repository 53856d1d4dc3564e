using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Ledger;

/// <summary>
/// Whether an amended design still fits what the ledger holds: every arm that was sown or
/// recorded is still in it, the outcome is of the same family (so recorded values keep their
/// meaning and every one is still a value the family takes), it has rounds for those issued, and
/// with rotation rules its blocks and plots are the same.
/// </summary>
public static class AmendmentCheck
{
    public static IReadOnlyList<Diagnostic> Problems(CheckedDesign amended, CheckedDesign? previous, LedgerHistory history)
    {
        var problems = new List<string>();
        var codes = amended.Arms.Select(a => a.Code).ToHashSet(StringComparer.Ordinal);
        var used = history.Rounds.SelectMany(r => r.Plots.Select(p => p.ArmCode))
            .Concat(history.Rounds.SelectMany(r => r.Recording?.Outcomes.Select(o => o.Arm) ?? []))
            .Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal);
        foreach (var code in used)
            if (!codes.Contains(code)) problems.Add($"arm '{code}' was sown in the trial but is not in the amended design");

        if (previous is not null && (previous.Outcome.Family != amended.Outcome.Family || previous.Outcome.Trials != amended.Outcome.Trials))
            problems.Add($"the outcome was {previous.Outcome.FamilyText} and would become {amended.Outcome.FamilyText}; recorded values would change meaning");
        else
        {
            var model = OutcomeModels.For(amended.Outcome);
            foreach (var round in history.Rounds)
                foreach (var outcome in round.Recording?.Outcomes ?? [])
                    if (outcome.Value is { } value && !model.Accepts(value).Ok)
                        problems.Add(FormattableString.Invariant(
                            $"the value {outcome.ValueText} recorded for plot '{outcome.PlotId}' in round {round.Round} is not one a {amended.Outcome.FamilyText} outcome takes"));
        }

        // Rotation rules compare a plot's arm with its arms in earlier rounds, plot by plot, so the plots must stay the same.
        var rotates = amended.RestRules.Count > 0 || amended.AfterRules.Count > 0;
        var field = amended.Blocks.Select(b => b.PlotId(0) + "/" + b.Plots).ToList();
        if (rotates && previous is not null && !field.SequenceEqual(previous.Blocks.Select(b => b.PlotId(0) + "/" + b.Plots)))
            problems.Add("the design has rotation rules, which need the same blocks and plots in every round, but the blocks changed");

        if (history.LastRound is { } last && amended.Rounds < last.Round)
            problems.Add(FormattableString.Invariant($"the amended design has {amended.Rounds} rounds but {last.Round} are already issued"));

        return problems.Select(p => new Diagnostic(LedgerDiagnostics.AmendmentDoesNotFit, SourceLocation.File(amended.Source.Path), [p])).ToList();
    }
}
