using DesignCompiler.Planning.Placement;
using DesignCompiler.Tests.Randomness;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Placement;

/// <summary>Plot placement is a fair randomisation: every arm is equally likely on every plot.</summary>
public sealed class PlacementRandomnessTests
{
    [Fact]
    public void Over_many_seeds_each_arm_lands_on_each_plot_with_its_expected_frequency()
    {
        // 12 plots holding 6 × A, 4 × B, 2 × C: under a uniform permutation (Fisher–Yates; Knuth, TAOCP vol. 2,
        // Algorithm P) arm i is on plot k with probability count_i / 12. Pearson's chi-square over the 36
        // (arm, plot) cells, each plot's row having 2 free cells, so 12 × 2 = 24 degrees of freedom.
        var text = File.ReadAllText(RepoPaths.Example("cover-crops.trial"));
        const int seeds = 1500;
        var observed = new long[3, 12];
        var counts = new int[4, 1];
        counts[0, 0] = 6; counts[1, 0] = 4; counts[2, 0] = 2;
        var design = TestDesigns.FromText(text
            .Replace("  block north plots 20 layout 4 x 5\n  block south plots 16 layout 4 x 4\n", "  plots 12 per round\n")
            .Replace("  limit every arm >= 2 plots per block per round\n", "")
            .Replace("  limit every arm <= 40% per round\n", ""));
        for (var seed = 0; seed < seeds; seed++)
        {
            var reseeded = TestDesigns.FromText(design.Source.Content.Replace("seed 20260815", "seed " + (1000 + seed)));
            var placement = PlotPlacer.Place(reseeded, 1, counts).Assignments!;
            foreach (var plot in placement) observed[plot.Arm, plot.PlotIndex]++;
        }
        double statistic = 0;
        for (var arm = 0; arm < 3; arm++)
        for (var plot = 0; plot < 12; plot++)
        {
            var expected = seeds * counts[arm, 0] / 12.0;
            statistic += (observed[arm, plot] - expected) * (observed[arm, plot] - expected) / expected;
        }
        var p = ChiSquare.UpperTail(24, statistic);
        Assert.InRange(p, 0.001, 0.999);
    }
}
