namespace DesignCompiler.Simulation.Running;

/// <summary>How a simulated trial ended.</summary>
public enum TrialEnding
{
    /// <summary>Every round was sown and recorded without a stop rule firing.</summary>
    RanAllRounds,

    /// <summary>A stop rule fired: the trial declared a winner before its last round.</summary>
    Stopped,

    /// <summary>The planner could not fill a round within the limits.</summary>
    Infeasible,
}

/// <summary>
/// What one simulated trial produced, in buffers reused from one replication to the next so
/// the hot loop does not allocate per trial. Rounds are zero-based here (index r is round r+1).
/// </summary>
public sealed class ReplicationRecord
{
    public ReplicationRecord(int arms, int rounds)
    {
        Arms = arms;
        Rounds = rounds;
        TrueMean = new double[arms];
        NoiseSd = new double[arms];
        Value = new double[arms];
        Plots = new int[arms, rounds];
        RoundRegret = new double[rounds];
        LeaderAfterRound = new int[rounds];
        FinalProbabilityBest = new double[arms];
        Observations = new int[arms];
        SampleMean = new double[arms];
    }

    public int Arms { get; }
    public int Rounds { get; }

    public long Replication { get; internal set; }
    public double[] TrueMean { get; }
    public double[] NoiseSd { get; }

    /// <summary>True values in ranking units (scale·θ − cost): larger is better.</summary>
    public double[] Value { get; }

    public double BestValue { get; internal set; }

    /// <summary>Plots sown per arm and round; 0 for rounds after the trial ended.</summary>
    public int[,] Plots { get; }

    /// <summary>Σ over the round's plots of (best value − the plot's arm's value).</summary>
    public double[] RoundRegret { get; }

    public int NonBestPlots { get; internal set; }
    public int PlotsSown { get; internal set; }
    public int RoundsRun { get; internal set; }
    public TrialEnding Ending { get; internal set; }

    /// <summary>The planner's message when a round could not be filled.</summary>
    public string? InfeasibleMessage { get; internal set; }

    /// <summary>
    /// The arm with the highest posterior probability of being best if the trial ended after
    /// round r (the leader); after a stop, the leader at the stop for every later round.
    /// </summary>
    public int[] LeaderAfterRound { get; }

    /// <summary>P(best) of every arm after the last recorded round (0 for dropped arms).</summary>
    public double[] FinalProbabilityBest { get; }

    public int[] Observations { get; }

    /// <summary>The naive estimate of θ from the recorded plots: their mean (for binomial, divided by N).</summary>
    public double[] SampleMean { get; }

    public int FinalLeader => LeaderAfterRound[Rounds - 1];

    public bool IsBest(int arm) => Value[arm] == BestValue;

    public bool IsWithin(int arm, double margin) => Value[arm] >= BestValue - margin;

    public double TotalRegret
    {
        get
        {
            var total = 0.0;
            foreach (var r in RoundRegret) total += r;
            return total;
        }
    }

    internal void Clear()
    {
        Array.Clear(Plots);
        Array.Clear(RoundRegret);
        Array.Clear(LeaderAfterRound);
        Array.Clear(FinalProbabilityBest);
        Array.Clear(Observations);
        Array.Clear(SampleMean);
        NonBestPlots = 0;
        PlotsSown = 0;
        RoundsRun = 0;
        Ending = TrialEnding.RanAllRounds;
        InfeasibleMessage = null;
    }
}
