using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Numerics;
using DesignCompiler.Planning.Allocation;
using DesignCompiler.Planning.Families;
using DesignCompiler.Planning.Limits;
using DesignCompiler.Planning.Placement;
using DesignCompiler.Planning.Policies;
using DesignCompiler.Syntax;

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

    /// <summary>The posteriors of every arm from what <paramref name="state"/> has recorded (for status, reports and analysis).</summary>
    public TrialBelief Believe(TrialState state) => TrialBelief.For(_design, _model, state);

    public PlanResult Plan(TrialState state, int round)
    {
        var workspace = new PlanWorkspace(_design);
        Decide(state, round, workspace);
        return ResultOf(state, round, workspace);
    }

    /// <summary>
    /// Every decision of the round, into the workspace's buffers: posteriors, drop and stop rules, the
    /// policy's shares, plots per arm and per block, and the arm on every plot. <see cref="Plan"/> is this
    /// followed by <see cref="ResultOf"/>; the simulator reads the workspace directly, so a simulated round
    /// allocates nothing when the design's policy and limits do not need to.
    /// </summary>
    /// <returns>true when the round is planned; otherwise <see cref="ResultOf"/> says why not.</returns>
    public bool Decide(TrialState state, int round, PlanWorkspace workspace)
    {
        var design = _design;
        var ws = workspace;
        ws.StopReason = null;
        ws.Failure = RoundFailure.None;
        if (round < 1 || round > design.Rounds)
        {
            ws.Failure = RoundFailure.RoundOutOfRange;
            return false;
        }

        var arms = design.Arms.Count;
        var scale = design.Valuation.Scale;
        if (design.Model.IsAdjusted)
        {
            // One linear model over every recorded plot: the arms' posteriors are refitted each round.
            var (posteriors, joint) = AdjustedBelief.Fit(design, state);
            for (var i = 0; i < arms; i++) ws.SetPosterior(i, posteriors[i], scale, -design.Arms[i].Cost, state.Statistics[i]);
            ws.Joint = joint;
        }
        else
        {
            for (var i = 0; i < arms; i++)
                ws.UpdatePosterior(i, _model, design.Arms[i].Prior, scale, -design.Arms[i].Cost, state.Statistics[i]);
        }
        var values = ws.Values;

        var dropped = ws.Dropped;
        var newlyDropped = ws.NewlyDropped;
        state.Dropped.CopyTo(dropped, 0);
        Array.Clear(newlyDropped);
        ws.InTrialCount = Select(dropped, ws.InTrial);
        var summary = ws.Summary;
        Summarise(ws, ws.InTrial.AsSpan(0, ws.InTrialCount), summary);

        // Drop rules, then stop rules, on what is known after the last recorded round.
        if (state.RoundsCompleted >= 1)
        {
            var anyDropped = false;
            for (var r = 0; r < design.DropRules.Count; r++)
            {
                var rule = design.DropRules[r];
                if (state.RoundsCompleted < rule.AfterRound) continue;
                for (var k = 0; k < ws.InTrialCount; k++)
                {
                    var i = ws.InTrial[k];
                    if (i != design.Control && rule.Criterion.Holds(Metric(summary, rule.Criterion.Metric, i)))
                        newlyDropped[i] = anyDropped = true;
                }
            }
            if (anyDropped)
            {
                for (var i = 0; i < arms; i++) dropped[i] |= newlyDropped[i];
                ws.InTrialCount = Select(dropped, ws.InTrial);
                Summarise(ws, ws.InTrial.AsSpan(0, ws.InTrialCount), summary);
            }

            for (var r = 0; r < design.StopRules.Count; r++)
            {
                var rule = design.StopRules[r];
                if (state.RoundsCompleted < rule.AfterRound) continue;
                var leader = summary.Leader;
                var value = Metric(summary, rule.Criterion.Metric, leader);
                if (rule.Criterion.Holds(value))
                {
                    ws.StopReason = FormattableString.Invariant(
                        $"the trial stops after round {state.RoundsCompleted}: '{rule.Criterion.Describe()}' holds for {design.Arms[leader].Code} ({rule.Criterion.Show(value)})");
                    return false;
                }
            }
        }

        if (Array.IndexOf(dropped, true) >= 0 && KeepEnoughArmsToFillTheRound(round, state, summary.ExpectedLoss, dropped))
        {
            for (var i = 0; i < arms; i++) newlyDropped[i] &= dropped[i];
            ws.InTrialCount = Select(dropped, ws.InTrial);
            Summarise(ws, ws.InTrial.AsSpan(0, ws.InTrialCount), summary);
        }

        var rotation = RotationRules.For(design, round, state.History);
        var constraints = RoundConstraints.Resolve(design, round, state.PlotsIssued, dropped,
            rotation.Any ? rotation.AllowedPlots(design) : null, ws.Constraints);
        ws.Constraints = constraints;
        var available = constraints.Available;
        for (var i = 0; i < arms; i++)
        {
            // An arm whose stock is used up or held back for later minimums sits this round out.
            if (available[i] && constraints.RoundMaximum[i] == 0 && constraints.RoundMaximumSource[i] is StockLimit)
                available[i] = false;
        }

        ws.SownCount = Select(available, ws.Sown, selected: true);
        var allocationSummary = summary;
        if (!ws.Sown.AsSpan(0, ws.SownCount).SequenceEqual(ws.InTrial.AsSpan(0, ws.InTrialCount)))
        {
            allocationSummary = ws.AllocationSummary;
            Summarise(ws, ws.Sown.AsSpan(0, ws.SownCount), allocationSummary);
        }

        var shares = ws.Shares;
        Array.Clear(shares);
        _policy.TargetShares(new PolicyContext(design, round, ws.PlotsPerRound, available, values,
            allocationSummary.ProbabilityBest, state.Statistics), shares);

        ws.Apportionment = BoundedApportionment.Apportion(shares, ws.PlotsPerRound, constraints.RoundMinimum, constraints.RoundMaximum, ws.Totals,
            RoundingUniform(round));
        if (!ws.Apportionment.IsFeasible)
        {
            ws.Failure = RoundFailure.Apportionment;
            return false;
        }

        var blocks = design.Blocks.Count;
        for (var i = 0; i < arms; i++)
        {
            for (var j = 0; j < blocks; j++)
            {
                ws.CellMinimum[i * blocks + j] = constraints.CellMinimum[i, j];
                ws.CellMaximum[i * blocks + j] = constraints.CellMaximum[i, j];
            }
        }
        ws.TableStatus = ControlledRounding.Round(ws.Totals, ws.BlockPlots, ws.CellMinimum, ws.CellMaximum, ws.Table, ws.Rounding);
        if (!ws.TableStatus.IsFeasible)
        {
            ws.Failure = RoundFailure.Table;
            return false;
        }

        ws.PlacementProblem = PlotPlacer.PlaceArms(design, round, ws.Table, rotation, ws.ArmOfPlot);
        if (ws.PlacementProblem is not null)
        {
            ws.Failure = RoundFailure.Placement;
            return false;
        }
        return true;
    }

    /// <summary>The plan, the stop or the diagnostics that the workspace's last <see cref="Decide"/> came to.</summary>
    public PlanResult ResultOf(TrialState state, int round, PlanWorkspace workspace)
    {
        var design = _design;
        var ws = workspace;
        if (ws.StopReason is not null) return new PlanResult(null, ws.StopReason, []);
        var blocks = design.Blocks.Count;
        switch (ws.Failure)
        {
            case RoundFailure.RoundOutOfRange:
                return Fail(DiagnosticCatalog.RoundOutOfRange, design.Locate(default), round, design.Rounds);
            case RoundFailure.Apportionment:
                return InfeasibilityReport.ForRound(design, ws.Constraints!, new ApportionmentResult(ws.Apportionment, ws.Totals));
            case RoundFailure.Table:
                return InfeasibilityReport.ForBlocks(design, ws.Constraints!, ws.Totals, new ControlledRoundingResult(ws.TableStatus, new int[design.Arms.Count, blocks]));
            case RoundFailure.Placement:
                return InfeasibilityReport.ForRotation(design, ws.PlacementProblem!);
        }

        var table = new int[design.Arms.Count, blocks];
        for (var i = 0; i < design.Arms.Count; i++)
            for (var j = 0; j < blocks; j++) table[i, j] = ws.Table[i * blocks + j];
        var plan = BuildPlan(state, round, ws, table, Assignments(ws.ArmOfPlot));
        return new PlanResult(plan, null, []);
    }

    private List<PlotAssignment> Assignments(int[] armOfPlot)
    {
        var design = _design;
        var result = new List<PlotAssignment>(armOfPlot.Length);
        var offset = 0;
        foreach (var block in design.Blocks)
        {
            for (var plot = 0; plot < block.Plots; plot++)
            {
                var arm = armOfPlot[offset + plot];
                result.Add(new PlotAssignment(block.Name, block.Index, plot, block.PlotId(plot), block.RowOf(plot), block.ColumnOf(plot), arm, design.Arms[arm].Code));
            }
            offset += block.Plots;
        }
        return result;
    }

    private static double Metric(PlanWorkspace.SummaryBuffers summary, CriterionMetric metric, int arm) =>
        metric == CriterionMetric.Best ? summary.ProbabilityBest[arm] : summary.ExpectedLoss[arm];

    /// <summary>The indices where <paramref name="flags"/> is <paramref name="selected"/> (false: the arms not dropped), in order.</summary>
    private static int Select(bool[] flags, int[] into, bool selected = false)
    {
        var count = 0;
        for (var i = 0; i < flags.Length; i++) if (flags[i] == selected) into[count++] = i;
        return count;
    }

    private static void Summarise(PlanWorkspace ws, ReadOnlySpan<int> subset, PlanWorkspace.SummaryBuffers into)
    {
        if (ws.Joint is { } joint) BestArmSummary.ComputeJoint(joint, ws.Values, subset, into);
        else BestArmSummary.Compute(ws.Values, subset, ws.Subset, into);
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
    private bool KeepEnoughArmsToFillTheRound(int round, TrialState state, double[] expectedLoss, bool[] dropped)
    {
        var candidates = Enumerable.Range(0, dropped.Length).Where(i => dropped[i])
            .OrderBy(i => expectedLoss[i]).ThenBy(i => i).ToList();
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

    private RoundPlan BuildPlan(TrialState state, int round, PlanWorkspace ws, int[,] table, IReadOnlyList<PlotAssignment> assignments)
    {
        var design = _design;
        var summary = ws.Summary;
        var armPlans = new List<ArmPlan>();
        for (var i = 0; i < design.Arms.Count; i++)
        {
            var arm = design.Arms[i];
            var posterior = ws.Posteriors[i];
            var interval = CredibleInterval.EqualTailed(posterior, 0.95);
            armPlans.Add(new ArmPlan(i, arm.Code, arm.Label, i == design.Control, StatusOf(i, round, ws.Dropped, ws.Constraints!),
                ws.Totals[i], ws.Shares[i], summary.ProbabilityBest[i], posterior.Mean, interval.Lower, interval.Upper,
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
