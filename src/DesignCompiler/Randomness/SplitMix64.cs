namespace DesignCompiler.Randomness;

/// <summary>
/// SplitMix64 (Steele, Lea and Flood 2014, "Fast splittable pseudorandom number generators",
/// OOPSLA 2014): a Weyl sequence with increment <see cref="Gamma"/> passed through the
/// <see cref="Mix"/> finaliser. Used here to expand one 64-bit seed into the 256-bit state of
/// <see cref="Xoshiro256StarStar"/> and to mix the components of a <see cref="StreamSeed"/>.
/// </summary>
/// <remarks>
/// A mutable struct on purpose: callers keep it in a local or pass it by <c>ref</c>, so
/// drawing never allocates. Copying the struct copies the stream position.
/// </remarks>
public struct SplitMix64
{
    /// <summary>The odd Weyl increment, 2^64 divided by the golden ratio.</summary>
    public const ulong Gamma = 0x9E3779B97F4A7C15UL;

    private ulong _state;

    public SplitMix64(ulong seed) => _state = seed;

    /// <summary>Advances the Weyl state by <see cref="Gamma"/> and returns its mix.</summary>
    public ulong NextUInt64()
    {
        _state = unchecked(_state + Gamma);
        return Mix(_state);
    }

    /// <summary>
    /// The SplitMix64 output function (Stafford's "variant 13"): a bijection of the 64-bit
    /// integers, so distinct inputs always give distinct outputs.
    /// <c>z = (z ^ (z &gt;&gt; 30)) * 0xBF58476D1CE4E5B9; z = (z ^ (z &gt;&gt; 27)) * 0x94D049BB133111EB;
    /// return z ^ (z &gt;&gt; 31);</c> with all arithmetic modulo 2^64.
    /// </summary>
    public static ulong Mix(ulong z)
    {
        unchecked
        {
            z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
            z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
            return z ^ (z >> 31);
        }
    }
}
