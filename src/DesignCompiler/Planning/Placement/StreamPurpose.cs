namespace DesignCompiler.Planning.Placement;

/// <summary>
/// Tags that keep the random streams of different decisions apart (the first component of
/// every <see cref="Randomness.StreamSeed.Derive"/> call). Values are fixed forever: changing
/// one would change every sheet made from an existing design and seed.
/// </summary>
public static class StreamPurpose
{
    /// <summary>Which plot of a block gets which arm: stream (seed, 1, round, block).</summary>
    public const ulong Placement = 1;

    /// <summary>Outcomes and true values of one simulated trial: stream (seed, 2, replication).</summary>
    public const ulong Simulation = 2;

    /// <summary>The uniform number of randomized rounding in round r: stream (seed, 3, round, 0), its first double.</summary>
    public const ulong Rounding = 3;
}
