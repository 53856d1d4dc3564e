using DesignCompiler.Planning;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Planning;

/// <summary>Drop rules remove clearly losing arms, but never so many that the round cannot be sown.</summary>
public sealed class DropRuleTests
{
    private const string Design = """
        trial "drops" {
          seed 9
          rounds 3
          outcome y: bernoulli
          default prior beta(1, 1)
          arm A "a"
          arm B "b"
          arm C "c"
          arm D "d"
          plots 20 per round
          limit every arm <= 40% per round
          drop when best < 0.05 after round 1
        }
        """;

    private static (TrialState State, RoundPlanner Planner) AfterFirstRound(params double[] successRates)
    {
        var design = TestDesigns.FromText(Design);
        var planner = RoundPlanner.For(design).Planner!;
        var state = new TrialState(4);
        var plan = planner.Plan(state, 1).Plan!;
        state.Issue(plan);
        // Invented results: each arm's plots succeed at the given rate, first plots first.
        var seen = new int[4];
        foreach (var a in plan.Assignments)
        {
            var count = plan.Arms[a.Arm].Plots;
            state.Record(a.Arm, seen[a.Arm]++ < Math.Round(successRates[a.Arm] * count) ? 1 : 0);
        }
        state.RoundsCompleted = 1;
        return (state, planner);
    }

    [Fact]
    public void A_clearly_losing_arm_is_dropped()
    {
        // A and B succeed everywhere, C at 0.8, D never: D's probability of being best is far below 0.05.
        var (state, planner) = AfterFirstRound(1, 1, 0.8, 0);
        var plan = planner.Plan(state, 2).Plan!;
        Assert.Equal(ArmStatus.Dropped, plan.Arms[3].Status);
        Assert.Equal(0, plan.Arms[3].Plots);
        Assert.Equal(20, plan.Arms.Sum(a => a.Plots));
    }

    [Fact]
    public void Arms_are_kept_when_dropping_them_would_leave_the_round_unfillable()
    {
        // A succeeds everywhere, the rest never: the rule would drop B, C and D, but 'every arm <= 40%'
        // lets A fill only 8 of 20 plots, so the two best of them stay (3 arms × 8 = 24 ≥ 20).
        var (state, planner) = AfterFirstRound(1, 0, 0, 0);
        var result = planner.Plan(state, 2);
        Assert.True(result.Plan is not null, string.Join("\n", result.Diagnostics.Select(d => d.Message)));
        var plan = result.Plan!;
        Assert.Equal(20, plan.Arms.Sum(a => a.Plots));
        Assert.Equal(1, plan.Arms.Count(a => a.Status == ArmStatus.Dropped));
        Assert.All(plan.Arms, a => Assert.True(a.Plots <= 8));
    }
}
