namespace DesignCompiler.Planning;

/// <summary>
/// What the planner knows before a round: the statistics of every recorded plot per arm,
/// plots issued per arm so far (for stock), which arms are dropped, and how many rounds
/// have results. The simulator keeps one per simulated trial and updates it in place; the
/// compiler builds one from recorded data.
/// </summary>
public sealed class TrialState
{
    public TrialState(int arms)
    {
        Statistics = new ArmStatistics[arms];
        PlotsIssued = new int[arms];
        Dropped = new bool[arms];
    }

    /// <summary>
    /// The arm on every plot in each issued round, oldest first; plots in design order (block by
    /// block, plot by plot). Rotation rules read it.
    /// </summary>
    public List<int[]> History { get; } = [];

    public ArmStatistics[] Statistics { get; }
    public int[] PlotsIssued { get; }
    public bool[] Dropped { get; }
    public int RoundsCompleted { get; set; }

    /// <summary>Every recorded plot with its block and round, oldest first; models that adjust for block and round read it.</summary>
    public List<PlotObservation> Observations { get; } = [];

    public int PlotsRecorded => Statistics.Sum(s => s.Count);

    /// <summary>Adds one recorded plot's outcome to its arm; block is the design-order index, round is 1-based.</summary>
    public void Record(int arm, double value, int block, int round)
    {
        Statistics[arm] = Statistics[arm].Add(value);
        Observations.Add(new PlotObservation(arm, block, round, value));
    }

    /// <summary>Adds a plot of the round now being recorded, in the first block (single-block designs and tests).</summary>
    public void Record(int arm, double value) => Record(arm, value, 0, RoundsCompleted + 1);

    /// <summary>Takes an issued plan into account: its plots count against each arm's stock, and arms it dropped stay dropped.</summary>
    public void Issue(RoundPlan plan)
    {
        foreach (var arm in plan.Arms)
        {
            PlotsIssued[arm.Index] += arm.Plots;
            // An arm a drop rule removed may come back when the round could not be sown without it.
            Dropped[arm.Index] = arm.Status == ArmStatus.Dropped;
        }
        History.Add(plan.Assignments.Select(a => a.Arm).ToArray());
    }

    /// <summary>
    /// The same from a workspace's decision: plots per arm, which arms stay dropped, and the arm on every
    /// plot. The history arrays of earlier trials are reused, so a simulated round allocates nothing.
    /// </summary>
    public void Issue(ReadOnlySpan<int> plotsPerArm, ReadOnlySpan<bool> dropped, ReadOnlySpan<int> armOfPlot)
    {
        for (var i = 0; i < PlotsIssued.Length; i++)
        {
            PlotsIssued[i] += plotsPerArm[i];
            Dropped[i] = dropped[i];
        }
        var round = History.Count;
        if (round == _spareHistory.Count || _spareHistory[round].Length != armOfPlot.Length) SpareHistory(round, armOfPlot.Length);
        armOfPlot.CopyTo(_spareHistory[round]);
        History.Add(_spareHistory[round]);
    }

    // History arrays kept across Reset, one per round, for the simulator's trials.
    private readonly List<int[]> _spareHistory = [];

    private void SpareHistory(int round, int plots)
    {
        if (round == _spareHistory.Count) _spareHistory.Add(new int[plots]);
        else _spareHistory[round] = new int[plots];
    }

    public void Reset()
    {
        Array.Clear(Statistics);
        Array.Clear(PlotsIssued);
        Array.Clear(Dropped);
        History.Clear();
        Observations.Clear();
        RoundsCompleted = 0;
    }
}

/// <summary>One recorded plot: arm and block in design order, round from 1, the value as recorded.</summary>
public readonly record struct PlotObservation(int Arm, int Block, int Round, double Value);
