using BenchmarkDotNet.Attributes;
using DesignCompiler.Planning;

namespace DesignCompiler.Benchmarks;

/// <summary>
/// One round's plan: 10 arms on 4 farms under every kind of limit (ten-varieties-four-farms.trial), round 3
/// after two recorded rounds, exactly as <c>trialc compile</c> asks for it.
/// </summary>
public class RoundPlanBenchmarks
{
    private RoundPlanner _planner = null!;
    private TrialState _state = null!;

    [GlobalSetup]
    public void Setup()
    {
        var design = BenchmarkSetup.Load("ten-varieties-four-farms.trial");
        _planner = RoundPlanner.For(design).Planner!;
        _state = new TrialState(design.Arms.Count);
        for (var round = 1; round <= 2; round++)
        {
            var plan = _planner.Plan(_state, round).Plan!;
            _state.Issue(plan);
            // Invented outcomes: every third plot fails, so the arms' records differ by where they were sown.
            foreach (var plot in plan.Assignments) _state.Record(plot.Arm, (plot.PlotIndex + plot.Arm) % 3 == 0 ? 0 : 1);
            _state.RoundsCompleted = round;
        }
    }

    [Benchmark]
    public RoundPlan? PlanRound3() => _planner.Plan(_state, 3).Plan;
}
