namespace DesignCompiler.Randomness;

/// <summary>
/// Derives the seed of one independent random stream from the design seed and the
/// coordinates of the decision that stream serves (a purpose tag, round, block, replication).
/// </summary>
/// <remarks>
/// Giving every (purpose, round, block, ...) its own stream means that adding a block, or
/// drawing one more number for one purpose, never shifts the numbers used anywhere else, and
/// a statistician can re-create any single placement without replaying the whole trial.
/// <para>
/// The exact formula, so it can be reproduced in any language with unsigned 64-bit integers
/// (all arithmetic modulo 2^64, <c>^</c> is exclusive or, <c>&gt;&gt;</c> a logical shift):
/// </para>
/// <code>
/// GAMMA  = 0x9E3779B97F4A7C15
/// mix(z) : z = (z ^ (z &gt;&gt; 30)) * 0xBF58476D1CE4E5B9
///          z = (z ^ (z &gt;&gt; 27)) * 0x94D049BB133111EB
///          return z ^ (z &gt;&gt; 31)
/// h = mix(seed + GAMMA)
/// h = mix((h ^ a) + GAMMA)
/// h = mix((h ^ b) + GAMMA)
/// h = mix((h ^ c) + GAMMA)
/// h = mix((h ^ d) + GAMMA)
/// return h
/// </code>
/// <para>
/// The stream itself is then <c>new Xoshiro256StarStar(h)</c>, whose four state words are the
/// first four SplitMix64 outputs from <c>h</c>. All four components are always absorbed
/// (omitted ones are 0), so the formula never depends on how many arguments a caller wrote.
/// Each step is a bijection of its component for a fixed prefix, so two derivations that share
/// every earlier component but differ in one later component never collide.
/// A Python version for checking lives in tests/DesignCompiler.Tests/Randomness/reference/rng_reference.py.
/// </para>
/// </remarks>
public static class StreamSeed
{
    public static ulong Derive(ulong seed, ulong a, ulong b = 0, ulong c = 0, ulong d = 0)
    {
        unchecked
        {
            ulong h = SplitMix64.Mix(seed + SplitMix64.Gamma);
            h = SplitMix64.Mix((h ^ a) + SplitMix64.Gamma);
            h = SplitMix64.Mix((h ^ b) + SplitMix64.Gamma);
            h = SplitMix64.Mix((h ^ c) + SplitMix64.Gamma);
            h = SplitMix64.Mix((h ^ d) + SplitMix64.Gamma);
            return h;
        }
    }
}
