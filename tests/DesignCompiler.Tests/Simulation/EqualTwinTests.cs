using System.Text.Json;
using DesignCompiler.Planning;
using DesignCompiler.Simulation.Comparisons;
using DesignCompiler.Simulation.Reports;
using DesignCompiler.Simulation.Running;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Simulation;

/// <summary>
/// The equal-allocation twin that <c>simulate</c> runs beside every design: it is exactly the equal
/// design simulated on its own with the same seed, its paired differences are the differences of
/// the two, and its regret is the exact regret of equal allocation.
/// </summary>
public sealed class EqualTwinTests
{
    private static SimulationReport WithTwin(DesignCompiler.Binding.CheckedDesign design, long reps)
    {
        var planner = RoundPlanner.For(design).Planner!;
        var twin = RoundPlanner.For(design.EqualTwin()).Planner!;
        var settings = new DesignCompiler.Simulation.SimulationSettings(reps, 2, design.Seed, 0.02, "test margin", DesignCompiler.Simulation.Shard.Whole);
        return ReportBuilder.Build(Simulator.Run(planner, design.Scenarios, settings, twin: twin));
    }

    [Fact]
    public void The_twin_is_the_equal_design_run_alone_on_the_same_streams()
    {
        var design = TestDesigns.Example("cover-crops.trial");
        var report = WithTwin(design, 64);
        var alone = SimulationFixtures.Simulate(design.EqualTwin(), 64);
        var mine = SimulationFixtures.Simulate(design, 64);
        Assert.NotNull(report.EqualTwin);
        for (var s = 0; s < alone.Scenarios.Count; s++)
        {
            var twin = report.EqualTwin![s];
            Assert.Equal(alone.Scenarios[s].Regret, twin.B.Regret);
            Assert.Equal(alone.Scenarios[s].CorrectSelection, twin.B.CorrectSelection);
            Assert.Equal(mine.Scenarios[s].Regret, twin.A.Regret);
            // The mean paired difference is the difference of the means (the same trials on both sides).
            var regret = twin.Figures.Single(f => f.Figure == ComparedFigure.Regret);
            Assert.Equal(regret.B.Mean - regret.A.Mean, regret.Difference.Mean, 9);
        }
    }

    [Fact]
    public void The_twins_regret_is_plots_times_the_mean_gap()
    {
        // Equal allocation without stop rules sows every arm equally: expected regret = Σ plots × (best − mean of arms)
        // exactly (common practice). Cover crops "rye mix better" has a stop rule, so use a design without one.
        var design = SimulationFixtures.Design("""
            trial "barley lines" {
              seed 41
              rounds 3
              outcome y: bernoulli
              default prior beta(1, 1)
              arm A "line A"
              arm B "line B"
              arm C "line C"
              plots 12 per round
              scenario "spread" { A 0.7 B 0.6 C 0.5 }
            }
            """);
        var twin = WithTwin(design, 40).EqualTwin!.Single();
        // 36 plots, 12 per arm: 12 × (0 + 0.1 + 0.2) = 3.6 regret, with no randomness at all.
        Assert.Equal(3.6, twin.B.Regret.Mean, 9);
        Assert.True(twin.A.Regret.Mean < twin.B.Regret.Mean);
    }

    [Fact]
    public void Json_from_four_merged_shards_with_the_twin_equals_one_run()
    {
        var design = RepoPaths.Example("cover-crops.trial");
        var whole = Trialc.Invoke("simulate", design, "--reps", "40", "--format", "json");
        Assert.Equal(0, whole.ExitCode);
        var parts = Enumerable.Range(1, 4).Select(_ => SimulationFixtures.TempFile(".json")).ToList();
        try
        {
            for (var k = 1; k <= 4; k++)
                Assert.Equal(0, Trialc.Invoke("simulate", design, "--reps", "40", "--shard", $"{k}/4", "--out", parts[k - 1]).ExitCode);
            var merged = Trialc.Invoke(["merge", .. parts, "--format", "json"]);
            Assert.True(merged.ExitCode == 0, merged.Error);
            Assert.Equal(whole.Out, merged.Out);
            using var json = JsonDocument.Parse(merged.Out);
            Assert.Equal(3, json.RootElement.GetProperty("againstEqualAllocation").GetArrayLength());
        }
        finally
        {
            foreach (var p in parts) File.Delete(p);
        }
    }

    [Fact]
    public void Skip_equal_leaves_the_section_out_and_an_equal_design_has_no_twin()
    {
        var run = Trialc.Invoke("simulate", RepoPaths.Example("cover-crops.trial"), "--reps", "8", "--format", "json", "--skip-equal");
        Assert.Equal(0, run.ExitCode);
        using var json = JsonDocument.Parse(run.Out);
        Assert.Equal(JsonValueKind.Null, json.RootElement.GetProperty("againstEqualAllocation").ValueKind);
    }
}
