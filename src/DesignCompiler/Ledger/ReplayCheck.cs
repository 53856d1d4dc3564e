using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning;

namespace DesignCompiler.Ledger;

/// <summary>
/// Plans every past round again from the ledger's data, under the design text it was issued
/// with, and compares with what was stored. The same trialc must give the same round to the
/// last bit (the planner is deterministic); a difference then means the planner or the data are
/// not what they were, and the trial must not go on from them. A round issued by another version
/// of trialc may differ; then the stored round stands and a warning says so. When only the
/// printed figures moved (the same plots, the same arms sown), the stored round stands too.
/// </summary>
public static class ReplayCheck
{
    public static IReadOnlyList<Diagnostic> Check(RoundPlanner planner, LedgerHistory history, string toolVersion)
    {
        var design = planner.Design;
        var problems = new List<Diagnostic>();
        foreach (var round in history.Rounds)
        {
            // Rounds issued under an earlier design text cannot be planned again with this one.
            if (round.Entry.DesignHash != design.Hash) continue;
            var state = TrialReplay.Before(design, history, round.Round);
            if (state.Value is null) return state.Diagnostics;

            var stored = round.ReadPlan();
            var again = planner.Plan(state.Value, round.Round);
            var location = SourceLocation.File(design.Source.Path);
            if (again.Plan is null || PlotDifference(stored, again.Plan) is not null)
            {
                var difference = again.Plan is null ? again.StopReason ?? "the planner now gives no plan" : PlotDifference(stored, again.Plan)!;
                problems.Add(round.Entry.ToolVersion == toolVersion
                    ? new Diagnostic(LedgerDiagnostics.ReplayDiffers, location, [round.Round, difference])
                    : new Diagnostic(LedgerDiagnostics.ReplayDiffersOtherVersion, location, [round.Round, round.Entry.ToolVersion, difference]));
            }
            else if (FigureDifference(stored, again.Plan) is { } figures)
            {
                // The field work is the same; only the printed figures moved (a numerics change between builds).
                problems.Add(new Diagnostic(LedgerDiagnostics.ReplayFiguresDiffer, location, [round.Round, figures]));
            }
        }
        return problems;
    }

    private static string? PlotDifference(RoundPlan stored, RoundPlan again)
    {
        for (var i = 0; i < Math.Min(stored.Assignments.Count, again.Assignments.Count); i++)
        {
            var (a, b) = (stored.Assignments[i], again.Assignments[i]);
            if (a.PlotId != b.PlotId || a.ArmCode != b.ArmCode)
                return $"plot {a.PlotId} was issued with {a.ArmCode}, the planner now puts {b.ArmCode} on {b.PlotId}";
        }
        if (stored.Assignments.Count != again.Assignments.Count)
            return FormattableString.Invariant($"{stored.Assignments.Count} plots were issued, the planner now gives {again.Assignments.Count}");
        var statuses = stored.Arms.Zip(again.Arms).FirstOrDefault(p => p.First.Status != p.Second.Status || p.First.Plots != p.Second.Plots);
        return statuses.First is null ? null : $"arm {statuses.First.Code} was {statuses.First.Status} on {statuses.First.Plots} plots, now {statuses.Second.Status} on {statuses.Second.Plots}";
    }

    private static string? FigureDifference(RoundPlan stored, RoundPlan again)
    {
        var largest = (Arm: "", Figure: "", Difference: 0.0);
        foreach (var (a, b) in stored.Arms.Zip(again.Arms))
        {
            foreach (var (name, x, y) in new[]
                     {
                         ("P(best)", a.ProbabilityBest, b.ProbabilityBest), ("posterior mean", a.PosteriorMean, b.PosteriorMean),
                         ("interval", a.CredibleLower, b.CredibleLower), ("interval", a.CredibleUpper, b.CredibleUpper),
                         ("expected loss", a.ExpectedLoss, b.ExpectedLoss), ("target share", a.TargetShare, b.TargetShare),
                     })
            {
                var difference = x.Equals(y) ? 0 : double.IsFinite(x - y) ? Math.Abs(x - y) : double.PositiveInfinity;
                if (difference > largest.Difference) largest = (a.Code, name, difference);
            }
        }
        return largest.Difference == 0 ? null
            : FormattableString.Invariant($"the plots are the same; the largest difference is {largest.Difference:G3} in the {largest.Figure} of {largest.Arm}");
    }
}
