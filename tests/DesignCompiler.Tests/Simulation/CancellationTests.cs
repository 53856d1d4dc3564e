using DesignCompiler.Planning;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Reports;
using DesignCompiler.Simulation.Running;
using DesignCompiler.Rendering.Simulation;

namespace DesignCompiler.Tests.Simulation;

/// <summary>Stopping a simulation early, and splitting it into shards.</summary>
public sealed class CancellationTests
{
    [Fact]
    public void Units_finished_after_cancellation_are_always_the_first_ones()
    {
        using var cancel = new CancellationTokenSource();
        var done = new bool[1000];
        var finished = ChunkedParallel.Run(1000, 2, () => 0, (_, unit) =>
        {
            if (unit == 37) cancel.Cancel();
            Thread.SpinWait(2000);
            done[unit] = true;
        }, _ => { }, cancel.Token);
        Assert.InRange(finished, 38, 1000);
        Assert.All(Enumerable.Range(0, (int)finished), u => Assert.True(done[u]));
        Assert.All(Enumerable.Range((int)finished, 1000 - (int)finished), u => Assert.False(done[u]));
    }

    [Fact]
    public void A_run_cut_short_says_so_and_reports_what_finished()
    {
        var design = SimulationFixtures.Design(SimulationFixtures.TwoArmReference);
        var settings = new SimulationSettings(500, 2, design.Seed, 0.02, "test", Shard.Whole);
        using var cancel = new CancellationTokenSource();
        var progress = new SimulationProgress(500);
        // Cancel as soon as some trials are done, from outside, like Ctrl-C.
        var watcher = new Thread(() =>
        {
            while (progress.Done < 48) Thread.Sleep(1);
            cancel.Cancel();
        });
        watcher.Start();
        var result = Simulator.Run(RoundPlanner.For(design).Planner!, design.Scenarios, settings, progress, cancel.Token);
        watcher.Join();
        var report = ReportBuilder.Build(result);
        Assert.True(result.CutShort);
        Assert.InRange(report.Finished, 48, 499);
        // What finished is a prefix of the replications, so it equals a shorter complete run.
        var shorter = SimulationFixtures.Simulate(design, report.Finished);
        Assert.Equal(shorter.Scenarios[0].Regret, report.Scenarios[0].Regret);
        var text = SimulationText.Write(SimulationModelBuilder.Build(report, "test"));
        Assert.Contains($"cut short: only {report.Finished} of 500 replications", text);
    }

    [Theory]
    [InlineData(10, 1, 3, 4)]
    [InlineData(10, 3, 3, 3)]
    [InlineData(2, 3, 3, 0)]
    [InlineData(7, 7, 7, 1)]
    public void Shard_sizes_cover_every_replication_once(long total, int index, int count, long size)
    {
        var shard = new Shard(index, count);
        Assert.Equal(size, shard.Size(total));
        var all = Enumerable.Range(1, count).SelectMany(k => Enumerable.Range(0, (int)new Shard(k, count).Size(total)).Select(j => new Shard(k, count).Replication(j)));
        Assert.Equal(Enumerable.Range(0, (int)total).Select(i => (long)i), all.Order());
    }
}
