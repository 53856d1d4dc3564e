using DesignCompiler.Planning.Allocation;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DesignCompiler.Tests.Allocation;

/// <summary>
/// Webster / Sainte-Laguë against REFERENCES.md §8 (exact rational recomputation of the
/// published examples) and the house-monotonicity of divisor methods (Balinski and Young 1982).
/// </summary>
public class WebsterTests
{
    [Fact]
    public void FourStateExampleIsMonotone()
    {
        // REFERENCES.md §8 (Balinski and Young 1982, ch. 4): (183,124,14,2) at 323 and
        // (183,125,14,2) at 324 — only B gains, where Hamilton took a seat from C.
        Assert.Equal([183, 124, 14, 2], Webster.Apportion([5670, 3850, 420, 60], 323));
        Assert.Equal([183, 125, 14, 2], Webster.Apportion([5670, 3850, 420, 60], 324));
    }

    [Fact]
    public void SteinSimpleExample()
    {
        // Stein (2008), pp. 228–229 data; REFERENCES.md §8 gives Webster (5,8,17,7) as well.
        Assert.Equal([5, 8, 17, 7], Webster.Apportion([0.14, 0.23, 0.45, 0.18], 37));
    }

    [Fact]
    public void ToyExampleTiesAreSettledByLowerIndex()
    {
        // REFERENCES.md §8: at 10 seats the 10th seat is an exact three-way tie (averages 6/9,
        // 6/9, 2/3), at 11 a tie between B and C, at 12 no tie: (5,5,2). With the documented
        // lower-index rule: A takes the 10th, B the 11th, C the 12th.
        Assert.Equal([5, 4, 1], Webster.Apportion([6, 6, 2], 10));
        Assert.Equal([5, 5, 1], Webster.Apportion([6, 6, 2], 11));
        Assert.Equal([5, 5, 2], Webster.Apportion([6, 6, 2], 12));
    }

    [Fact]
    public void QuadratureNoiseDoesNotDecideTheToyTie()
    {
        // Shares 6/14, 6/14, 2/14 as a quadrature might return them, off by 1e-13.
        Assert.Equal([5, 4, 1], Webster.Apportion([6.0 / 14 - 1e-13, 6.0 / 14 + 1e-13, 2.0 / 14], 10));
        Assert.Equal([5, 4, 1], Webster.Apportion([6.0 / 14 + 1e-13, 6.0 / 14, 2.0 / 14 + 1e-13], 10));
    }

    [Theory]
    [InlineData(new double[] { 5670, 3850, 420, 60 })]
    [InlineData(new double[] { 6, 6, 2 })]
    [InlineData(new double[] { 0.14, 0.23, 0.45, 0.18 })]
    public void HouseMonotoneOnTheReferenceExamples(double[] populations)
    {
        // Divisor methods never show the Alabama paradox (Balinski and Young 1982, ch. 4 and 8).
        int[] previous = Webster.Apportion(populations, 0);
        for (int seats = 1; seats <= 400; seats++)
        {
            int[] current = Webster.Apportion(populations, seats);
            Assert.Equal(seats, current.Sum());
            for (int i = 0; i < populations.Length; i++)
            {
                Assert.True(current[i] >= previous[i], $"arm {i} lost a seat going to {seats}");
            }

            previous = current;
        }
    }

    [Fact]
    public void LargeHouseMatchesSeatBySeat()
    {
        // Exercises the gap-threshold shortcut: 5,000 plots over 7 arms with two equal shares.
        double[] populations = [0.31, 0.2, 0.2, 0.17, 0.07, 0.049, 0.001];
        Assert.Equal(ReferenceApportionment.WebsterSeatBySeat(populations, 5000), Webster.Apportion(populations, 5000));
    }

    [Property(MaxTest = 400)]
    public Property EqualsTheSeatBySeatRule() =>
        Prop.ForAll(Arb.From(Generators.Populations), Arb.From(Gen.Choose(0, 300)), (populations, seats) =>
            Webster.Apportion(populations, seats).AsSpan().SequenceEqual(ReferenceApportionment.WebsterSeatBySeat(populations, seats)));

    [Property(MaxTest = 300)]
    public Property IsHouseMonotone() =>
        Prop.ForAll(Arb.From(Generators.Populations), Arb.From(Gen.Choose(0, 300)), (populations, seats) =>
        {
            int[] smaller = Webster.Apportion(populations, seats);
            int[] larger = Webster.Apportion(populations, seats + 1);
            return larger.Sum() == seats + 1 && smaller.Zip(larger).All(pair => pair.Second >= pair.First);
        });

    [Property(MaxTest = 300)]
    public Property SatisfiesTheDivisorCriterion() =>
        Prop.ForAll(Arb.From(Generators.Populations), Arb.From(Gen.Choose(1, 300)), (populations, seats) =>
        {
            // Balinski and Young: s is a Webster apportionment iff max_i q_i/(s_i+½) ≤
            // min_{s_j>0} q_j/(s_j−½), up to the documented tie tolerance.
            int[] counts = Webster.Apportion(populations, seats);
            double scale = seats / populations.Sum();
            double largestOutside = double.NegativeInfinity;
            double smallestInside = double.PositiveInfinity;
            for (int i = 0; i < counts.Length; i++)
            {
                double quota = populations[i] * scale;
                largestOutside = Math.Max(largestOutside, quota / (counts[i] + 0.5));
                if (counts[i] > 0)
                {
                    smallestInside = Math.Min(smallestInside, quota / (counts[i] - 0.5));
                }
            }

            return largestOutside <= smallestInside + 2e-9 * seats;
        });
}
