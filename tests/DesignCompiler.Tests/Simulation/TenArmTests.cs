namespace DesignCompiler.Tests.Simulation;

/// <summary>The ten-arm, ten-round, 100-plot design used to measure throughput, run briefly.</summary>
public sealed class TenArmTests
{
    [Fact]
    public void Every_round_of_the_large_design_sows_its_100_plots()
    {
        var report = SimulationFixtures.Simulate(SimulationFixtures.Design(SimulationFixtures.TenArms), reps: 4);
        var s = report.Scenarios.Single();
        Assert.Equal(1000, s.PlotsSown.Mean);
        Assert.Equal(10, s.RoundsRun.Mean);
        // Regret is 0.05 per plot off the best line, so it is 0.05 × the plots on other lines (common practice).
        Assert.Equal(0.05 * s.NonBestPlots.Mean, s.Regret.Mean, 9);
        Assert.All(Enumerable.Range(0, 10), r => Assert.Equal(100, s.Arms.Sum(a => a.ByRound[r].Mean), 9));
    }
}
