using DesignCompiler.Analysis.Estimates;
using DesignCompiler.Analysis.Trial;
using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Simulation.Estimators;

/// <summary>
/// How the end-of-trial estimates behave under the design: simulated trials run through the planner
/// in each scenario, each is analysed exactly as <c>trialc analyze</c> analyses a real one, and every
/// estimate is compared with the arm's true mean. Reported per arm: the bias (mean of estimate − truth)
/// and the share of 95 % intervals that hold the truth, each with its Monte Carlo standard error
/// (Morris, White and Crowther 2019). Replication i uses the streams of i, as in <c>simulate</c>, so
/// the figures are reproducible.
/// </summary>
public static class EstimatorCheck
{
    public static IReadOnlyList<EstimatorScenario> Run(RoundPlanner planner, IReadOnlyList<ScenarioSpec> scenarios, ulong seed, long replications)
    {
        var design = planner.Design;
        var runner = new ReplicationRunner(planner);
        var record = runner.NewRecord();
        // Binomial θ is the per-trial probability; the estimates are per plot (successes out of N).
        var perPlot = design.Outcome.Family == OutcomeFamily.Binomial ? design.Outcome.Trials : 1;
        var result = new List<EstimatorScenario>();
        foreach (var scenario in scenarios)
        {
            var world = new ScenarioWorld(design, scenario);
            var tallies = design.Arms.Select(_ => new[] { new Tally(), new Tally(), new Tally() }).ToArray();
            for (long i = 0; i < replications; i++)
            {
                runner.Run(world, seed, i, record);
                var plots = runner.State.Observations.Select(o => new AnalysisPlot(o.Round, o.Block, o.Arm, o.Value)).ToList();
                var (arms, _) = TrialEstimates.Of(design, plots);
                for (var a = 0; a < arms.Count; a++)
                {
                    var truth = record.TrueMean[a] * perPlot;
                    tallies[a][0].Add(arms[a].Naive, truth);
                    tallies[a][1].Add(arms[a].RoundStratified, truth);
                    tallies[a][2].Add(arms[a].Model, truth);
                }
            }
            result.Add(new EstimatorScenario(scenario.Name, replications, design.Arms.Select((arm, a) =>
                new EstimatorArm(arm.Code, tallies[a][0].Figure(), tallies[a][1].Figure(), tallies[a][2].Figure())).ToList()));
        }
        return result;
    }

    private sealed class Tally
    {
        private readonly Moments _error = new();
        private long _intervals;
        private long _covered;

        public void Add(ArmEstimate estimate, double truth)
        {
            // The model posterior of an arm with no plot is its prior, not an estimate from the trial.
            if (estimate.Mean is not { } mean || estimate.Status == EstimateStatus.NoData) return;
            _error.Add(mean - truth);
            if (estimate.Lower is not { } lower || estimate.Upper is not { } upper) return;
            _intervals++;
            if (lower <= truth && truth <= upper) _covered++;
        }

        public EstimatorFigure Figure()
        {
            var bias = _error.Estimate();
            var coverage = _intervals == 0 ? double.NaN : (double)_covered / _intervals;
            var coverageSe = _intervals == 0 ? double.NaN : Math.Sqrt(coverage * (1 - coverage) / _intervals);
            return new EstimatorFigure(bias.Count, bias.Mean, bias.StandardError, _intervals, coverage, coverageSe);
        }
    }
}
