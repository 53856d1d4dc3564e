using DesignCompiler.Binding;
using DesignCompiler.Numerics;
using DesignCompiler.Planning.Allocation;
using DesignCompiler.Planning.Families;
using DesignCompiler.Planning.Limits;

namespace DesignCompiler.Planning;

/// <summary>
/// Everything <see cref="RoundPlanner.Decide"/> works in and decides, in buffers that live as long as the
/// workspace: a simulator keeps one per thread and plans millions of rounds without allocating. What it
/// holds after a call is that round's decision, valid until the next call. Not thread-safe.
/// </summary>
public sealed class PlanWorkspace
{
    private readonly ArmStatistics[] _cachedStatistics;

    public PlanWorkspace(CheckedDesign design)
    {
        var arms = design.Arms.Count;
        var blocks = design.Blocks.Count;
        Design = design;
        PlotsPerRound = design.PlotsPerRound;
        Posteriors = new IMarginal[arms];
        Values = new IMarginal[arms];
        _cachedStatistics = new ArmStatistics[arms];
        Dropped = new bool[arms];
        NewlyDropped = new bool[arms];
        InTrial = new int[arms];
        Sown = new int[arms];
        Summary = new SummaryBuffers(arms);
        AllocationSummary = new SummaryBuffers(arms);
        Shares = new double[arms];
        Totals = new int[arms];
        BlockPlots = design.Blocks.Select(b => b.Plots).ToArray();
        CellMinimum = new int[arms * blocks];
        CellMaximum = new int[arms * blocks];
        Table = new int[arms * blocks];
        ArmOfPlot = new int[PlotsPerRound];
        Subset = new MarginalSubset(arms);
    }

    public CheckedDesign Design { get; }

    public int PlotsPerRound { get; }

    /// <summary>Each arm's posterior of its mean outcome, and of its value (scale·θ − cost) that arms are ranked by.</summary>
    public IMarginal[] Posteriors { get; }

    public IMarginal[] Values { get; }

    public bool[] Dropped { get; }

    public bool[] NewlyDropped { get; }

    /// <summary>P(best) and expected loss among the arms in the trial: what the sheet shows and the rules read.</summary>
    public SummaryBuffers Summary { get; }

    /// <summary>The same among the arms that may be sown this round, which the policy shares out.</summary>
    public SummaryBuffers AllocationSummary { get; }

    public double[] Shares { get; }

    /// <summary>Plots per arm this round.</summary>
    public int[] Totals { get; }

    /// <summary>Plots per arm and block, row-major: index arm · blocks + block.</summary>
    public int[] Table { get; }

    /// <summary>The arm on every plot this round, block by block, plot by plot.</summary>
    public int[] ArmOfPlot { get; }

    public RoundConstraints? Constraints { get; internal set; }

    public string? StopReason { get; internal set; }

    internal int[] InTrial { get; }
    internal int InTrialCount { get; set; }
    internal int[] Sown { get; }
    internal int SownCount { get; set; }
    internal int[] BlockPlots { get; }
    internal int[] CellMinimum { get; }
    internal int[] CellMaximum { get; }
    internal MarginalSubset Subset { get; }
    internal ControlledRoundingWorkspace Rounding { get; } = new();
    internal RoundFailure Failure { get; set; }

    /// <summary>With an adjusted model, the arms' values jointly (set each round); null for independent arms.</summary>
    internal Joint? Joint { get; set; }
    internal ApportionmentStatus Apportionment { get; set; }
    internal ControlledRoundingStatus TableStatus { get; set; }
    internal string? PlacementProblem { get; set; }

    /// <summary>Whether the arm's posterior is already the one for these statistics (its data have not changed).</summary>
    internal bool HasPosterior(int arm, ArmStatistics statistics) => Posteriors[arm] is not null && _cachedStatistics[arm] == statistics;

    /// <summary>
    /// Brings an arm's posterior up to date with its statistics: a beta posterior this workspace made is
    /// re-targeted in place (its value wrapper keeps pointing at it), anything else is made anew.
    /// </summary>
    internal void UpdatePosterior(int arm, IOutcomeModel model, PriorSpec prior, double scale, double shift, ArmStatistics statistics)
    {
        if (HasPosterior(arm, statistics)) return;
        if (model is BetaBinomialModel beta && Posteriors[arm] is BetaMarginal own)
        {
            var (a, b) = beta.PosteriorParameters(prior, statistics);
            own.Retarget(a, b);
            _cachedStatistics[arm] = statistics;
            return;
        }
        SetPosterior(arm, model.Posterior(prior, statistics), scale, shift, statistics);
    }

    /// <summary>Keeps an arm's posterior and value; marginals are immutable, so a later round may share them.</summary>
    internal void SetPosterior(int arm, IMarginal posterior, double scale, double shift, ArmStatistics statistics)
    {
        Posteriors[arm] = posterior;
        Values[arm] = new AffineMarginal(posterior, scale, shift);
        _cachedStatistics[arm] = statistics;
    }

    /// <summary>Per-arm P(best) and expected loss within a subset of the arms, with the error bound and the leader.</summary>
    public sealed class SummaryBuffers(int arms)
    {
        public double[] ProbabilityBest { get; } = new double[arms];
        public double[] ExpectedLoss { get; } = new double[arms];
        public double ErrorBound { get; internal set; }
        public int Leader { get; internal set; }
    }
}

/// <summary>Why <see cref="RoundPlanner.Decide"/> issued no plan, when it did not.</summary>
internal enum RoundFailure { None, RoundOutOfRange, Apportionment, Table, Placement }
