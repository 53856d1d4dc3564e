using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning;

namespace DesignCompiler.Ledger;

/// <summary>
/// Rebuilds what the planner knew before a round from the ledger: every earlier issued plan is
/// taken in with <see cref="TrialState.Issue"/> (stock used, arms dropped, the arm on each plot
/// for rotation rules), every recorded value
/// with <see cref="TrialState.Record"/>. Arms are matched by code, so a design amended to
/// reorder its arms still replays. Values are added in sheet order within each round, never in
/// the order a file listed them, so the same results always give the same sums to the last bit.
/// </summary>
public static class TrialReplay
{
    /// <summary>The state before <paramref name="round"/> is planned: rounds before it, issued and recorded.</summary>
    public static LedgerResult<TrialState> Before(CheckedDesign design, LedgerHistory history, int round) =>
        Replay(design, history.Rounds.Where(r => r.Round < round), history.Rounds.Where(r => r.Round < round));

    /// <summary>
    /// The state as it stands: every issued round counts against stock and drops, the results
    /// of every recorded round are in. This is what <c>status</c> shows.
    /// </summary>
    public static LedgerResult<TrialState> Now(CheckedDesign design, LedgerHistory history) =>
        Replay(design, history.Rounds, history.Rounds);

    /// <summary>The state after the first <paramref name="recorded"/> rounds' results, with the plans issued up to then.</summary>
    public static LedgerResult<TrialState> AfterRecorded(CheckedDesign design, LedgerHistory history, int recorded) =>
        Replay(design, history.Rounds.Where(r => r.Round <= recorded), history.Rounds.Where(r => r.Round <= recorded));

    private static LedgerResult<TrialState> Replay(CheckedDesign design, IEnumerable<IssuedRound> issued, IEnumerable<IssuedRound> recorded)
    {
        var state = new TrialState(design.Arms.Count);
        var problems = new List<Diagnostic>();
        var index = design.Arms.ToDictionary(a => a.Code, a => a.Index, StringComparer.Ordinal);

        foreach (var round in issued)
        {
            var plan = round.ReadPlan();
            var arms = new List<ArmPlan>();
            foreach (var arm in plan.Arms)
            {
                if (index.TryGetValue(arm.Code, out var i)) arms.Add(arm with { Index = i });
                else if (arm.Plots > 0 || arm.Status == ArmStatus.Dropped) problems.Add(Unknown(design, arm.Code, round.Round));
            }
            // Rotation rules read the arm on every plot, so the plots carry the current design's indices too.
            var plots = plan.Assignments.Select(a => a with { Arm = index.GetValueOrDefault(a.ArmCode, a.Arm) }).ToList();
            state.Issue(plan with { Arms = arms, Assignments = plots });
        }

        var blockOfPlot = new Dictionary<(int Round, string Plot), int>();
        foreach (var round in issued)
            foreach (var a in round.ReadPlan().Assignments)
                blockOfPlot[(round.Round, a.PlotId)] = a.BlockIndex;

        foreach (var round in recorded.Where(r => r.Recording is not null))
        {
            foreach (var outcome in round.Recording!.Outcomes)
            {
                if (outcome.Value is not { } value) continue;
                var block = blockOfPlot.GetValueOrDefault((round.Round, outcome.PlotId));
                if (index.TryGetValue(outcome.Arm, out var i)) state.Record(i, value, block, round.Round);
                else problems.Add(Unknown(design, outcome.Arm, round.Round));
            }
            state.RoundsCompleted++;
        }

        var distinct = problems.DistinctBy(p => p.Message).ToList();
        return distinct.Count > 0 ? LedgerResult<TrialState>.Fail(distinct) : LedgerResult<TrialState>.Ok(state);
    }

    private static Diagnostic Unknown(CheckedDesign design, string code, int round) =>
        new(LedgerDiagnostics.RecordedArmUnknown, SourceLocation.File(design.Source.Path), [code, round]);
}
