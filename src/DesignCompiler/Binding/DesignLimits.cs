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
}
