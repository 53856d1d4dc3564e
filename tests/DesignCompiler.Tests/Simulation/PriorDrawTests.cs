using DesignCompiler.Binding;
using DesignCompiler.Randomness;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Tests.Simulation;

/// <summary>True values drawn for <c>from prior</c> follow the prior the planner assumes.</summary>
public sealed class PriorDrawTests
{
    private const string Wheat = """
        trial "Wheat from its prior" {
          seed 17
          rounds 2
          outcome yield "t/ha": normal noise unknown
          goal maximize
          policy thompson
          arm N0 "none" prior normal(mean 5.5, sd 1.5, noise 0.8 worth 4 plots)
          arm N1 "some" prior normal(mean 7.0, sd 1.5, noise 0.8 worth 4 plots)
          plots 10 per round
          scenario "prior" { from prior }
        }
        """;

    [Fact]
    public void Unknown_noise_draws_follow_the_normal_inverse_gamma_prior()
    {
        // Murphy (2007), §3: with σ² ~ IG(α0, β0) and θ | σ² ~ N(μ0, σ²/κ0), θ is Student-t with 2α0 = w = 4
        // degrees of freedom, centre m and scale s (NormalPriorSpec maps the user's terms so). Half of the
        // t(4) mass lies within ±0.7407 scale units (t table, 75 % quantile of t with 4 df; from memory),
        // and E[1/σ²] = α0/β0 = 1/g² (mean of a gamma; common practice).
        var design = SimulationFixtures.Design(Wheat);
        var world = new ScenarioWorld(design, design.Scenarios[0]);
        const int draws = 20_000;
        var theta = new double[2];
        var sigma = new double[2];
        var inner = 0;
        double precisionSum = 0, precisionSquares = 0;
        for (var i = 0; i < draws; i++)
        {
            var rng = SimulationStreams.TrueValues(design.Seed, i, 1);
            world.Draw(ref rng, theta, sigma);
            if (Math.Abs(theta[0] - 5.5) <= 0.7407 * 1.5) inner++;
            var precision = 1 / (sigma[0] * sigma[0]);
            precisionSum += precision;
            precisionSquares += precision * precision;
        }
        var share = (double)inner / draws;
        Assert.True(Math.Abs(share - 0.5) <= 3 * Math.Sqrt(0.25 / draws), $"share within the quartiles: {share}");
        var meanPrecision = precisionSum / draws;
        var se = Math.Sqrt((precisionSquares / draws - meanPrecision * meanPrecision) / draws);
        Assert.True(Math.Abs(meanPrecision - 1 / 0.64) <= 3 * se, $"E[1/σ²] = {meanPrecision} ± {se}, expected {1 / 0.64}");
    }

    [Fact]
    public void Fixed_scenarios_use_the_scenario_noise_then_the_known_noise_then_the_prior_guess()
    {
        var unknown = SimulationFixtures.Design(Wheat.Replace("scenario \"prior\" { from prior }",
            "scenario \"flat\" { every arm 7 }\n  scenario \"noisy\" { every arm 7 noise 1.2 }"));
        Assert.Equal([0.8, 0.8], new ScenarioWorld(unknown, unknown.Scenarios[0]).Info.NoiseSd!);
        Assert.Equal([1.2, 1.2], new ScenarioWorld(unknown, unknown.Scenarios[1]).Info.NoiseSd!);
        var known = SimulationFixtures.Design(Wheat.Replace("normal noise unknown", "normal noise sd 0.5")
            .Replace(", noise 0.8 worth 4 plots", "").Replace("scenario \"prior\" { from prior }", "scenario \"flat\" { every arm 7 }"));
        Assert.Equal([0.5, 0.5], new ScenarioWorld(known, known.Scenarios[0]).Info.NoiseSd!);
        Assert.Equal(OutcomeFamily.Normal, known.Outcome.Family);
    }

    [Fact]
    public void The_same_replication_draws_the_same_world_and_another_replication_another()
    {
        var design = SimulationFixtures.Design(Wheat);
        var world = new ScenarioWorld(design, design.Scenarios[0]);
        double[] Draw(long replication)
        {
            var theta = new double[2];
            var rng = SimulationStreams.TrueValues(design.Seed, replication, world.Key);
            world.Draw(ref rng, theta, new double[2]);
            return theta;
        }
        Assert.Equal(Draw(3), Draw(3));
        Assert.NotEqual(Draw(3), Draw(4));
    }
}
