using DesignCompiler.Randomness;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DesignCompiler.Tests.Randomness;

/// <summary>
/// Uniformity of the bounded integers by Pearson's chi-square test (common practice), on fixed
/// seeds so the outcome is deterministic. The p-value band [0.001, 0.999] rejects both a bad fit
/// and a suspiciously perfect one; p-values use the regularized incomplete gamma in
/// <see cref="SpecialFunctions"/>, itself checked against mpmath 1.3.0.
/// </summary>
public class NextIntUniformityTests
{
    [Fact]
    public void SmallBoundIsUniform()
    {
        var rng = new Xoshiro256StarStar(31337);
        var counts = new long[10];
        for (int i = 0; i < 1_000_000; i++)
        {
            counts[rng.NextInt(10)]++;
        }

        Assert.InRange(ChiSquare.UniformPValue(counts), 0.001, 0.999);
    }

    [Fact]
    public void LargeBoundHasNoModuloBias()
    {
        // With bound 1.5e9 ≈ 0.35 · 2^32, reducing by modulo would give each value below
        // 2^32 − 2·bound three 32-bit preimages instead of two: 1.5 times as likely over the
        // lower 86% of the range, which ten equal bins see at once.
        const int bound = 1_500_000_000;
        var rng = new Xoshiro256StarStar(2718);
        var counts = new long[10];
        for (int i = 0; i < 200_000; i++)
        {
            counts[(int)((long)rng.NextInt(bound) * 10 / bound)]++;
        }

        Assert.InRange(ChiSquare.UniformPValue(counts), 0.001, 0.999);
    }

    [Fact]
    public void TheUniformityTestWouldCatchModuloReduction()
    {
        // Power check of the test above: the same stream reduced by modulo must fail it.
        const uint bound = 1_500_000_000;
        var rng = new Xoshiro256StarStar(2718);
        var counts = new long[10];
        for (int i = 0; i < 200_000; i++)
        {
            uint value = (uint)(rng.NextUInt64() >> 32) % bound;
            counts[(int)((long)value * 10 / bound)]++;
        }

        Assert.True(ChiSquare.UniformPValue(counts) < 1e-6);
    }

    [Property(MaxTest = 200)]
    public Property AlwaysWithinTheBound() =>
        Prop.ForAll(
            Arb.From(Gen.Choose(1, int.MaxValue)),
            Arb.From(Gen.Choose(0, int.MaxValue)),
            (bound, seed) =>
            {
                var rng = new Xoshiro256StarStar((ulong)seed);
                for (int i = 0; i < 50; i++)
                {
                    int value = rng.NextInt(bound);
                    if (value < 0 || value >= bound)
                    {
                        return false;
                    }
                }

                return true;
            });
}
