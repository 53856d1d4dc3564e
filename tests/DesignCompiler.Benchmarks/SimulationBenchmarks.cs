using BenchmarkDotNet.Attributes;
using DesignCompiler.Planning;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Benchmarks;

/// <summary>
/// Whole simulations of the C reference's probability-matching configurations: (a) 10 arms × 10 rounds ×
/// 100 plots, (b) 4 arms × 6 rounds × 48 plots, Beta(1,1) priors, on one and two threads. 200 replications
/// per operation keep an iteration near a second; µs per round = time / (200 · rounds).
/// </summary>
public class SimulationBenchmarks
{
    private RoundPlanner _planner = null!;
    private Binding.CheckedDesign _design = null!;

    [Params("reference-pm-a.trial", "reference-pm-b.trial")]
    public string Design { get; set; } = "";

    [Params(1, 2)]
    public int Threads { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _design = BenchmarkSetup.Load(Design);
        _planner = RoundPlanner.For(_design).Planner!;
    }

    [Benchmark]
    public SimulationResult Simulate200() =>
        Simulator.Run(_planner, _design.Scenarios, new SimulationSettings(200, Threads, _design.Seed, 0.02, "benchmark", Shard.Whole));
}

/// <summary>
/// One simulated trial of configuration (a) on a warmed runner: ten rounds of plan, sow and record. Its
/// allocated bytes divided by ten are the simulator's allocation per round.
/// </summary>
public class ReplicationBenchmarks
{
    private ReplicationRunner _runner = null!;
    private ScenarioWorld _world = null!;
    private ReplicationRecord _record = null!;
    private long _replication;

    [GlobalSetup]
    public void Setup()
    {
        var design = BenchmarkSetup.Load("reference-pm-a.trial");
        _runner = new ReplicationRunner(RoundPlanner.For(design).Planner!);
        _world = new ScenarioWorld(design, design.Scenarios[0]);
        _record = _runner.NewRecord();
        for (var i = 0; i < 20; i++) Replication();
    }

    [Benchmark]
    public int Replication()
    {
        // A fixed cycle of 64 replications: every operation does comparable work.
        _runner.Run(_world, 1, _replication++ % 64, _record);
        return _record.PlotsSown;
    }
}
