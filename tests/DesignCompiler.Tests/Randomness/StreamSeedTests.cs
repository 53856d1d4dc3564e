using DesignCompiler.Randomness;

namespace DesignCompiler.Tests.Randomness;

/// <summary>
/// StreamSeed.Derive against reference/rng_reference.py, which re-implements the formula written
/// out in StreamSeed's doc comment (SplitMix64 mixing, Steele, Lea and Flood 2014).
/// </summary>
public class StreamSeedTests
{
    [Theory]
    [InlineData(0UL, 0UL, 0UL, 0UL, 0UL, 0x78AE5A9A6B5FD45EUL)]
    [InlineData(42UL, 1UL, 0UL, 0UL, 0UL, 0x797E279FB8AFEBA3UL)]
    [InlineData(42UL, 1UL, 2UL, 0UL, 0UL, 0x99A0B1929F07085AUL)]
    [InlineData(42UL, 1UL, 2UL, 3UL, 4UL, 0x4A90A635F990002DUL)]
    [InlineData(42UL, 2UL, 1UL, 0UL, 0UL, 0x8619A129634821AAUL)]
    [InlineData(ulong.MaxValue, 7UL, 0UL, 5UL, 0UL, 0x42039F4850A47767UL)]
    public void MatchesReference(ulong seed, ulong a, ulong b, ulong c, ulong d, ulong expected)
    {
        Assert.Equal(expected, StreamSeed.Derive(seed, a, b, c, d));
    }

    [Fact]
    public void OmittedComponentsAreZero()
    {
        Assert.Equal(StreamSeed.Derive(42, 1, 0, 0, 0), StreamSeed.Derive(42, 1));
        Assert.Equal(StreamSeed.Derive(42, 1, 2, 0, 0), StreamSeed.Derive(42, 1, 2));
    }

    [Fact]
    public void NearbyCoordinatesGiveDistinctSeeds()
    {
        var seen = new HashSet<ulong>();
        for (ulong purpose = 0; purpose < 4; purpose++)
        {
            for (ulong round = 0; round < 20; round++)
            {
                for (ulong block = 0; block < 20; block++)
                {
                    for (ulong replication = 0; replication < 10; replication++)
                    {
                        Assert.True(seen.Add(StreamSeed.Derive(2024, purpose, round, block, replication)));
                    }
                }
            }
        }
    }

    [Fact]
    public void ShuffleOnADerivedStreamMatchesReference()
    {
        // rng_reference.py: fisher_yates(range(10), Xoshiro256StarStar(seed=derive(42, 1, 2))).
        var rng = Xoshiro256StarStar.ForStream(42, 1, 2);
        int[] items = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9];
        Shuffle.FisherYates<int>(items, ref rng);
        Assert.Equal([6, 8, 2, 5, 7, 0, 4, 1, 3, 9], items);
    }
}
