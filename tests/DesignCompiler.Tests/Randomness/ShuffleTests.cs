using DesignCompiler.Randomness;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DesignCompiler.Tests.Randomness;

/// <summary>
/// Fisher–Yates (Durstenfeld 1964; Knuth, TAOCP vol. 2, §3.4.2, Algorithm P): every order of
/// n items equally likely. Chi-square over the 24 orders of 4 items (common practice).
/// </summary>
public class ShuffleTests
{
    [Fact]
    public void AllTwentyFourOrdersOfFourAreEquallyLikely()
    {
        var rng = new Xoshiro256StarStar(1964);
        var counts = new long[24];
        Span<int> items = stackalloc int[4];
        for (int draw = 0; draw < 240_000; draw++)
        {
            for (int i = 0; i < 4; i++)
            {
                items[i] = i;
            }

            Shuffle.FisherYates(items, ref rng);
            counts[PermutationRank(items)]++;
        }

        Assert.All(counts, count => Assert.True(count > 0));
        Assert.InRange(ChiSquare.UniformPValue(counts), 0.001, 0.999);
    }

    [Fact]
    public void TheTestWouldCatchTheNaiveSwapEveryPositionShuffle()
    {
        // Power check: swapping each position with any of the n positions gives 4^4 = 256 equally
        // likely paths onto 24 orders, which cannot be uniform (Knuth, TAOCP vol. 2, §3.4.2
        // exercises; common practice).
        var rng = new Xoshiro256StarStar(1964);
        var counts = new long[24];
        Span<int> items = stackalloc int[4];
        for (int draw = 0; draw < 240_000; draw++)
        {
            for (int i = 0; i < 4; i++)
            {
                items[i] = i;
            }

            for (int i = 0; i < 4; i++)
            {
                int k = rng.NextInt(4);
                (items[i], items[k]) = (items[k], items[i]);
            }

            counts[PermutationRank(items)]++;
        }

        Assert.True(ChiSquare.UniformPValue(counts) < 1e-6);
    }

    [Theory]
    [InlineData(2024UL, new[] { 2, 3, 8, 5, 6, 4, 1, 9, 7, 0 })]
    [InlineData(1UL, new[] { 3, 6, 1, 5, 0, 9, 2, 8, 4, 7 })]
    public void MatchesReferenceImplementation(ulong seed, int[] expected)
    {
        // reference/rng_reference.py fisher_yates: j from n−1 down to 1, swap with NextInt(j + 1).
        var rng = new Xoshiro256StarStar(seed);
        int[] items = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9];
        Shuffle.FisherYates<int>(items, ref rng);
        Assert.Equal(expected, items);
    }

    [Fact]
    public void EmptyAndSingleSpansDrawNothing()
    {
        var rng = new Xoshiro256StarStar(3);
        var untouched = rng;
        Shuffle.FisherYates(Span<int>.Empty, ref rng);
        Shuffle.FisherYates<int>(new[] { 7 }, ref rng);
        Assert.Equal(untouched.NextUInt64(), rng.NextUInt64());
    }

    [Property(MaxTest = 200)]
    public Property ShuffleIsAPermutation() =>
        Prop.ForAll(
            Arb.From(Gen.ArrayOf(Gen.Choose(-1000, 1000))),
            Arb.From(Gen.Choose(0, int.MaxValue)),
            (values, seed) =>
            {
                var rng = new Xoshiro256StarStar((ulong)seed);
                int[] shuffled = (int[])values.Clone();
                Shuffle.FisherYates<int>(shuffled, ref rng);
                Array.Sort(values);
                Array.Sort(shuffled);
                return values.AsSpan().SequenceEqual(shuffled);
            });

    /// <summary>Lehmer-code rank of a permutation of 0..3, in [0, 24).</summary>
    private static int PermutationRank(ReadOnlySpan<int> permutation)
    {
        int rank = 0;
        for (int i = 0; i < permutation.Length; i++)
        {
            int smallerLater = 0;
            for (int j = i + 1; j < permutation.Length; j++)
            {
                if (permutation[j] < permutation[i])
                {
                    smallerLater++;
                }
            }

            rank = rank * (permutation.Length - i) + smallerLater;
        }

        return rank;
    }
}
