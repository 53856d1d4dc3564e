using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Simulation.Accumulators;

namespace DesignCompiler.Simulation.Running;

/// <summary>
/// Simulates many trials of one design in each scenario, in parallel, through the planner.
/// Replication i always uses the streams of i (see <see cref="SimulationStreams"/>), and the
/// summaries are exact, so the result is the same for any thread count and any sharding.
/// </summary>
public static class Simulator
{
    /// <summary>
    /// Simulates the design; with <paramref name="twin"/> (the planner of its equal-allocation twin)
    /// every replication also runs through the twin on the same streams, and the paired
    /// differences are kept.
    /// </summary>
    public static SimulationResult Run(
        RoundPlanner planner, IReadOnlyList<ScenarioSpec> scenarios, SimulationSettings settings,
        SimulationProgress? progress = null, CancellationToken cancel = default, RoundPlanner? twin = null)
    {
        var design = planner.Design;
        var worlds = scenarios.Select(s => new ScenarioWorld(design, s)).ToList();
        var setup = SetupBuilder.Build(design, worlds.Select(w => w.Info).ToList(), settings);
        var twinWorlds = twin is null ? null : scenarios.Select(s => new ScenarioWorld(twin.Design, s)).ToList();
        var local = settings.Shard.Size(settings.Replications);
        var chunks = (local + SimulationSettings.ChunkSize - 1) / SimulationSettings.ChunkSize;
        var totals = worlds.Select(_ => NewAccumulator(design, settings)).ToArray();
        var twinTotals = twin is null ? null : worlds.Select(_ => NewAccumulator(twin.Design, settings)).ToArray();
        var pairedTotals = twin is null ? null : worlds.Select(_ => new PairedAccumulator()).ToArray();

        var finished = ChunkedParallel.Run(
            chunks * worlds.Count,
            settings.Threads,
            () => new Worker(planner, twin, worlds.Count, settings),
            (worker, unit) =>
            {
                var s = (int)(unit % worlds.Count);
                var chunk = unit / worlds.Count;
                var end = Math.Min(local, (chunk + 1) * SimulationSettings.ChunkSize);
                for (var j = chunk * SimulationSettings.ChunkSize; j < end; j++)
                {
                    var replication = settings.Shard.Replication(j);
                    worker.Runner.Run(worlds[s], settings.Seed, replication, worker.Record);
                    worker.Totals[s].Add(worker.Record);
                    if (worker.Twin is { } twinRunner)
                    {
                        twinRunner.Run(twinWorlds![s], settings.Seed, replication, worker.TwinRecord!);
                        worker.TwinTotals![s].Add(worker.TwinRecord!);
                        worker.Paired![s].Add(ReplicationFigures.Of(worker.Record, settings.Margin), ReplicationFigures.Of(worker.TwinRecord!, settings.Margin));
                    }
                }
                progress?.Add(end - chunk * SimulationSettings.ChunkSize);
            },
            worker =>
            {
                for (var s = 0; s < totals.Length; s++)
                {
                    totals[s].Add(worker.Totals[s]);
                    if (twinTotals is null) continue;
                    twinTotals[s].Add(worker.TwinTotals![s]);
                    pairedTotals![s].Add(worker.Paired![s]);
                }
            },
            cancel);

        var result = new SimulationResult(setup, settings.Shard, totals, finished < chunks * worlds.Count);
        if (twin is null) return result;
        var twinSetup = SetupBuilder.Build(twin.Design, twinWorlds!.Select(w => w.Info).ToList(), settings);
        return result with { Twin = new TwinResult(twinSetup, twinTotals!, pairedTotals!) };
    }

    public static ScenarioAccumulator NewAccumulator(CheckedDesign design, SimulationSettings settings) =>
        new(design.Arms.Count, design.Rounds, design.PlotsPerRound, settings.Margin);

    private sealed class Worker
    {
        public Worker(RoundPlanner planner, RoundPlanner? twin, int scenarios, SimulationSettings settings)
        {
            Runner = new ReplicationRunner(planner);
            Record = Runner.NewRecord();
            Totals = Enumerable.Range(0, scenarios).Select(_ => NewAccumulator(planner.Design, settings)).ToArray();
            if (twin is null) return;
            Twin = new ReplicationRunner(twin);
            TwinRecord = Twin.NewRecord();
            TwinTotals = Enumerable.Range(0, scenarios).Select(_ => NewAccumulator(twin.Design, settings)).ToArray();
            Paired = Enumerable.Range(0, scenarios).Select(_ => new PairedAccumulator()).ToArray();
        }

        public ReplicationRunner Runner { get; }
        public ReplicationRecord Record { get; }
        public ScenarioAccumulator[] Totals { get; }
        public ReplicationRunner? Twin { get; }
        public ReplicationRecord? TwinRecord { get; }
        public ScenarioAccumulator[]? TwinTotals { get; }
        public PairedAccumulator[]? Paired { get; }
    }
}
