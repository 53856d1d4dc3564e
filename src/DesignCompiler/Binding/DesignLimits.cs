namespace DesignCompiler.Binding;

/// <summary>
/// Sizes the tool accepts. They are far above any field trial's, and low enough that no
/// design can make the planner or the simulator run out of memory or time.
/// </summary>
public static class DesignLimits
{
    public const int MaxArms = 1000;
    public const int MaxRounds = 100;
    public const int MaxBlocks = 1000;
    public const int MaxPlotsPerBlock = 100_000;
    public const int MaxPlotsPerRound = 100_000;
    public const int MaxBinomialTrials = 1_000_000;

    /// <summary>
    /// The largest design file read. A design at every limit above (1000 arms with labels, priors and
    /// costs, 1000 blocks with layouts, a limit line per arm, a dozen scenarios naming every arm) is
    /// under 400 KB; the checker reads a few hundred kilobytes a second on a busy two-core machine, so
    /// a file at this limit is checked in seconds, while a larger one is almost surely the wrong file.
    /// </summary>
    public const long MaxDesignFileBytes = 1024 * 1024;
}
