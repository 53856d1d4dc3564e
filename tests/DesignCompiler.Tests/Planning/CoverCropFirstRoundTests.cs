using DesignCompiler.Planning;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Planning;

/// <summary>Round 1 of the shipped cover-crop design, from the priors alone.</summary>
public sealed class CoverCropFirstRoundTests
{
    private static readonly RoundPlan Plan = PlanRoundOne();

    private static RoundPlan PlanRoundOne()
    {
        var design = TestDesigns.Example("cover-crops.trial");
        var (planner, problem) = RoundPlanner.For(design);
        Assert.Null(problem);
        var result = planner!.Plan(new TrialState(design.Arms.Count), 1);
        Assert.Empty(result.Diagnostics);
        return result.Plan!;
    }

    private static ArmPlan Arm(string code) => Plan.Arms.Single(a => a.Code == code);

    [Fact]
    public void Every_plot_of_every_block_gets_exactly_one_arm()
    {
        Assert.Equal(36, Plan.Assignments.Count);
        Assert.Equal(36, Plan.Assignments.Select(a => a.PlotId).Distinct().Count());
        Assert.Equal(20, Plan.Assignments.Count(a => a.Block == "north"));
        Assert.Equal(16, Plan.Assignments.Count(a => a.Block == "south"));
        Assert.Equal(36, Plan.Arms.Sum(a => a.Plots));
    }

    [Fact]
    public void Block_counts_agree_with_the_plots_placed()
    {
        foreach (var block in Plan.Blocks)
            foreach (var arm in Plan.Arms)
                Assert.Equal(block.Counts[arm.Index], Plan.Assignments.Count(a => a.Block == block.Name && a.Arm == arm.Index));
        foreach (var arm in Plan.Arms)
            Assert.Equal(arm.Plots, Plan.Blocks.Sum(b => b.Counts[arm.Index]));
    }

    [Fact]
    public void Limits_of_the_design_hold()
    {
        // limit BP from round 2: nothing in round 1.
        Assert.Equal(0, Arm("BP").Plots);
        Assert.Equal(ArmStatus.NotYetAvailable, Arm("BP").Status);
        foreach (var code in new[] { "OV", "RC", "MP" })
        {
            // limit every arm >= 2 plots per block per round
            foreach (var block in Plan.Blocks) Assert.True(block.Counts[Arm(code).Index] >= 2, $"{code} in {block.Name}");
            // limit every arm <= 40% per round: floor(0.4 * 36) = 14
            Assert.True(Arm(code).Plots <= 14, code);
        }
        // limit control >= 20% per round: ceil(0.2 * 36) = 8
        Assert.True(Arm("OV").Plots >= 8);
        // limit MP stock 30 plots, with 2 plots per block held back for each of rounds 2-4: at most 30 - 12 = 18.
        Assert.True(Arm("MP").Plots <= 18);
    }

    [Fact]
    public void Probability_best_matches_the_closed_form_for_these_priors()
    {
        // OV ~ Beta(2,2) against three uniform arms: P(OV best) = ∫ 6x(1−x)·x³ dx = 6(1/5 − 1/6) = 1/5,
        // and by symmetry the three uniform arms share the rest (elementary integration, worked by hand).
        Assert.Equal(0.2, Arm("OV").ProbabilityBest, 1e-9);
        foreach (var code in new[] { "RC", "MP", "BP" }) Assert.Equal(0.8 / 3, Arm(code).ProbabilityBest, 1e-9);
        Assert.Equal(1.0, Plan.Arms.Sum(a => a.ProbabilityBest), 1e-9);
    }

    [Fact]
    public void Policy_shares_come_from_probability_best_among_the_arms_that_can_be_sown()
    {
        // BP cannot be sown, so the shares compare OV ~ Beta(2,2) with two uniform arms:
        // ∫ 6x(1−x)·x² dx = 6(1/4 − 1/5) = 3/10, the other two 7/20 each (worked by hand).
        Assert.Equal(0.3, Arm("OV").TargetShare, 1e-9);
        Assert.Equal(0.35, Arm("RC").TargetShare, 1e-9);
        Assert.Equal(0.35, Arm("MP").TargetShare, 1e-9);
        Assert.Equal(0, Arm("BP").TargetShare);
    }

    [Fact]
    public void Posterior_means_are_the_prior_means_before_any_data()
    {
        // Beta(a, b) has mean a / (a + b) (common practice); no plots are recorded yet.
        Assert.Equal(0.5, Arm("OV").PosteriorMean, 12);
        Assert.Equal(0.5, Arm("RC").PosteriorMean, 12);
        // Beta(1,1) is the uniform distribution: its 95 % equal-tailed interval is [0.025, 0.975].
        Assert.Equal(0.025, Arm("RC").CredibleLower, 9);
        Assert.Equal(0.975, Arm("RC").CredibleUpper, 9);
    }

    [Fact]
    public void Plot_ids_follow_the_layout_row_by_row()
    {
        var north = Plan.Assignments.Where(a => a.Block == "north").ToList();
        Assert.Equal("north-1-1", north[0].PlotId);
        Assert.Equal("north-1-5", north[4].PlotId);
        Assert.Equal("north-2-1", north[5].PlotId);
        Assert.Equal("north-4-5", north[19].PlotId);
        Assert.All(north, a => Assert.Equal($"north-{a.Row}-{a.Column}", a.PlotId));
    }
}
