using DesignCompiler.Planning;
using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Simulation.Comparisons;

/// <summary>
/// Simulates two designs with common random numbers: replication i of B draws its true values
/// and its outcomes from exactly the streams replication i of A uses (keyed by A's seed, A's
/// scenario name and the arm code), so the two trials differ only in their decisions. Each
/// design still runs through its own planner.
/// </summary>
public static class ComparisonRunner
{
    public static ComparisonResult Run(
        RoundPlanner plannerA, RoundPlanner plannerB, ScenarioMatching matching, SimulationSettings settings,
        SimulationProgress? progress = null, CancellationToken cancel = default)
    {
        var (a, b) = (plannerA.Design, plannerB.Design);
        var worldsA = matching.Pairs.Select(p => new ScenarioWorld(a, p.A)).ToList();
        var worldsB = matching.Pairs.Select(p => new ScenarioWorld(b, p.B, keyName: p.A.Name)).ToList();
        var setupA = SetupBuilder.Build(a, worldsA.Select(w => w.Info).ToList(), settings);
        var setupB = SetupBuilder.Build(b, worldsB.Select(w => w.Info).ToList(), settings);
        var pairs = worldsA.Count;
        var totalA = worldsA.Select(_ => Simulator.NewAccumulator(a, settings)).ToArray();
        var totalB = worldsB.Select(_ => Simulator.NewAccumulator(b, settings)).ToArray();
        var totalD = worldsA.Select(_ => new PairedAccumulator()).ToArray();
        var chunks = (settings.Replications + SimulationSettings.ChunkSize - 1) / SimulationSettings.ChunkSize;

        var finished = pairs == 0 ? 0 : ChunkedParallel.Run(
            chunks * pairs,
            settings.Threads,
            () => new Worker(new ReplicationRunner(plannerA), new ReplicationRunner(plannerB), pairs, a, b, settings),
            (worker, unit) =>
            {
                var s = (int)(unit % pairs);
                var chunk = unit / pairs;
                var end = Math.Min(settings.Replications, (chunk + 1) * SimulationSettings.ChunkSize);
                for (var i = chunk * SimulationSettings.ChunkSize; i < end; i++)
                {
                    worker.RunnerA.Run(worldsA[s], settings.Seed, i, worker.RecordA);
                    worker.RunnerB.Run(worldsB[s], settings.Seed, i, worker.RecordB);
                    worker.A[s].Add(worker.RecordA);
                    worker.B[s].Add(worker.RecordB);
                    worker.D[s].Add(ReplicationFigures.Of(worker.RecordA, settings.Margin), ReplicationFigures.Of(worker.RecordB, settings.Margin));
                }
                progress?.Add(end - chunk * SimulationSettings.ChunkSize);
            },
            worker =>
            {
                for (var s = 0; s < pairs; s++)
                {
                    totalA[s].Add(worker.A[s]);
                    totalB[s].Add(worker.B[s]);
                    totalD[s].Add(worker.D[s]);
                }
            },
            cancel);

        return new ComparisonResult(setupA, setupB, totalA, totalB, totalD, matching.Notes, finished < chunks * pairs);
    }

    private sealed class Worker
    {
        public Worker(ReplicationRunner a, ReplicationRunner b, int pairs, DesignCompiler.Binding.CheckedDesign da,
            DesignCompiler.Binding.CheckedDesign db, SimulationSettings settings)
        {
            RunnerA = a;
            RunnerB = b;
            RecordA = a.NewRecord();
            RecordB = b.NewRecord();
            A = Enumerable.Range(0, pairs).Select(_ => Simulator.NewAccumulator(da, settings)).ToArray();
            B = Enumerable.Range(0, pairs).Select(_ => Simulator.NewAccumulator(db, settings)).ToArray();
            D = Enumerable.Range(0, pairs).Select(_ => new PairedAccumulator()).ToArray();
        }

        public ReplicationRunner RunnerA { get; }
        public ReplicationRunner RunnerB { get; }
        public ReplicationRecord RecordA { get; }
        public ReplicationRecord RecordB { get; }
        public ScenarioAccumulator[] A { get; }
        public ScenarioAccumulator[] B { get; }
        public PairedAccumulator[] D { get; }
    }
}
