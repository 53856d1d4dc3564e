using System.Globalization;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Numerics;
using DesignCompiler.Planning;
using DesignCompiler.Planning.Families;
using DesignCompiler.Syntax;

namespace DesignCompiler.Ledger;

/// <summary>
/// Computes a <see cref="TrialStatus"/> with the planner's own pieces: posteriors from
/// <see cref="OutcomeModels"/>, intervals from <see cref="CredibleInterval"/>, P(best) and
/// expected loss from <see cref="BestArmSummary"/>, each rule's test from its
/// <see cref="Criterion"/>; whether the trial stops is asked of <see cref="RoundPlanner.Plan"/>
/// itself, so status and compile can never disagree.
/// </summary>
public static class TrialStatusBuilder
{
    public static LedgerResult<TrialStatus> Build(RoundPlanner planner, LedgerHistory history)
    {
        var design = planner.Design;
        var now = TrialReplay.Now(design, history);
        if (now.Value is not { } state) return LedgerResult<TrialStatus>.Fail(now.Diagnostics);

        var (posteriors, summary) = ArmAssessment.Of(design, planner.Model, state);
        var last = history.LastRound?.ReadPlan();
        var arms = design.Arms.Select(arm =>
        {
            var i = arm.Index;
            var interval = CredibleInterval.EqualTailed(posteriors[i], 0.95);
            var recorded = history.Rounds.SelectMany(r => r.Recording?.Outcomes ?? []).Where(o => o.Arm == arm.Code).ToList();
            return new ArmStanding(arm.Code, arm.Label, i == design.Control, state.Dropped[i],
                last?.Arms.FirstOrDefault(a => a.Code == arm.Code)?.Status,
                state.PlotsIssued[i], recorded.Count(o => o.Value is not null), recorded.Count(o => o.Value is null),
                posteriors[i].Mean, interval.Lower, interval.Upper, summary.ProbabilityBest[i], summary.ExpectedLoss[i]);
        }).ToList();

        var points = ProbabilityBestHistory.Of(design, planner.Model, history, history.RecordedRounds);
        if (points.Value is null) return LedgerResult<TrialStatus>.Fail(points.Diagnostics);

        var stocks = design.Stocks.Select(s => new StockStanding(design.Arms[s.Arm].Code, s.Plots, state.PlotsIssued[s.Arm],
            Math.Max(0, s.Plots - state.PlotsIssued[s.Arm]))).ToList();
        var plotsIssued = history.Rounds.Sum(r => r.Plots.Count);
        var outcomes = history.Rounds.SelectMany(r => r.Recording?.Outcomes ?? []).ToList();

        return LedgerResult<TrialStatus>.Ok(new TrialStatus(
            design.Name, design.Hash, design.Rounds, history.Rounds.Count, history.RecordedRounds, plotsIssued,
            outcomes.Count(o => o.Value is not null), outcomes.Count(o => o.Value is null),
            design.Outcome.Name, design.Outcome.Unit, design.Outcome.FamilyText,
            design.Valuation.HasPrice ? design.Valuation.Currency ?? "money" : design.Outcome.Unit,
            design.Valuation.Goal == Goal.Minimize,
            arms, Rules(design, state, summary), stocks, points.Value, history.Amendments, Next(planner, history, state), history.HeadHash, design.Seed));
    }

    private static List<RuleStanding> Rules(CheckedDesign design, TrialState state, BestArmSummary summary)
    {
        var rules = new List<RuleStanding>();
        var completed = state.RoundsCompleted;
        var inTrial = Enumerable.Range(0, design.Arms.Count).Where(i => !state.Dropped[i]).ToList();
        foreach (var rule in design.DropRules)
        {
            var inForce = completed >= Math.Max(1, rule.AfterRound);
            var meeting = inTrial.Where(i => i != design.Control && rule.Criterion.Holds(summary.Metric(rule.Criterion.Metric, i)))
                .Select(i => design.Arms[i].Code).ToList();
            var who = string.Join(", ", meeting.Select(c =>
                Invariant($"{c} ({MetricName(rule.Criterion)} {rule.Criterion.Show(summary.Metric(rule.Criterion.Metric, design.FindArm(c)!.Index))})")));
            var finding = !inForce
                ? Invariant($"in force once {Math.Max(1, rule.AfterRound)} round(s) are recorded") + (meeting.Count == 0 ? "" : "; " + who + " would meet it now")
                : meeting.Count == 0 ? "no arm in the trial meets it" + AlreadyDropped(design, state)
                : who + (meeting.Count == 1 ? " meets it and is dropped from the next round" : " meet it and are dropped from the next round");
            rules.Add(new RuleStanding(RuleKind.Drop, "drop when " + rule.Criterion.Describe() + AfterText(rule.AfterRound), rule.AfterRound,
                inForce, inForce && meeting.Count > 0, meeting, finding));
        }
        foreach (var rule in design.StopRules)
        {
            var inForce = completed >= Math.Max(1, rule.AfterRound);
            var leader = summary.Leader;
            var value = summary.Metric(rule.Criterion.Metric, leader);
            var holds = rule.Criterion.Holds(value);
            var finding = Invariant($"{design.Arms[leader].Code} leads with {MetricName(rule.Criterion)} {rule.Criterion.Show(value)}: ")
                + (!inForce ? Invariant($"in force once {Math.Max(1, rule.AfterRound)} round(s) are recorded")
                    : holds ? "it holds" : "not met");
            rules.Add(new RuleStanding(RuleKind.Stop, "stop when " + rule.Criterion.Describe() + AfterText(rule.AfterRound), rule.AfterRound,
                inForce, inForce && holds, [design.Arms[leader].Code], finding));
        }
        return rules;
    }

    private static NextStep Next(RoundPlanner planner, LedgerHistory history, TrialState state)
    {
        var design = planner.Design;
        if (history.LastRound is { IsRecorded: false } open)
            return new NextStep(NextStepKind.AwaitResults, open.Round,
                Invariant($"round {open.Round} awaits results for {open.Plots.Count} plots; record them with 'trialc record'"));
        var next = (history.LastRound?.Round ?? 0) + 1;
        if (next > design.Rounds)
            return new NextStep(NextStepKind.Complete, design.Rounds, Invariant($"all {design.Rounds} rounds are issued and recorded; the trial is complete"));

        var before = TrialReplay.Before(design, history, next);
        var result = planner.Plan(before.Value ?? state, next);
        if (result.StopReason is { } reason) return new NextStep(NextStepKind.Stopped, next, reason);
        if (result.Plan is null)
            return new NextStep(NextStepKind.Blocked, next, Invariant($"round {next} cannot be planned: ")
                + string.Join("; ", result.Diagnostics.Where(d => d.Severity == Severity.Error).Select(d => d.Message)));
        return new NextStep(NextStepKind.CompileNext, next, Invariant($"round {next} of {design.Rounds} can be compiled"));
    }

    private static string AlreadyDropped(CheckedDesign design, TrialState state)
    {
        var dropped = design.Arms.Where(a => state.Dropped[a.Index]).Select(a => a.Code).ToList();
        return dropped.Count == 0 ? "" : " (dropped before: " + string.Join(", ", dropped) + ")";
    }

    private static string MetricName(Criterion criterion) => criterion.Metric == CriterionMetric.Best ? "P(best)" : "expected loss";

    private static string AfterText(int afterRound) => afterRound > 0 ? Invariant($" after round {afterRound}") : "";

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
