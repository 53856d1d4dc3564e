using DesignCompiler.Planning;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Comparisons;
using DesignCompiler.Tests.Testing;
using Xunit.Abstractions;

namespace DesignCompiler.Tests.Simulation;

/// <summary>
/// The nitrogen-rate example through its three seasons, with the adjusted model and without it, on common random
/// numbers in a scenario where seasons and farms shift every rate: the adjusted model picks the best rate more often.
/// </summary>
public sealed class AdjustedModelDriftTests(ITestOutputHelper output)
{
    [Fact]
    public void Separating_season_and_farm_effects_improves_correct_selection_under_drift()
    {
        var adjusted = TestDesigns.Example("nitrogen-rates.trial");
        Assert.True(adjusted.Model.AdjustsForBlock && adjusted.Model.AdjustsForRound);
        var text = File.ReadAllText(RepoPaths.Example("nitrogen-rates.trial"));
        var plain = TestDesigns.FromText(text.Replace("model adjusts for block and round", "model independent", StringComparison.Ordinal));

        var only = adjusted.Scenarios.Where(s => s.Name == "seasons and farms differ").ToList();
        var matching = new ScenarioMatching([new ScenarioPair(only[0], plain.Scenarios.Single(s => s.Name == only[0].Name))], []);
        var settings = new SimulationSettings(200, 2, adjusted.Seed, 30, "test margin", Shard.Whole);
        var result = ComparisonRunner.Run(RoundPlanner.For(plain).Planner!, RoundPlanner.For(adjusted).Planner!, matching, settings);
        var report = ComparisonReport.Build(result);
        var selection = report.Scenarios.Single().Figures.Single(f => f.Figure == ComparedFigure.CorrectSelection);
        output.WriteLine($"P(correct selection): unadjusted {selection.A.Mean:0.000} ± {selection.A.StandardError:0.000}, " +
            $"adjusted {selection.B.Mean:0.000} ± {selection.B.StandardError:0.000}, paired difference {selection.Difference.Mean:0.000} ± {selection.Difference.StandardError:0.000}");
        // Measurably better: the paired difference (adjusted − unadjusted) is more than two of its standard errors above 0.
        Assert.True(selection.Difference.Mean > 2 * selection.Difference.StandardError,
            $"difference {selection.Difference.Mean} ± {selection.Difference.StandardError}");
    }
}
