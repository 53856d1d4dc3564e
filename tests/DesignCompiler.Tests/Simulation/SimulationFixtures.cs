using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Reports;
using DesignCompiler.Simulation.Running;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Simulation;

/// <summary>Small invented designs and a one-call simulation for the simulation tests.</summary>
internal static class SimulationFixtures
{
    /// <summary>The exact two-arm case of the reference's "pm mode": K=2, R=3, 5 plots per round, Beta(1,1), thompson.</summary>
    public const string TwoArmReference = """
        trial "Two arms, exact reference" {
          seed 424242
          rounds 3
          outcome ok: bernoulli
          goal maximize
          policy thompson
          default prior beta(1, 1)
          arm A "worse arm, index 0"
          arm B "better arm, index 1"
          plots 5 per round
          scenario "reference" { A 0.4 B 0.6 }
        }
        """;

    /// <summary>Equal allocation, no rules: every trial sows the same plots, so regret is known exactly.</summary>
    public const string EqualThreeArms = """
        trial "Equal allocation" {
          seed 99
          rounds 4
          outcome ok: bernoulli
          goal maximize
          policy equal
          default prior beta(1, 1)
          arm A "a"
          arm B "b"
          arm C "c"
          plots 10 per round
          scenario "fixed" { A 0.5 B 0.55 C 0.7 }
          scenario "prior" { from prior }
        }
        """;

    /// <summary>Ten bernoulli arms, ten rounds of 100 plots: the size of a large variety trial (throughput benchmark).</summary>
    public const string TenArms = """
        trial "Ten lines, ten seasons" {
          seed 1
          rounds 10
          outcome ok: bernoulli
          goal maximize
          policy thompson
          default prior beta(1, 1)
          arm L0 "line 0"
          arm L1 "line 1"
          arm L2 "line 2"
          arm L3 "line 3"
          arm L4 "line 4"
          arm L5 "line 5"
          arm L6 "line 6"
          arm L7 "line 7"
          arm L8 "line 8"
          arm L9 "line 9"
          plots 100 per round
          scenario "one better" { every arm 0.45 L0 0.50 }
        }
        """;

    public static SimulationReport Simulate(CheckedDesign design, long reps, int threads = 2, ulong? seed = null, double margin = 0.02) =>
        ReportBuilder.Build(Run(design, reps, threads, seed, margin));

    public static SimulationResult Run(CheckedDesign design, long reps, int threads = 2, ulong? seed = null, double margin = 0.02, Shard? shard = null)
    {
        var planner = RoundPlanner.For(design).Planner!;
        var settings = new SimulationSettings(reps, threads, seed ?? design.Seed, margin, "test margin", shard ?? Shard.Whole);
        return Simulator.Run(planner, design.Scenarios, settings);
    }

    public static CheckedDesign Design(string text) => TestDesigns.FromText(text);

    public static string TempFile(string extension) =>
        Path.Combine(Path.GetTempPath(), "trialc-sim-" + Guid.NewGuid().ToString("N") + extension);
}
