namespace DesignCompiler.Simulation;

/// <summary>
/// How to simulate: replications per scenario, worker threads (never changes a result), the
/// seed of the simulation streams, the margin of the "within margin" figure (value units) with
/// its rule in words, and which shard of the replications to run.
/// </summary>
public sealed record SimulationSettings(long Replications, int Threads, ulong Seed, double Margin, string MarginRule, Shard Shard)
{
    /// <summary>
    /// Enough for a standard error of at most 0.5/√2000 ≈ 0.011 on every probability, and about
    /// 2.2 % of the spread of any other figure (the standard error of a mean, common practice).
    /// </summary>
    public const long DefaultReplications = 2000;

    /// <summary>Replications per unit of work: small, so progress and Ctrl-C respond quickly; it never changes a result.</summary>
    public const int ChunkSize = 16;
}

/// <summary>
/// Shard k of n runs replications i with i ≡ k − 1 (mod n). <see cref="Whole"/> is 1 of 1.
/// Because every replication has its own random streams and the summaries merge exactly,
/// the merged shards give the same report as one run.
/// </summary>
public readonly record struct Shard(int Index, int Count)
{
    public static Shard Whole { get; } = new(1, 1);

    public bool IsWhole => Count == 1;

    /// <summary>How many of replications 0..total−1 fall in this shard.</summary>
    public long Size(long total) => total <= Index - 1 ? 0 : (total - Index) / Count + 1;

    /// <summary>The replication number of the shard's j-th replication.</summary>
    public long Replication(long j) => Index - 1 + j * Count;

    /// <summary>Reads "k/n" with 1 ≤ k ≤ n; null when the text is not of that form.</summary>
    public static Shard? Parse(string text)
    {
        var parts = text.Split('/');
        if (parts.Length != 2) return null;
        if (!int.TryParse(parts[0], System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var k)) return null;
        if (!int.TryParse(parts[1], System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var n)) return null;
        return k >= 1 && n >= 1 && k <= n ? new Shard(k, n) : null;
    }

    public override string ToString() => FormattableString.Invariant($"{Index}/{Count}");
}
