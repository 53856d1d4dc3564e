using System.Numerics;

namespace DesignCompiler.Randomness;

/// <summary>
/// The xoshiro256** generator (Blackman and Vigna 2018, "Scrambled linear pseudorandom number
/// generators", ACM TOMS 47(4), 2021): 256 bits of state, period 2^256 − 1, output
/// <c>rotl(s1 * 5, 7) * 9</c>.
/// </summary>
/// <remarks>
/// A mutable struct so that a Monte Carlo loop can keep it in a local and pass it by
/// <c>ref</c> without allocating. Copying the value forks the stream: both copies then produce
/// the same numbers, so pass it by <c>ref</c> whenever the caller must see the advance.
/// The same seed gives the same numbers on every platform and runtime: only integer
/// arithmetic and exactly representable floating-point conversions are used.
/// </remarks>
public struct Xoshiro256StarStar
{
    private ulong _s0;
    private ulong _s1;
    private ulong _s2;
    private ulong _s3;

    /// <summary>
    /// Seeds the state with the first four outputs of <see cref="SplitMix64"/> started at
    /// <paramref name="seed"/>, as the generator's authors recommend. Four consecutive SplitMix64
    /// outputs are never all zero (its output function is a bijection of a strictly advancing
    /// counter), so every seed yields a valid state.
    /// </summary>
    public Xoshiro256StarStar(ulong seed)
    {
        var expander = new SplitMix64(seed);
        _s0 = expander.NextUInt64();
        _s1 = expander.NextUInt64();
        _s2 = expander.NextUInt64();
        _s3 = expander.NextUInt64();
    }

    /// <summary>
    /// Starts from an explicit state, for published test vectors and for resuming a saved
    /// stream. The all-zero state is the generator's one fixed point and is refused.
    /// </summary>
    public static Xoshiro256StarStar FromState(ulong s0, ulong s1, ulong s2, ulong s3)
    {
        if ((s0 | s1 | s2 | s3) == 0)
        {
            throw new ArgumentException("The all-zero state is not a valid xoshiro256** state.");
        }

        var generator = default(Xoshiro256StarStar);
        generator._s0 = s0;
        generator._s1 = s1;
        generator._s2 = s2;
        generator._s3 = s3;
        return generator;
    }

    /// <summary>A stream seeded from <see cref="StreamSeed.Derive"/>.</summary>
    public static Xoshiro256StarStar ForStream(ulong seed, ulong a, ulong b = 0, ulong c = 0, ulong d = 0)
        => new(StreamSeed.Derive(seed, a, b, c, d));

    public ulong NextUInt64()
    {
        unchecked
        {
            ulong result = BitOperations.RotateLeft(_s1 * 5, 7) * 9;
            ulong t = _s1 << 17;
            _s2 ^= _s0;
            _s3 ^= _s1;
            _s1 ^= _s2;
            _s0 ^= _s3;
            _s2 ^= t;
            _s3 = BitOperations.RotateLeft(_s3, 45);
            return result;
        }
    }

    /// <summary>
    /// A double in [0, 1) on the grid k / 2^53: the top 53 bits of one output, so every value
    /// is exactly representable and the mapping is identical on every platform.
    /// </summary>
    public double NextDouble() => (NextUInt64() >> 11) * (1.0 / (1UL << 53));

    /// <summary>
    /// A uniform integer in [0, <paramref name="exclusiveBound"/>) without modulo bias:
    /// Lemire's multiply-shift with rejection (Lemire 2019, "Fast random integer generation in
    /// an interval", ACM TOMACS 29(1)), fed with the upper 32 bits of each 64-bit output.
    /// The rejection loop runs again with probability below bound / 2^32.
    /// </summary>
    public int NextInt(int exclusiveBound)
    {
        if (exclusiveBound <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(exclusiveBound), exclusiveBound, "The bound must be positive.");
        }

        uint bound = (uint)exclusiveBound;
        ulong product = (NextUInt64() >> 32) * bound;
        uint low = (uint)product;
        if (low < bound)
        {
            // 2^32 mod bound: the number of 32-bit inputs that would make low values too likely.
            uint threshold = unchecked(0u - bound) % bound;
            while (low < threshold)
            {
                product = (NextUInt64() >> 32) * bound;
                low = (uint)product;
            }
        }

        return (int)(product >> 32);
    }

    /// <summary>
    /// True with probability <paramref name="p"/> (to the 2^-53 resolution of
    /// <see cref="NextDouble"/>). Values at or below 0 always give false and values at or
    /// above 1 always give true, so a probability that rounding pushed a hair outside [0, 1]
    /// still behaves; NaN is a caller bug and throws.
    /// </summary>
    public bool NextBernoulli(double p)
    {
        if (double.IsNaN(p))
        {
            throw new ArgumentOutOfRangeException(nameof(p), p, "The probability is NaN.");
        }

        return NextDouble() < p;
    }
}
