using DesignCompiler.Binding;
using DesignCompiler.Numerics;
using DesignCompiler.Planning;
using DesignCompiler.Randomness;

namespace DesignCompiler.Simulation.Running;

/// <summary>
/// Runs one simulated trial through the real planner: for rounds 1..R it asks
/// <see cref="RoundPlanner.Plan"/> for the round, stops when the planner reports a stop rule
/// (or a round the limits cannot fill), draws an outcome for every plot the plan sows, and
/// records them before the next round, exactly as a trial manager would. Nothing about
/// policies, limits or placement is decided here. One runner per thread: it reuses its
/// trial state and streams.
/// </summary>
public sealed class ReplicationRunner
{
    private readonly RoundPlanner _planner;
    private readonly CheckedDesign _design;
    private readonly TrialState _state;
    private readonly Xoshiro256StarStar[] _armStreams;
    private readonly ulong[] _armKeys;
    private readonly int[] _inTrial;
    private readonly PlanWorkspace _workspace;
    private readonly PlanWorkspace _finalWorkspace;
    private readonly FieldShifts _shifts;
    private readonly int[] _blockOfPlot;

    public ReplicationRunner(RoundPlanner planner)
    {
        _planner = planner;
        _design = planner.Design;
        var arms = _design.Arms.Count;
        _state = new TrialState(arms);
        _armStreams = new Xoshiro256StarStar[arms];
        _armKeys = _design.Arms.Select(a => SimulationStreams.Key(a.Code)).ToArray();
        _inTrial = new int[arms];
        _workspace = new PlanWorkspace(_design);
        _finalWorkspace = new PlanWorkspace(_design);
        _shifts = new FieldShifts(_design);
        // Plots come in design order, block by block.
        _blockOfPlot = _design.Blocks.SelectMany((b, j) => Enumerable.Repeat(j, b.Plots)).ToArray();
    }

    public CheckedDesign Design => _design;

    /// <summary>What the last simulated trial recorded (read it before the next <see cref="Run"/>).</summary>
    public TrialState State => _state;

    public ReplicationRecord NewRecord() => new(_design.Arms.Count, _design.Rounds);

    public void Run(ScenarioWorld world, ulong seed, long replication, ReplicationRecord record)
    {
        record.Clear();
        record.Replication = replication;
        var arms = _design.Arms.Count;

        var truth = SimulationStreams.TrueValues(seed, replication, world.Key);
        world.Draw(ref truth, record.TrueMean, record.NoiseSd);
        var best = double.NegativeInfinity;
        for (var i = 0; i < arms; i++)
        {
            record.Value[i] = ScenarioWorld.ValueOf(_design, i, record.TrueMean[i]);
            best = Math.Max(best, record.Value[i]);
        }
        record.BestValue = best;
        for (var i = 0; i < arms; i++) _armStreams[i] = SimulationStreams.Outcomes(seed, replication, world.Key, _armKeys[i]);
        _shifts.BeginTrial(world.Effects, seed, replication, world.Key);

        _state.Reset();
        var workspace = _workspace;
        for (var round = 1; round <= _design.Rounds; round++)
        {
            if (!_planner.Decide(_state, round, workspace))
            {
                var result = _planner.ResultOf(_state, round, workspace);
                if (result.StopReason is not null) record.Ending = TrialEnding.Stopped;
                else
                {
                    record.Ending = TrialEnding.Infeasible;
                    record.InfeasibleMessage = result.Diagnostics.FirstOrDefault()?.Message;
                }
                break;
            }
            if (round > 1) record.LeaderAfterRound[round - 2] = LeaderOf(workspace.Summary.ProbabilityBest);
            _shifts.BeginRound();
            Sow(workspace.ArmOfPlot, round - 1, record);
            _state.Issue(workspace.Totals, workspace.Dropped, workspace.ArmOfPlot);
            _state.RoundsCompleted = round;
            record.RoundsRun = round;
        }

        FinalSelection(record);
        // θ of a binomial outcome is the success probability of one of the plot's N trials.
        var perTrial = _design.Outcome.Family == OutcomeFamily.Binomial ? _design.Outcome.Trials : 1;
        for (var i = 0; i < arms; i++)
        {
            record.Observations[i] = _state.Statistics[i].Count;
            record.SampleMean[i] = _state.Statistics[i].Mean / perTrial;
        }
    }

    private void Sow(int[] armOfPlot, int roundIndex, ReplicationRecord record)
    {
        var outcome = _design.Outcome;
        var regret = 0.0;
        // Once per round: whether the field departs from the scenario scans every arm's missing share.
        var shiftsActive = _shifts.Active;
        for (var k = 0; k < armOfPlot.Length; k++)
        {
            var arm = armOfPlot[k];
            var block = _blockOfPlot[k];
            record.Plots[arm, roundIndex]++;
            if (shiftsActive)
            {
                // The plot was sown (it counts against stock and regret) but may give no result.
                var lost = _shifts.IsLost(arm);
                var theta = _shifts.Theta(arm, block, record.TrueMean[arm]);
                if (outcome.Family == OutcomeFamily.Count) theta = _shifts.MixCount(arm, theta, ref _armStreams[arm]);
                var shifted = OutcomeDraw.Draw(outcome, ref _armStreams[arm], theta, record.NoiseSd[arm]);
                if (!lost) _state.Record(arm, shifted, block, roundIndex + 1);
            }
            else
            {
                var y = OutcomeDraw.Draw(outcome, ref _armStreams[arm], record.TrueMean[arm], record.NoiseSd[arm]);
                _state.Record(arm, y, block, roundIndex + 1);
            }
            regret += record.BestValue - record.Value[arm];
            if (!record.IsBest(arm)) record.NonBestPlots++;
        }
        record.RoundRegret[roundIndex] = regret;
        record.PlotsSown += armOfPlot.Length;
    }

    /// <summary>The planner's leader: highest P(best), the lowest index among ties (as <see cref="BestArmSummary.Leader"/>).</summary>
    private static int LeaderOf(double[] probabilityBest)
    {
        var leader = 0;
        for (var i = 1; i < probabilityBest.Length; i++)
            if (probabilityBest[i] > probabilityBest[leader]) leader = i;
        return leader;
    }

    /// <summary>
    /// The arm a trial manager would pick once the last round is recorded: the leader among the
    /// arms still in the trial, from the same posteriors and the same P(best) computation the
    /// planner uses. Rounds after a stop keep that selection.
    /// </summary>
    private void FinalSelection(ReplicationRecord record)
    {
        var arms = _design.Arms.Count;
        if (_design.Model.IsAdjusted)
        {
            // The adjusted model's joint posterior: through the planner's belief (allocates; the integration dominates).
            var inTrial = Enumerable.Range(0, arms).Where(i => !_state.Dropped[i]).ToList();
            var summary = _planner.Believe(_state).Summarize(inTrial);
            summary.ProbabilityBest.CopyTo(record.FinalProbabilityBest, 0);
            for (var r = Math.Max(record.RoundsRun - 1, 0); r < record.Rounds; r++) record.LeaderAfterRound[r] = summary.Leader;
            return;
        }
        var model = _planner.Model;
        var ws = _finalWorkspace;
        var count = 0;
        for (var i = 0; i < arms; i++)
        {
            var arm = _design.Arms[i];
            ws.UpdatePosterior(i, model, arm.Prior, _design.Valuation.Scale, -arm.Cost, _state.Statistics[i]);
            if (!_state.Dropped[i]) _inTrial[count++] = i;
        }
        BestArmSummary.Compute(ws.Values, _inTrial.AsSpan(0, count), ws.Subset, ws.Summary);
        ws.Summary.ProbabilityBest.CopyTo(record.FinalProbabilityBest, 0);
        for (var r = Math.Max(record.RoundsRun - 1, 0); r < record.Rounds; r++) record.LeaderAfterRound[r] = ws.Summary.Leader;
    }
}
