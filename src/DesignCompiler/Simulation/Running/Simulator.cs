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
    public static SimulationResult Run(
        RoundPlanner planner, IReadOnlyList<ScenarioSpec> scenarios, SimulationSettings settings,
        SimulationProgress? progress = null, CancellationToken cancel = default)
    {
        var design = planner.Design;
        var worlds = scenarios.Select(s => new ScenarioWorld(design, s)).ToList();
        var setup = SetupBuilder.Build(design, worlds.Select(w => w.Info).ToList(), settings);
        var local = settings.Shard.Size(settings.Replications);
        var chunks = (local + SimulationSettings.ChunkSize - 1) / SimulationSettings.ChunkSize;
        var totals = worlds.Select(_ => NewAccumulator(design, settings)).ToArray();

        var finished = ChunkedParallel.Run(
            chunks * worlds.Count,
            settings.Threads,
            () => new Worker(new ReplicationRunner(planner), worlds.Select(_ => NewAccumulator(design, settings)).ToArray()),
            (worker, unit) =>
            {
                var s = (int)(unit % worlds.Count);
                var chunk = unit / worlds.Count;
                var end = Math.Min(local, (chunk + 1) * SimulationSettings.ChunkSize);
                for (var j = chunk * SimulationSettings.ChunkSize; j < end; j++)
                {
                    worker.Runner.Run(worlds[s], settings.Seed, settings.Shard.Replication(j), worker.Record);
                    worker.Totals[s].Add(worker.Record);
                }
                progress?.Add(end - chunk * SimulationSettings.ChunkSize);
            },
            worker =>
            {
                for (var s = 0; s < totals.Length; s++) totals[s].Add(worker.Totals[s]);
            },
            cancel);

        return new SimulationResult(setup, settings.Shard, totals, finished < chunks * worlds.Count);
    }

    public static ScenarioAccumulator NewAccumulator(CheckedDesign design, SimulationSettings settings) =>
        new(design.Arms.Count, design.Rounds, design.PlotsPerRound, settings.Margin);

    private sealed class Worker(ReplicationRunner runner, ScenarioAccumulator[] totals)
    {
        public ReplicationRunner Runner { get; } = runner;
        public ReplicationRecord Record { get; } = runner.NewRecord();
        public ScenarioAccumulator[] Totals { get; } = totals;
    }
}
