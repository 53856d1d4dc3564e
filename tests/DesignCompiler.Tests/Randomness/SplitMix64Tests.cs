using DesignCompiler.Randomness;

namespace DesignCompiler.Tests.Randomness;

/// <summary>
/// SplitMix64: Steele, Lea and Flood (2014), "Fast splittable pseudorandom number generators".
/// Expected outputs from reference/rng_reference.py, an independent implementation of the paper.
/// </summary>
public class SplitMix64Tests
{
    [Fact]
    public void SeedZeroMatchesReference()
    {
        // The first value, 0xE220A8397B1DCDAF, is also the widely quoted first SplitMix64 output
        // for seed 0 (from memory).
        AssertOutputs(0, 0xE220A8397B1DCDAFUL, 0x6E789E6AA1B965F4UL, 0x06C45D188009454FUL, 0xF88BB8A8724C81ECUL, 0x1B39896A51A8749BUL);
    }

    [Fact]
    public void Seed1234567MatchesReference()
    {
        // 6457827717110365317 = 0x599ED017FB08FC85 is the published first output for seed 1234567
        // in the Rosetta Code task "Pseudo-random numbers/Splitmix64" (from memory).
        AssertOutputs(1234567, 0x599ED017FB08FC85UL, 0x2C73F08458540FA5UL, 0x883EBCE5A3F27C77UL, 0x3FBEF740E9177B3FUL, 0xE3B8346708CB5ECDUL);
    }

    [Fact]
    public void MaximumSeedWrapsAround()
    {
        AssertOutputs(ulong.MaxValue, 0xE4D971771B652C20UL, 0xE99FF867DBF682C9UL, 0x382FF84CB27281E9UL, 0x6D1DB36CCBA982D2UL, 0xB4A0472E578069AEUL);
    }

    private static void AssertOutputs(ulong seed, params ulong[] expected)
    {
        var generator = new SplitMix64(seed);
        foreach (ulong value in expected)
        {
            Assert.Equal(value, generator.NextUInt64());
        }
    }
}
