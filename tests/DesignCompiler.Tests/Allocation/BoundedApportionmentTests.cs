using DesignCompiler.Planning.Allocation;

namespace DesignCompiler.Tests.Allocation;

/// <summary>
/// Worked examples of the documented rule (clip-and-rescale water-filling, then largest
/// remainder within the bounds). The expected counts are worked by hand from that rule.
/// </summary>
public class BoundedApportionmentTests
{
    [Fact]
    public void BoundsHoldArmsBackAndLiftThemUp()
    {
        // λ = 10: 0.5·10 = 5 is free, 0.3·10 = 3 is lifted to its minimum 4, 0.2·10 = 2 is held
        // to its maximum 1; 5 + 4 + 1 = 10.
        var result = BoundedApportionment.Apportion([0.5, 0.3, 0.2], 10, [0, 4, 0], [10, 10, 1]);
        Assert.True(result.IsFeasible);
        Assert.Equal([5, 4, 1], result.Counts);
    }

    [Fact]
    public void RemaindersAreSharedWithinTheBounds()
    {
        // Arm 0 is capped at 2; the other two share 8 as 3:2 → quotas 4.8 and 3.2 → (5, 3).
        var result = BoundedApportionment.Apportion([0.6, 0.24, 0.16], 10, [0, 0, 0], [2, 10, 10]);
        Assert.Equal([2, 5, 3], result.Counts);
    }

    [Fact]
    public void ZeroShareArmsGetTheirMinimumOnly()
    {
        var result = BoundedApportionment.Apportion([0.7, 0.0, 0.3], 10, [0, 2, 0], [10, 10, 10]);
        Assert.Equal([6, 2, 2], result.Counts);
    }

    [Fact]
    public void WhenMaximaForceMoreTheZeroShareArmsFillAsEquals()
    {
        // Arm 0 holds at most 4; the remaining 6 spread equally over the two zero-share arms,
        // except that arm 2 may hold only 1: quotas 4, 5, 1.
        Assert.Equal([4, 3, 3], BoundedApportionment.Apportion([1.0, 0.0, 0.0], 10, [0, 0, 0], [4, 10, 10]).Counts);
        Assert.Equal([4, 5, 1], BoundedApportionment.Apportion([1.0, 0.0, 0.0], 10, [0, 0, 0], [4, 10, 1]).Counts);
    }

    [Fact]
    public void AllZeroSharesSplitEquallyWithLowerIndexFirst()
    {
        Assert.Equal([3, 2, 2], BoundedApportionment.Apportion([0.0, 0.0, 0.0], 7, [0, 0, 0], [7, 7, 7]).Counts);
        Assert.Equal([1, 3, 3], BoundedApportionment.Apportion([0.0, 0.0, 0.0], 7, [0, 3, 0], [1, 7, 7]).Counts);
    }

    [Fact]
    public void WithoutBindingBoundsItIsHamiltonAndInheritsTheAlabamaParadox()
    {
        // Balinski and Young (1982), ch. 5; REFERENCES.md §8: Hamilton (4,4,2) → (5,5,1).
        var loose = new[] { 0, 0, 0 };
        var wide = new[] { 100, 100, 100 };
        Assert.Equal([4, 4, 2], BoundedApportionment.Apportion([6, 6, 2], 10, loose, wide).Counts);
        Assert.Equal([5, 5, 1], BoundedApportionment.Apportion([6, 6, 2], 11, loose, wide).Counts);
        var four = new[] { 0, 0, 0, 0 };
        var fourWide = new[] { 400, 400, 400, 400 };
        Assert.Equal([183, 124, 14, 2], BoundedApportionment.Apportion([5670, 3850, 420, 60], 323, four, fourWide).Counts);
        Assert.Equal([184, 125, 13, 2], BoundedApportionment.Apportion([5670, 3850, 420, 60], 324, four, fourWide).Counts);
    }

    [Fact]
    public void NoiseInTheSharesDoesNotDecideTies()
    {
        double third = 1.0 / 3;
        var min = new[] { 0, 0, 0, 0 };
        var max = new[] { 1, 10, 10, 10 };

        // Arm 0 capped at 1; the others share 9 equally except for 1e-13 noise.
        Assert.Equal([1, 3, 3, 3], BoundedApportionment.Apportion([0.5, third, third, third], 10, min, max).Counts);
        Assert.Equal([1, 4, 3, 3], BoundedApportionment.Apportion([0.5, third - 1e-13, third + 1e-13, third], 11, min, max).Counts);
        Assert.Equal([1, 4, 3, 3], BoundedApportionment.Apportion([0.5, third + 1e-13, third, third - 1e-13], 11, min, max).Counts);
    }

    [Fact]
    public void SumOfMinimumsAboveTheTotalIsReported()
    {
        var result = BoundedApportionment.Apportion([0.5, 0.5], 16, [10, 8], [20, 20]);
        Assert.False(result.IsFeasible);
        Assert.Equal(ApportionmentFailure.MinimumsExceedTotal, result.Failure);
        Assert.Equal(18, result.Required);
        Assert.Equal(16, result.Available);
        Assert.Empty(result.Counts);
    }

    [Fact]
    public void SumOfMaximumsBelowTheTotalIsReported()
    {
        var result = BoundedApportionment.Apportion([0.5, 0.5], 16, [0, 0], [5, 6]);
        Assert.Equal(ApportionmentFailure.MaximumsBelowTotal, result.Failure);
        Assert.Equal(16, result.Required);
        Assert.Equal(11, result.Available);
    }

    [Fact]
    public void CrossedBoundsNameTheArm()
    {
        var result = BoundedApportionment.Apportion([0.2, 0.3, 0.5], 10, [0, 6, 0], [10, 5, 10]);
        Assert.Equal(ApportionmentFailure.MinimumExceedsMaximum, result.Failure);
        Assert.Equal(1, result.ArmIndex);
        Assert.Equal(6, result.Required);
        Assert.Equal(5, result.Available);
    }

    [Fact]
    public void OtherBadInputIsReportedNotThrown()
    {
        Assert.Equal(ApportionmentFailure.NegativeTotal, BoundedApportionment.Apportion([1.0], -1, [0], [5]).Failure);
        Assert.Equal(ApportionmentFailure.InvalidShare, BoundedApportionment.Apportion([1.0, double.NaN], 3, [0, 0], [5, 5]).Failure);
        Assert.Equal(ApportionmentFailure.InvalidShare, BoundedApportionment.Apportion([1.0, -0.1], 3, [0, 0], [5, 5]).Failure);
        var negative = BoundedApportionment.Apportion([1.0, 1.0], 3, [0, -1], [5, 5]);
        Assert.Equal(ApportionmentFailure.NegativeMinimum, negative.Failure);
        Assert.Equal(1, negative.ArmIndex);
    }

    [Fact]
    public void MismatchedLengthsAreACallerBug()
    {
        Assert.Throws<ArgumentException>(() => BoundedApportionment.Apportion([1.0, 1.0], 3, [0], [5, 5]));
    }

    [Fact]
    public void SpanOverloadWritesCountsAndStatus()
    {
        Span<int> counts = stackalloc int[3];
        ApportionmentStatus status = BoundedApportionment.Apportion([0.5, 0.3, 0.2], 10, [0, 4, 0], [10, 10, 1], counts);
        Assert.True(status.IsFeasible);
        Assert.Equal([5, 4, 1], counts.ToArray());
    }

    [Fact]
    public void ManyArmsUseHeapScratch()
    {
        int n = 200;
        var shares = Enumerable.Range(1, n).Select(i => (double)i).ToArray();
        var min = Enumerable.Repeat(2, n).ToArray();
        var max = Enumerable.Repeat(30, n).ToArray();
        var result = BoundedApportionment.Apportion(shares, 3000, min, max);
        Assert.True(result.IsFeasible);
        Assert.Equal(3000, result.Counts.Sum());
        Assert.All(result.Counts, c => Assert.InRange(c, 2, 30));
    }
}
