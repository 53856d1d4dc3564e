namespace DesignCompiler.Tests.Simulation;

/// <summary>
/// When true values are drawn from the very priors the planner assumes, its final P(best) is
/// a posterior probability, so among arms given P(best) ≈ q about a share q truly is best,
/// whatever the adaptive allocation did (the principle of simulation-based calibration,
/// S. Talts et al. 2018, "Validating Bayesian inference algorithms with simulation-based
/// calibration", arXiv:1804.06788; applied here to one posterior functional).
/// </summary>
public sealed class CalibrationTests
{
    private const string Design = """
        trial "Three lines from their priors" {
          seed 8080
          rounds 3
          outcome ok: bernoulli
          goal maximize
          policy thompson
          default prior beta(1, 1)
          arm A "a"
          arm B "b" prior beta(2, 3)
          arm C "c" prior beta(3, 2)
          plots 12 per round
          scenario "prior" { from prior }
        }
        """;

    [Fact]
    public void Final_probability_of_best_is_calibrated_within_its_standard_error()
    {
        var report = SimulationFixtures.Simulate(SimulationFixtures.Design(Design), reps: 1500);
        var bins = report.Scenarios.Single().Calibration!;
        Assert.Equal(1500L * 3, bins.Sum(b => b.Pairs));
        var checkedBins = 0;
        foreach (var bin in bins.Where(b => b.Pairs >= 60))
        {
            checkedBins++;
            Assert.True(Math.Abs(bin.Frequency - bin.MeanProbability) <= 3 * bin.StandardError,
                FormattableString.Invariant($"bin {bin.From}–{bin.To}: mean P(best) {bin.MeanProbability}, truly best {bin.Frequency}, SE {bin.StandardError}"));
        }
        Assert.True(checkedBins >= 5, "too few well-filled bins to say anything");
        // Overall, Σ P(best) over arms is 1 in every trial, and exactly one arm is best.
        Assert.Equal(1.0, bins.Where(b => b.Pairs > 0).Sum(b => b.MeanProbability * b.Pairs) / 1500, 6);
        Assert.Equal(1500, bins.Where(b => b.Pairs > 0).Sum(b => Math.Round(b.Frequency * b.Pairs)));
    }
}
