using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Numerics;
using DesignCompiler.Planning.Allocation;
using DesignCompiler.Planning.Families;
using DesignCompiler.Planning.Limits;
using DesignCompiler.Planning.Placement;
using DesignCompiler.Planning.Policies;

namespace DesignCompiler.Planning;

/// <summary>A round's plan, or why the trial issues no plan: stopped by a rule, or limits that cannot hold.</summary>
public sealed record PlanResult(RoundPlan? Plan, string? StopReason, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool HasErrors => Diagnostics.Any(d => d.Severity == Severity.Error);
}

/// <summary>
/// The one planner. From a checked design and what is known before a round it computes
/// the posteriors, applies drop and stop rules, asks the policy for target shares, turns
/// them into whole plots that meet every limit, splits them over blocks and places them
/// on plots. <c>compile</c> and the simulator both call <see cref="Plan"/>; there is no
/// second copy of any step.
/// </summary>
public sealed class RoundPlanner
{
    private readonly CheckedDesign _design;
    private readonly IOutcomeModel _model;
    private readonly IAllocationPolicy _policy;

    private RoundPlanner(CheckedDesign design, IOutcomeModel model, IAllocationPolicy policy)
    {
        _design = design;
        _model = model;
        _policy = policy;
    }

    public CheckedDesign Design => _design;
    public IOutcomeModel Model => _model;

    /// <summary>A planner for the design. Every policy and family of the language is supported.</summary>
    public static (RoundPlanner? Planner, Diagnostic? Problem) For(CheckedDesign design) =>
        (new RoundPlanner(design, OutcomeModels.For(design.Outcome), AllocationPolicies.For(design.Policy)), null);

    /// <summary>The posteriors of every arm from what <paramref name="state"/> has recorded.</summary>
    public TrialBelief Believe(TrialState state) => TrialBelief.For(_design, _model, state);

    public PlanResult Plan(TrialState state, int round)
    {
        var design = _design;
        if (round < 1 || round > design.Rounds)
            return Fail(DiagnosticCatalog.RoundOutOfRange, design.Locate(default), round, design.Rounds);

        var arms = design.Arms.Count;
        var belief = Believe(state);
        var posteriors = belief.Posteriors;
        var values = belief.Values;

        var dropped = (bool[])state.Dropped.Clone();
        var inTrial = Enumerable.Range(0, arms).Where(i => !dropped[i]).ToList();
        var summary = belief.Summarize(inTrial);

        // Drop rules, then stop rules, on what is known after the last recorded round.
        var newlyDropped = new bool[arms];
        if (state.RoundsCompleted >= 1)
        {
            foreach (var rule in design.DropRules)
            {
                if (state.RoundsCompleted < rule.AfterRound) continue;
                foreach (var i in inTrial)
                    if (i != design.Control && rule.Criterion.Holds(summary.Metric(rule.Criterion.Metric, i)))
                        newlyDropped[i] = true;
            }
            if (newlyDropped.Any(d => d))
            {
                for (var i = 0; i < arms; i++) dropped[i] |= newlyDropped[i];
                inTrial = Enumerable.Range(0, arms).Where(i => !dropped[i]).ToList();
                summary = belief.Summarize(inTrial);
            }

            foreach (var rule in design.StopRules)
            {
                if (state.RoundsCompleted < rule.AfterRound) continue;
                var leader = summary.Leader;
                var value = summary.Metric(rule.Criterion.Metric, leader);
                if (rule.Criterion.Holds(value))
                    return new PlanResult(null, FormattableString.Invariant(
                        $"the trial stops after round {state.RoundsCompleted}: '{rule.Criterion.Describe()}' holds for {design.Arms[leader].Code} ({value:0.####})"), []);
            }
        }

        if (dropped.Any(d => d) && KeepEnoughArmsToFillTheRound(round, state, summary, dropped))
        {
            for (var i = 0; i < arms; i++) newlyDropped[i] &= dropped[i];
            inTrial = Enumerable.Range(0, arms).Where(i => !dropped[i]).ToList();
            summary = belief.Summarize(inTrial);
        }

        var rotation = RotationRules.For(design, round, state.History);
        var constraints = RoundConstraints.Resolve(design, round, state.PlotsIssued, dropped,
            rotation.Any ? rotation.AllowedPlots(design) : null);
        var available = constraints.Available;
        for (var i = 0; i < arms; i++)
        {
            // An arm whose stock is used up or held back for later minimums sits this round out.
            if (available[i] && constraints.RoundMaximum[i] == 0 && constraints.RoundMaximumSource[i] is StockLimit)
                available[i] = false;
        }

        var sown = Enumerable.Range(0, arms).Where(i => available[i]).ToList();
        var allocationSummary = sown.SequenceEqual(inTrial) ? summary : belief.Summarize(sown);

        var shares = new double[arms];
        _policy.TargetShares(new PolicyContext(design, round, design.PlotsPerRound, available, values,
            allocationSummary.ProbabilityBest, state.Statistics), shares);

        var totals = BoundedApportionment.Apportion(shares, design.PlotsPerRound, constraints.RoundMinimum, constraints.RoundMaximum,
            RoundingUniform(round));
        if (!totals.IsFeasible) return InfeasibilityReport.ForRound(design, constraints, totals);

        var table = ControlledRounding.Round(totals.Counts, design.Blocks.Select(b => b.Plots).ToArray(),
            constraints.CellMinimum, constraints.CellMaximum);
        if (!table.IsFeasible) return InfeasibilityReport.ForBlocks(design, constraints, totals.Counts, table);

        var placement = PlotPlacer.Place(design, round, table.Counts, rotation);
        if (placement.Assignments is null) return InfeasibilityReport.ForRotation(design, placement.Problem!);
        var plan = BuildPlan(state, round, posteriors, summary, shares, totals.Counts, table.Counts, placement.Assignments, dropped, newlyDropped, constraints);
        return new PlanResult(plan, null, []);
    }

    /// <summary>
    /// The one uniform number randomized rounding uses in a round, from the design seed, so the
    /// sheets stay reproducible; null for largest remainder.
    /// </summary>
    private double? RoundingUniform(int round) =>
        _design.Rounding == RoundingRule.Randomized
            ? new Randomness.Xoshiro256StarStar(Randomness.StreamSeed.Derive(_design.Seed, StreamPurpose.Rounding, (ulong)round, 0)).NextDouble()
            : null;

    /// <summary>
    /// A drop rule may not empty the field: when the arms left could not fill the round within
    /// their maximums and stock (say 'every arm &lt;= 40%' with two arms left, or a third whose
    /// stock ran out), dropped arms come back, smallest expected loss first, until they can.
    /// Returns true when it brought any back.
    /// </summary>
    private bool KeepEnoughArmsToFillTheRound(int round, TrialState state, BestArmSummary summary, bool[] dropped)
    {
        var candidates = Enumerable.Range(0, dropped.Length).Where(i => dropped[i])
            .OrderBy(i => summary.ExpectedLoss[i]).ThenBy(i => i).ToList();
        var restored = false;
        foreach (var keep in candidates.Prepend(-1))
        {
            if (keep >= 0)
            {
                dropped[keep] = false;
                restored = true;
            }
            var constraints = RoundConstraints.Resolve(_design, round, state.PlotsIssued, dropped);
            long room = 0;
            for (var i = 0; i < dropped.Length; i++) if (constraints.Available[i]) room += constraints.RoundMaximum[i];
            if (room >= _design.PlotsPerRound) return restored;
        }
        return restored;
    }

    private RoundPlan BuildPlan(
        TrialState state, int round, IMarginal[] posteriors, BestArmSummary summary, double[] shares,
        int[] totals, int[,] table, IReadOnlyList<PlotAssignment> assignments, bool[] dropped, bool[] newlyDropped,
        RoundConstraints constraints)
    {
        var design = _design;
        var armPlans = new List<ArmPlan>();
        for (var i = 0; i < design.Arms.Count; i++)
        {
            var arm = design.Arms[i];
            var interval = CredibleInterval.EqualTailed(posteriors[i], 0.95);
            armPlans.Add(new ArmPlan(i, arm.Code, arm.Label, i == design.Control, StatusOf(i, round, dropped, constraints),
                totals[i], shares[i], summary.ProbabilityBest[i], posteriors[i].Mean, interval.Lower, interval.Upper,
                summary.ExpectedLoss[i], state.Statistics[i].Count));
        }

        var blocks = design.Blocks.Select((b, j) =>
            new BlockPlan(b.Name, b.Plots, b.Rows, b.Columns, Enumerable.Range(0, design.Arms.Count).Select(i => table[i, j]).ToList())).ToList();

        var valueUnit = design.Valuation.HasPrice ? design.Valuation.Currency ?? "money" : design.Outcome.Unit;
        return new RoundPlan(design.Name, round, design.Rounds, design.Hash, design.Seed, design.Policy.Name,
            design.Outcome.Name, design.Outcome.Unit, design.Outcome.FamilyText, valueUnit,
            armPlans, blocks, assignments, summary.ErrorBound, state.PlotsRecorded);
    }

    private ArmStatus StatusOf(int arm, int round, bool[] dropped, RoundConstraints constraints)
    {
        if (dropped[arm]) return ArmStatus.Dropped;
        if (!RoundConstraints.IsInWindow(_design, arm, round))
        {
            var opens = _design.Windows.Where(w => w.Arm == arm).Select(w => w.FromRound).DefaultIfEmpty(1).Max();
            return round < opens ? ArmStatus.NotYetAvailable : ArmStatus.NoLongerAvailable;
        }
        return constraints.Available[arm] ? ArmStatus.InPlay : ArmStatus.OutOfStock;
    }

    private static PlanResult Fail(DiagnosticDescriptor descriptor, SourceLocation location, params object[] arguments) =>
        new(null, null, [new Diagnostic(descriptor, location, arguments)]);
}
