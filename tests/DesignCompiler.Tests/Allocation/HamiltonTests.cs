using DesignCompiler.Planning.Allocation;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DesignCompiler.Tests.Allocation;

/// <summary>
/// Hamilton's largest-remainder method against the published examples collected in
/// /work/shared/REFERENCES.md §8 (each result there recomputed in exact rational arithmetic).
/// </summary>
public class HamiltonTests
{
    [Fact]
    public void AlabamaParadoxToyExample()
    {
        // Balinski and Young (1982), ch. 5; toy sizes 6, 6, 2 from Wikipedia "Alabama paradox":
        // (4,4,2) with 10 seats, (5,5,1) with 11; C loses a seat when the house grows.
        Assert.Equal([4, 4, 2], Hamilton.Apportion([6, 6, 2], 10));
        Assert.Equal([5, 5, 1], Hamilton.Apportion([6, 6, 2], 11));
    }

    [Fact]
    public void AlabamaParadoxFourStateExample()
    {
        // electowiki / earlier Wikipedia revision of "Alabama paradox" (REFERENCES.md §8):
        // (183,124,14,2) at 323 seats, (184,125,13,2) at 324; the third state drops 14 → 13.
        Assert.Equal([183, 124, 14, 2], Hamilton.Apportion([5670, 3850, 420, 60], 323));
        Assert.Equal([184, 125, 13, 2], Hamilton.Apportion([5670, 3850, 420, 60], 324));
    }

    [Fact]
    public void SteinSimpleExample()
    {
        // J. D. Stein (2008), How Math Explains the World, pp. 228–229: shares .14, .23, .45, .18
        // and 37 seats give (5, 8, 17, 7).
        Assert.Equal([5, 8, 17, 7], Hamilton.Apportion([0.14, 0.23, 0.45, 0.18], 37));
    }

    [Fact]
    public void QuadratureNoiseDoesNotDecideATie()
    {
        // Three exactly equal shares, 10 seats: one leftover seat, a three-way tie, lowest index
        // wins. Noise of 1e-13 in either direction must not move it (the tie rule is this
        // project's documented rule, not a published one).
        Assert.Equal([4, 3, 3], Hamilton.Apportion([1.0 / 3, 1.0 / 3, 1.0 / 3], 10));
        Assert.Equal([4, 3, 3], Hamilton.Apportion([1.0 / 3 - 1e-13, 1.0 / 3, 1.0 / 3 + 1e-13], 10));
        Assert.Equal([4, 3, 3], Hamilton.Apportion([1.0 / 3 + 1e-13, 1.0 / 3 - 1e-13, 1.0 / 3], 10));
        Assert.Equal([4, 4, 3], Hamilton.Apportion([1.0 / 3 - 1e-13, 1.0 / 3, 1.0 / 3 + 1e-13], 11));
    }

    [Fact]
    public void DifferencesLargerThanTheToleranceStillCount()
    {
        // 1e-6 is far above the 1e-8 tie zone for 10 seats, so the larger remainder wins.
        Assert.Equal([3, 3, 4], Hamilton.Apportion([1.0 / 3 - 1e-6, 1.0 / 3, 1.0 / 3 + 1e-6], 10));
    }

    [Fact]
    public void EdgeCases()
    {
        Assert.Equal([0, 0], Hamilton.Apportion([0.0, 0.0], 0));
        Assert.Equal([0, 5], Hamilton.Apportion([0.0, 2.0], 5));
        Assert.Empty(Hamilton.Apportion([], 0));
        Assert.Throws<ArgumentException>(() => Hamilton.Apportion([0.0, 0.0], 3));
        Assert.Throws<ArgumentOutOfRangeException>(() => Hamilton.Apportion([1.0, -1.0], 3));
        Assert.Throws<ArgumentOutOfRangeException>(() => Hamilton.Apportion([1.0, double.NaN], 3));
        Assert.Throws<ArgumentOutOfRangeException>(() => Hamilton.Apportion([1.0], -1));
    }

    [Fact]
    public void SpanOverloadMatchesArrayOverload()
    {
        Span<int> counts = stackalloc int[4];
        Hamilton.Apportion([5670, 3850, 420, 60], 324, counts);
        Assert.Equal([184, 125, 13, 2], counts.ToArray());
    }

    [Fact]
    public void ManyArmsUseHeapScratch()
    {
        // 300 equal arms, 1000 seats: quota 3.333…, the 100 leftover seats go to arms 0..99.
        var shares = Enumerable.Repeat(1.0, 300).ToArray();
        int[] counts = Hamilton.Apportion(shares, 1000);
        Assert.Equal(1000, counts.Sum());
        Assert.All(counts.Take(100), c => Assert.Equal(4, c));
        Assert.All(counts.Skip(100), c => Assert.Equal(3, c));
    }

    [Property(MaxTest = 500)]
    public Property StaysWithinQuota() =>
        Prop.ForAll(Arb.From(Generators.Populations), Arb.From(Gen.Choose(0, 500)), (populations, seats) =>
        {
            int[] counts = Hamilton.Apportion(populations, seats);
            double total = populations.Sum();
            for (int i = 0; i < counts.Length; i++)
            {
                double quota = seats * populations[i] / total;
                if (counts[i] < Math.Floor(quota - 1e-6) || counts[i] > Math.Ceiling(quota + 1e-6))
                {
                    return false;
                }
            }

            return counts.Sum() == seats;
        });
}
