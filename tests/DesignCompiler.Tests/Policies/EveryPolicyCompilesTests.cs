using DesignCompiler.Planning;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Policies;

/// <summary>Every policy of the language compiles a round of every shipped example, and every limit holds.</summary>
public sealed class EveryPolicyCompilesTests
{
    public static TheoryData<string, string> Cases()
    {
        var data = new TheoryData<string, string>();
        string[] policies = ["thompson", "top-two thompson beta 0.5", "ucb1", "kl-ucb c 3", "epsilon-greedy epsilon 0.2 decreasing", "explore-then-commit 1 round", "equal"];
        foreach (var example in Directory.GetFiles(RepoPaths.Examples, "*.trial").Select(Path.GetFileName).Order())
            foreach (var policy in policies)
                data.Add(example!, policy);
        return data;
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Round_one_and_two_compile_under_every_policy(string example, string policy)
    {
        var text = File.ReadAllText(RepoPaths.Example(example));
        var line = text.Split('\n').First(l => l.TrimStart().StartsWith("policy ", StringComparison.Ordinal));
        var design = TestDesigns.FromText(text.Replace(line, "  policy " + policy));
        var planner = RoundPlanner.For(design).Planner!;
        var state = new TrialState(design.Arms.Count);
        for (var round = 1; round <= Math.Min(2, design.Rounds); round++)
        {
            var result = planner.Plan(state, round);
            Assert.True(result.Plan is not null, string.Join("\n", result.Diagnostics.Select(d => d.Message)));
            var plan = result.Plan!;
            Assert.Equal(design.PlotsPerRound, plan.Arms.Sum(a => a.Plots));
            Assert.Equal(design.PlotsPerRound, plan.Assignments.Count);
            Assert.Equal(1.0, plan.Arms.Sum(a => a.ProbabilityBest), 9);
            state.Issue(plan);
            // A middling invented outcome on every plot, within each family's support.
            foreach (var a in plan.Assignments) state.Record(a.Arm, design.Outcome.Family switch
            {
                Binding.OutcomeFamily.Bernoulli => a.PlotIndex % 2,
                Binding.OutcomeFamily.Binomial => design.Outcome.Trials / 2,
                Binding.OutcomeFamily.Count => 10 + a.PlotIndex % 5,
                _ => 7 + 0.1 * (a.PlotIndex % 7),
            });
            state.RoundsCompleted = round;
        }
    }
}
