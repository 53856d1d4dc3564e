using System.Text;
using DesignCompiler.Planning.Placement;
using DesignCompiler.Randomness;

namespace DesignCompiler.Simulation.Running;

/// <summary>
/// The random streams of one simulated trial. Every replication has its own streams, derived
/// from the simulation seed and the replication's number alone, so results never depend on
/// how many threads ran or which shard ran which replication:
/// <code>
/// true values of replication i:      StreamSeed.Derive(seed, 2, i, scenarioKey, 0)
/// outcomes of arm CODE in it:         StreamSeed.Derive(seed, 2, i, scenarioKey, armKey(CODE))
/// season, interaction, block shifts:  StreamSeed.Derive(seed, 2, i, scenarioKey, key("#field"))
/// lost plots of arm CODE:             StreamSeed.Derive(seed, 2, i, scenarioKey, key("#missing:" + CODE))
/// scenarioKey, armKey = FNV-1a 64-bit hash of the UTF-8 name or code (0 becomes 1)
/// </code>
/// An arm code cannot contain '#', so the field-effect keys never equal an arm's.
/// Keys come from names rather than positions so that two designs compared with common random
/// numbers draw the same true values for a scenario of the same name, and the n-th plot of an
/// arm with the same code gets the same outcome in both, however the designs order them.
/// </summary>
public static class SimulationStreams
{
    public static Xoshiro256StarStar TrueValues(ulong seed, long replication, ulong scenarioKey) =>
        new(StreamSeed.Derive(seed, StreamPurpose.Simulation, (ulong)replication, scenarioKey, 0));

    public static Xoshiro256StarStar Outcomes(ulong seed, long replication, ulong scenarioKey, ulong armKey) =>
        new(StreamSeed.Derive(seed, StreamPurpose.Simulation, (ulong)replication, scenarioKey, armKey));

    /// <summary>The stream of a scenario's season, interaction and block shifts.</summary>
    public static Xoshiro256StarStar Field(ulong seed, long replication, ulong scenarioKey) =>
        new(StreamSeed.Derive(seed, StreamPurpose.Simulation, (ulong)replication, scenarioKey, Key("#field")));

    /// <summary>The stream deciding which of an arm's plots are lost before harvest.</summary>
    public static Xoshiro256StarStar Missing(ulong seed, long replication, ulong scenarioKey, string armCode) =>
        new(StreamSeed.Derive(seed, StreamPurpose.Simulation, (ulong)replication, scenarioKey, Key("#missing:" + armCode)));

    /// <summary>
    /// FNV-1a over the UTF-8 bytes (offset basis 14695981039346656037, prime 1099511628211;
    /// Fowler, Noll and Vo, from memory). 0 is kept for the true-value stream, so it maps to 1.
    /// </summary>
    public static ulong Key(string name)
    {
        var hash = 14695981039346656037UL;
        foreach (var b in Encoding.UTF8.GetBytes(name))
        {
            hash ^= b;
            hash = unchecked(hash * 1099511628211UL);
        }
        return hash == 0 ? 1 : hash;
    }
}
