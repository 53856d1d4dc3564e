using DesignCompiler.Binding;
using DesignCompiler.Numerics;
using DesignCompiler.Planning;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Tests.Families;

/// <summary>Posterior updates of every family against worked examples (shared/REFERENCES.md §3–4).</summary>
public sealed class ConjugateUpdateTests
{
    private static ArmStatistics Data(params double[] values) =>
        values.Aggregate(new ArmStatistics(), (s, v) => s.Add(v));

    // Murphy (2007) worked example data: 1.2, 0.8, 2.5, 1.9, 0.6 (n = 5, x̄ = 1.4, Σ(x − x̄)² = 2.5).
    private static readonly ArmStatistics Murphy = Data(1.2, 0.8, 2.5, 1.9, 0.6);

    [Fact]
    public void Statistics_hold_the_sum_and_the_squared_deviations()
    {
        Assert.Equal(5, Murphy.Count);
        Assert.Equal(1.4, Murphy.Mean, 14);
        Assert.Equal(2.5, Murphy.SumOfSquares, 13);
    }

    [Fact]
    public void Beta_update_adds_successes_to_a_and_failures_to_b()
    {
        // Common practice: each success adds one to a, each failure one to b; Beta(1,1) is uniform.
        var posterior = (BetaMarginal)new BetaBinomialModel(1).Posterior(new BetaPriorSpec(1, 1, default), Data(1, 0, 1, 1, 0, 1));
        Assert.Equal(5, posterior.A);
        Assert.Equal(3, posterior.B);
        // Binomial of 50: 41 and 38 emerged of 50 → a + 79, b + 21.
        var binomial = (BetaMarginal)new BetaBinomialModel(50).Posterior(new BetaPriorSpec(8, 2, default), Data(41, 38));
        Assert.Equal(87, binomial.A);
        Assert.Equal(23, binomial.B);
    }

    [Fact]
    public void Known_noise_normal_update_matches_murphy()
    {
        // Murphy (2007) §2: σ² = 4, μ0 = 0, σ0² = 1 → σn² = 4/9, μn = 7/9; 95 % interval (−0.52886…, 2.08442…).
        var posterior = new NormalKnownNoiseModel(2).Posterior(new NormalPriorSpec(0, 1, null, null, default), Murphy);
        Assert.Equal(7.0 / 9, posterior.Mean, 14);
        Assert.Equal(2.0 / 3, posterior.StdDev, 14);
        var interval = CredibleInterval.EqualTailed(posterior);
        Assert.Equal(-0.528864878582258379238618509236, interval.Lower, 12);
        Assert.Equal(2.08442043413781393479417406479, interval.Upper, 12);
    }

    [Fact]
    public void Unknown_noise_update_matches_murphy_normal_gamma_example()
    {
        // Murphy (2007) §3.3, eqs. 86–89, with μ0 = 0, κ0 = 1, α0 = 2, β0 = 2 → κn = 6, μn = 7/6, αn = 9/2, βn = 61/15.
        // In the design's terms: mean 0, sd 1, noise guess 1 worth 4 plots (κ0 = g²/s², α0 = w/2, β0 = α0·g²).
        var prior = new NormalPriorSpec(0, 1, 1, 4, default);
        Assert.Equal((0.0, 1.0, 2.0, 2.0), prior.NormalInverseGamma);
        var (kappa, mu, alpha, beta) = NormalUnknownNoiseModel.Update(prior, Murphy);
        Assert.Equal(6, kappa, 14);
        Assert.Equal(7.0 / 6, mu, 14);
        Assert.Equal(4.5, alpha, 14);
        Assert.Equal(61.0 / 15, beta, 13);

        // Marginal of μ: t with 9 df, location 7/6, scale √(61/405); P(μ ≤ 1 | D) = 0.33884721070242226760 and
        // 95 % interval (0.2887360797…, 2.0445972536…) (REFERENCES §3, mpmath).
        var marginal = new NormalUnknownNoiseModel().Posterior(prior, Murphy);
        Assert.Equal(0.3388472107024222676009414, marginal.Cdf(1), 12);
        var interval = CredibleInterval.EqualTailed(marginal);
        Assert.Equal(0.288736079712880565978880471744, interval.Lower, 11);
        Assert.Equal(2.04459725362045276735445286159, interval.Upper, 11);
    }

    [Fact]
    public void Prior_marginal_of_the_mean_has_the_user_s_sd_as_its_scale()
    {
        // The documented mapping makes the prior marginal of μ a t with w df, centre m and scale s:
        // its quartiles are m ± s·t(0.75; w). t(0.75; 4) = 0.740697084112682633 (mpmath 1.3.0, 30 digits, by inverting
        // the t upper tail through betainc; the printed t tables give 0.741).
        var marginal = new NormalUnknownNoiseModel().Posterior(new NormalPriorSpec(7.5, 1.5, 0.8, 4, default), new ArmStatistics());
        Assert.Equal(7.5 + 1.5 * 0.740697084112682633, marginal.Quantile(0.75), 11);
    }

    [Fact]
    public void Gamma_poisson_update_matches_the_bayes_rules_example()
    {
        // Johnson, Ott and Dogucu, Bayes Rules! (2022) ch. 5: Gamma(10, 2) prior, counts (6, 2, 2, 1) → Gamma(21, 6);
        // mean 7/2, variance 7/12, P(λ > 4 | y) = Q(21, 24) = 0.242638687336755661266817083355 (REFERENCES §4).
        var posterior = new GammaPoissonModel().Posterior(new GammaPriorSpec(10, 2, default), Data(6, 2, 2, 1));
        Assert.Equal(3.5, posterior.Mean, 14);
        Assert.Equal(7.0 / 12, posterior.StdDev * posterior.StdDev, 13);
        Assert.Equal(0.242638687336755661266817083355, posterior.UpperTail(4), 13);
    }

    [Theory]
    [InlineData(OutcomeFamily.Bernoulli, 1, 1.0, true)]
    [InlineData(OutcomeFamily.Bernoulli, 1, 2.0, false)]
    [InlineData(OutcomeFamily.Bernoulli, 1, 0.5, false)]
    [InlineData(OutcomeFamily.Binomial, 50, 50.0, true)]
    [InlineData(OutcomeFamily.Binomial, 50, 51.0, false)]
    [InlineData(OutcomeFamily.Count, 1, 0.0, true)]
    [InlineData(OutcomeFamily.Count, 1, -1.0, false)]
    [InlineData(OutcomeFamily.Count, 1, 3.5, false)]
    [InlineData(OutcomeFamily.Normal, 1, -1e6, true)]
    [InlineData(OutcomeFamily.Normal, 1, double.NaN, false)]
    public void Each_family_accepts_exactly_its_support(OutcomeFamily family, int trials, double value, bool accepted)
    {
        var model = OutcomeModels.For(new OutcomeSpec("y", null, family, trials, family == OutcomeFamily.Normal ? 1 : null, default));
        Assert.Equal(accepted, model.Accepts(value).Ok);
    }
}
