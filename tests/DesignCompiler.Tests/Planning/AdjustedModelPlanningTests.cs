using DesignCompiler.Planning;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Planning;

/// <summary>
/// 'model adjusts for block': the planner's belief separates a fertile block from a better arm. The check is a
/// property of the two-way fit (common practice: in a connected arm × block layout the arm effects are estimated net
/// of block effects): arms that differ only in which block they were sown in come out (nearly) equal.
/// </summary>
public sealed class AdjustedModelPlanningTests
{
    private static string Design(string model) => $$"""
        trial "Faba bean lines" {
          seed 3
          rounds 2
          outcome yield "t/ha": normal noise unknown
          {{model}}
          default prior normal(mean 5, sd 2, noise 0.5 worth 4 plots)
          arm A "line A"
          arm B "line B"
          block north plots 4
          block south plots 4
        }
        """;

    /// <summary>A sown 3:1 north:south, B 1:3; north yields 2 t/ha more, arms are alike, and no plot-to-plot noise.</summary>
    private static TrialState Unbalanced()
    {
        var state = new TrialState(2);
        foreach (var (arm, block, count) in new[] { (0, 0, 3), (0, 1, 1), (1, 0, 1), (1, 1, 3) })
            for (var k = 0; k < count; k++) state.Record(arm, block == 0 ? 7.0 : 5.0, block, 1);
        state.RoundsCompleted = 1;
        return state;
    }

    [Fact]
    public void The_adjusted_belief_credits_the_block_not_the_arm()
    {
        var adjusted = RoundPlanner.For(TestDesigns.FromText(Design("model adjusts for block"))).Planner!.Believe(Unbalanced());
        var plain = RoundPlanner.For(TestDesigns.FromText(Design("model independent"))).Planner!.Believe(Unbalanced());

        // Unadjusted, A's mean is pulled towards its north plots (naive means 6.5 and 5.5).
        Assert.True(plain.Posteriors[0].Mean - plain.Posteriors[1].Mean > 0.8);
        Assert.True(plain.Summarize([0, 1]).ProbabilityBest[0] > 0.9);

        // Adjusted, the two arms are the same arm in different fields. Least squares would make them exactly equal;
        // the proper prior shrinks the block effect a little, so allow a hundredth of the unadjusted gap's size.
        var gap = adjusted.Posteriors[0].Mean - adjusted.Posteriors[1].Mean;
        Assert.InRange(gap, -0.05, 0.05);
        var summary = adjusted.Summarize([0, 1]);
        Assert.InRange(summary.ProbabilityBest[0], 0.4, 0.6);
        Assert.NotNull(adjusted.JointValues);
    }

    [Fact]
    public void The_planner_compiles_adjusted_rounds_and_keeps_probabilities_a_distribution()
    {
        var planner = RoundPlanner.For(TestDesigns.FromText(Design("model adjusts for block and round"))).Planner!;
        var result = planner.Plan(Unbalanced(), 2);
        Assert.NotNull(result.Plan);
        var p = result.Plan!.Arms.Select(a => a.ProbabilityBest).ToList();
        Assert.All(p, x => Assert.InRange(x, 0, 1));
        Assert.Equal(1, p.Sum(), 9);
        Assert.Equal(8, result.Plan.Arms.Sum(a => a.Plots));
    }
}
