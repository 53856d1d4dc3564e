using DesignCompiler.Planning;
using DesignCompiler.Randomness;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Placement;

/// <summary>Rotation rules on the same plot across rounds, over a whole trial.</summary>
public sealed class RotationTests
{
    [Fact]
    public void Six_rounds_of_the_bed_rotation_keep_every_rule_on_every_bed()
    {
        var design = TestDesigns.Example("bed-rotation.trial");
        var planner = RoundPlanner.For(design).Planner!;
        var state = new TrialState(design.Arms.Count);
        // Invented outcomes, for the test only: yields around 20 kg with sd 3.5.
        var rng = new Xoshiro256StarStar(77);
        var code = design.Arms.Select(a => a.Code).ToList();

        for (var round = 1; round <= design.Rounds; round++)
        {
            var result = planner.Plan(state, round);
            Assert.True(result.Plan is not null, string.Join("\n", result.Diagnostics.Select(d => d.Message)));
            var plan = result.Plan!;
            for (var plot = 0; plot < plan.Assignments.Count; plot++)
            {
                var arm = plan.Assignments[plot].Arm;
                // rotation every arm rest 2 rounds: not the same arm as in either of the two rounds before.
                for (var back = 1; back <= 2 && round - back >= 1; back++)
                    Assert.NotEqual(arm, state.History[round - 1 - back][plot]);
                // rotation SAL not after BRA.
                if (round > 1 && state.History[round - 2][plot] == code.IndexOf("BRA"))
                    Assert.NotEqual(code.IndexOf("SAL"), arm);
            }
            // The limits still hold: every arm on at least one bed of each block, none above 40 % (9 of 24).
            foreach (var block in plan.Blocks) Assert.All(block.Counts, c => Assert.True(c >= 1));
            Assert.All(plan.Arms, a => Assert.True(a.Plots <= 9));

            state.Issue(plan);
            foreach (var assignment in plan.Assignments)
                state.Record(assignment.Arm, 20 + 3.5 * Samplers.StandardNormal(ref rng));
            state.RoundsCompleted = round;
        }
        Assert.Equal(6, state.History.Count);
    }

    [Fact]
    public void A_rotation_that_can_never_be_met_is_found_by_the_checker()
    {
        // Two arms resting two rounds each: by round 3 a plot that grew A then B can grow neither.
        var bound = DesignCompiler.Binding.DesignBinder.Check(new DesignCompiler.Text.SourceText("t.trial", """
            trial "tight" {
              seed 3
              rounds 3
              outcome y: bernoulli
              default prior beta(1, 1)
              arm A "a"
              arm B "b"
              plots 4 per round
              rotation every arm rest 2 rounds
            }
            """));
        var diagnostic = Assert.Single(bound.Diagnostics);
        Assert.Equal("TD2072", diagnostic.Id);
        Assert.Equal(new DesignCompiler.Text.LinePosition(9, 3), diagnostic.Location.Start);
    }

    [Fact]
    public void A_round_the_rotation_rules_make_impossible_names_the_rules()
    {
        // Three arms, each at least 2 of 4 plots (a per-round minimum), resting one round: in round 2 the
        // plots that grew an arm cannot take it again, so A's 2 plots need the 2 plots that did not grow A.
        var design = TestDesigns.FromText("""
            trial "crowded" {
              seed 5
              rounds 2
              outcome y: bernoulli
              default prior beta(1, 1)
              arm A "a"
              arm B "b"
              plots 4 per round
              limit A >= 3 plots per round
              rotation every arm rest 1 round
            }
            """);
        var planner = RoundPlanner.For(design).Planner!;
        var state = new TrialState(2);
        var first = planner.Plan(state, 1).Plan!;
        state.Issue(first);
        foreach (var a in first.Assignments) state.Record(a.Arm, 1);
        state.RoundsCompleted = 1;

        var result = planner.Plan(state, 2);
        Assert.Null(result.Plan);
        var diagnostic = Assert.Single(result.Diagnostics);
        Assert.Equal("TD3001", diagnostic.Id);
        Assert.Contains("round 2", diagnostic.Message);
        // The clash is between the minimum (line 9) and the rotation rule (line 10).
        var lines = new[] { diagnostic.Location.Start.Line }.Concat(diagnostic.RelatedLocations.Select(r => r.Location.Start.Line)).ToList();
        Assert.Contains(9, lines);
        Assert.Contains(10, lines);
    }

    [Fact]
    public void Without_rotation_rules_the_placement_is_the_plain_shuffle()
    {
        // Adding a rotation rule that never bites (round 1 has no history) must not change round 1's sheet.
        var text = File.ReadAllText(RepoPaths.Example("cover-crops.trial"));
        var plain = TestDesigns.FromText(text);
        var rotated = TestDesigns.FromText(text.Replace("  stop when best >= 0.95", "  rotation every arm rest 1 round\n  stop when best >= 0.95"));
        var a = RoundPlanner.For(plain).Planner!.Plan(new TrialState(4), 1).Plan!;
        var b = RoundPlanner.For(rotated).Planner!.Plan(new TrialState(4), 1).Plan!;
        Assert.Equal(a.Assignments.Select(x => x.Arm), b.Assignments.Select(x => x.Arm));
    }
}
