using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Running;
using DesignCompiler.Planning;
using DesignCompiler.Simulation;

namespace DesignCompiler.Tests.Simulation;

/// <summary>Simulated regret against values known exactly.</summary>
public sealed class RegretReferenceTests
{
    private static void WithinThreeStandardErrors(double expected, Estimate estimate)
    {
        Assert.True(double.IsFinite(estimate.StandardError) && estimate.StandardError > 0, "the estimate should vary");
        var z = (estimate.Mean - expected) / estimate.StandardError;
        Assert.True(Math.Abs(z) <= 3, FormattableString.Invariant($"simulated {estimate.Mean} ± {estimate.StandardError}, expected {expected}: z = {z:F2}"));
    }

    [Fact]
    public void Equal_allocation_regret_is_plots_times_gap_exactly()
    {
        // Common practice: with a fixed allocation, regret = Σ plots × (best − arm). Largest remainder
        // splits 10 plots over 3 arms as 4, 3, 3 (ties to the lower index), every round:
        // 4 × (0.7 − 0.5) + 3 × (0.7 − 0.55) = 1.25 per round, 5.0 over 4 rounds, with no spread.
        var design = SimulationFixtures.Design(SimulationFixtures.EqualThreeArms);
        var report = SimulationFixtures.Simulate(design, reps: 64);
        var fixedWorld = report.Scenarios.Single(s => s.Scenario.Name == "fixed");
        Assert.Equal(5.0, fixedWorld.Regret.Mean, 12);
        Assert.Equal(0.0, fixedWorld.Regret.StandardError);
        Assert.Equal(28, fixedWorld.NonBestPlots.Mean, 12);
        Assert.Equal([4, 3, 3], fixedWorld.Arms.Select(a => a.ByRound[0].P50!.Value));
    }

    [Fact]
    public void Equal_allocation_regret_under_uniform_priors_is_a_quarter_per_plot()
    {
        // Common practice: for three independent U(0,1) the expected maximum is 3/4 (order
        // statistics, E[max] = k/(k+1)), so each plot's expected gap is 3/4 − 1/2 = 1/4 and
        // 40 plots give an expected regret of 10.
        var design = SimulationFixtures.Design(SimulationFixtures.EqualThreeArms);
        var report = SimulationFixtures.Simulate(design, reps: 1000);
        var prior = report.Scenarios.Single(s => s.Scenario.Name == "prior");
        WithinThreeStandardErrors(10.0, prior.Regret);
    }

    [Fact]
    public void Two_arm_thompson_matches_the_exact_dynamic_program()
    {
        // /work/shared/reference/RESULTS.md, "pm mode", exact K=2 check (rational arithmetic, dynamic
        // programme): K=2, R=3, B=5, p=(0.4, 0.6), Beta(1,1), probability matching with largest-remainder
        // rounding, ties to the lower index: expected regret 1.341972, P(correct) by posterior mean 0.775732.
        var design = SimulationFixtures.Design(SimulationFixtures.TwoArmReference);
        var report = SimulationFixtures.Simulate(design, reps: 10_000);
        var s = report.Scenarios.Single();
        WithinThreeStandardErrors(1.341972, s.Regret);
        // Our selection is the leader by P(best), the reference's the higher posterior mean. Enumerating
        // every posterior this trial can reach (3,876 of them, with the closed form for P(X > Y) of two
        // betas; common practice), the two rules differ in only 64, all far from balanced sampling, so
        // the reference's figure is the one to meet.
        WithinThreeStandardErrors(0.775732, s.CorrectSelection);
    }

    [Fact]
    public void Round_one_of_the_two_arm_case_gives_the_odd_plot_to_the_lower_index()
    {
        // RESULTS.md, "pm mode": odd B makes round 1 an exact tie, which must go to arm 0.
        var design = SimulationFixtures.Design(SimulationFixtures.TwoArmReference);
        var report = SimulationFixtures.Simulate(design, reps: 16);
        Assert.Equal(3, report.Scenarios[0].Arms[0].ByRound[0].P50);
        Assert.Equal(2, report.Scenarios[0].Arms[1].ByRound[0].P50);
        // and the regret of round 1 is then exactly 3 × 0.2
        Assert.Equal(0.6, report.Scenarios[0].ByRound[0].CumulativeRegret.Mean, 12);
    }

    [Fact]
    public void The_runner_calls_the_planner_for_every_round_and_records_every_plot()
    {
        var design = SimulationFixtures.Design(SimulationFixtures.TwoArmReference);
        var runner = new ReplicationRunner(RoundPlanner.For(design).Planner!);
        var record = runner.NewRecord();
        runner.Run(new ScenarioWorld(design, design.Scenarios[0]), design.Seed, 5, record);
        Assert.Equal(3, record.RoundsRun);
        Assert.Equal(15, record.PlotsSown);
        Assert.Equal(15, record.Observations.Sum());
        for (var r = 0; r < 3; r++) Assert.Equal(5, record.Plots[0, r] + record.Plots[1, r]);
        Assert.Equal(record.Plots[0, 0] + record.Plots[0, 1] + record.Plots[0, 2], record.NonBestPlots);
    }
}
