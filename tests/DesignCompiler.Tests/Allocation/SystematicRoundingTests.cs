using DesignCompiler.Planning.Allocation;

namespace DesignCompiler.Tests.Allocation;

/// <summary>
/// Randomized systematic rounding (Madow and Madow 1944; common practice as a rounding scheme):
/// exact totals, bounds kept, each count the floor or ceiling of its quota, and expected counts
/// equal to the quotas.
/// </summary>
public sealed class SystematicRoundingTests
{
    private static int[] Round(double[] shares, int total, int[] min, int[] max, double u) =>
        BoundedApportionment.Apportion(shares, total, min, max, u).Counts;

    [Fact]
    public void Expected_counts_equal_the_quotas()
    {
        // Averaging over u on a fine midpoint grid integrates the rounding exactly up to the grid
        // step: the mean count of arm i must equal its quota s_i·total within 1/grid.
        double[] shares = [0.04, 0.31, 0.125, 0.525];
        const int total = 10;
        const int grid = 20_000;
        var sums = new double[shares.Length];
        for (var g = 0; g < grid; g++)
        {
            var counts = Round(shares, total, [0, 0, 0, 0], [10, 10, 10, 10], (g + 0.5) / grid);
            Assert.Equal(total, counts.Sum());
            for (var i = 0; i < shares.Length; i++)
            {
                Assert.InRange(counts[i], Math.Floor(shares[i] * total), Math.Ceiling(shares[i] * total));
                sums[i] += counts[i];
            }
        }
        for (var i = 0; i < shares.Length; i++)
            Assert.Equal(shares[i] * total, sums[i] / grid, 3);
    }

    [Fact]
    public void A_small_share_gets_a_plot_in_proportion_to_its_quota()
    {
        // Quota 0.4 for arm 0: largest remainder never gives it a plot (0.4 < 0.6 and 0.0);
        // systematic rounding does for u < 0.4 exactly.
        double[] shares = [0.04, 0.96];
        Assert.Equal([0, 10], BoundedApportionment.Apportion(shares, 10, [0, 0], [10, 10]).Counts);
        Assert.Equal([1, 9], Round(shares, 10, [0, 0], [10, 10], 0.39));
        Assert.Equal([0, 10], Round(shares, 10, [0, 0], [10, 10], 0.41));
    }

    [Fact]
    public void Bounds_hold_and_whole_quotas_are_not_coin_flips()
    {
        double[] shares = [0.5, 0.3, 0.2];
        for (var u = 0.0; u < 1; u += 0.01)
        {
            var counts = Round(shares, 10, [2, 0, 3], [4, 10, 10], u);
            Assert.Equal(10, counts.Sum());
            Assert.InRange(counts[0], 2, 4);
            Assert.True(counts[2] >= 3);
            // Whole quotas (here 4, 3, 3 after water-filling: 0.5·10 capped at 4, the rest in proportion)
            // never move with u.
            Assert.Equal([4, 3, 3], counts);
        }
    }
}
