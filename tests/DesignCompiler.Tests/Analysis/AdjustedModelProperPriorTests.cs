using DesignCompiler.Analysis;
using DesignCompiler.Analysis.Adjusted;
using DesignCompiler.Numerics;
using DesignCompiler.Randomness;
using DesignCompiler.Tests.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace DesignCompiler.Tests.Analysis;

/// <summary>The adjusted model under its proper conjugate prior.</summary>
public sealed class AdjustedModelProperPriorTests
{
    // Murphy (2007) worked example data (REFERENCES.md §3).
    private static readonly double[] MurphyData = [1.2, 0.8, 2.5, 1.9, 0.6];

    [Fact]
    public void One_arm_without_adjustment_is_the_textbook_normal_gamma_update()
    {
        // Murphy (2007) §3.3, eqs. 86–89, μ0 = 0, κ0 = 1, α0 = 2, β0 = 2 → κn = 6, μn = 7/6, αn = 9/2, βn = 61/15; marginal t with
        // 9 df, squared scale 61/405, 95 % interval (0.288736079712880566, 2.04459725362045277); E[σ²|D] = 122/105.
        // In the model's terms: arm prior mean 0, sd 1, noise guess 1 worth 4 plots (a0 = 2, b0 = 2, V0 = 1).
        var records = MurphyData.Select(v => new PlotRecord(0, 0, 1, v)).ToList();
        var prior = AdjustedModelPrior.Proper([new ArmPrior(0, 1)], noiseGuess: 1, noiseWorth: 4);
        var fit = AdjustedModel.Fit(records, 1, ModelAdjustment.None, prior);
        var posterior = fit.Posterior;
        Assert.Equal(7.0 / 6, posterior.Mean(0)!.Value, 14);
        Assert.Equal(1.0 / 6, posterior.Covariance(0, 0), 14);
        Assert.Equal(4.5, posterior.Shape, 14);
        Assert.Equal(61.0 / 15, posterior.Scale, 13);
        Assert.Equal(122.0 / 105, posterior.NoiseVarianceMean!.Value, 13);
        var marginal = fit.ArmMarginal(0)!;
        Assert.Equal(9, marginal.Df, 13);
        Assert.Equal(61.0 / 405, marginal.Scale * marginal.Scale, 14);
        var interval = CredibleInterval.EqualTailed(marginal);
        Assert.Equal(0.288736079712880565978880471744, interval.Lower, 11);
        Assert.Equal(2.04459725362045276735445286159, interval.Upper, 11);
    }

    [Fact]
    public void Log_marginal_likelihood_matches_the_normal_gamma_evidence()
    {
        // Normal-gamma evidence Γ(αn)/Γ(α0)·β0^α0/βn^αn·(κ0/κn)^½·(2π)^(−n/2) (Murphy 2007, from memory) and, independently,
        // the multivariate-t density of y under the prior: both −7.96324795249501369236851101461 (mpmath,
        // reference/analysis_reference_values.py "AdjustedModelTests").
        var records = MurphyData.Select(v => new PlotRecord(0, 0, 1, v)).ToList();
        var fit = AdjustedModel.Fit(records, 1, ModelAdjustment.None, AdjustedModelPrior.Proper([new ArmPrior(0, 1)], 1, 4));
        NumericAssert.Relative(-7.96324795249501369236851101461, fit.Posterior.LogMarginalLikelihood!.Value, 1e-13, "ln p(y)");
        Assert.Null(AdjustedModel.Fit(records, 1, ModelAdjustment.None, AdjustedModelPrior.Flat).Posterior.LogMarginalLikelihood);
    }

    [Theory]
    [InlineData(31UL, ModelAdjustment.Block)]
    [InlineData(32UL, ModelAdjustment.BlockAndRound)]
    public void Posterior_matches_the_covariance_form_and_the_evidence_matches_the_t_density(ulong seed, ModelAdjustment adjustment)
    {
        // Two independent routes through MathNet.Numerics. The prior is written here in its documented covariance form:
        // V0 = diag(s_i²/g²) for arms and (s²/g²)·(b/(b − 1))·(I − J/b) on the b − 1 free effects of each factor.
        // (1) Woodbury / Kalman form (common practice): m_n = m0 + V0Xᵀ(I + XV0Xᵀ)⁻¹(y − Xm0), V_n = V0 − V0Xᵀ(I + XV0Xᵀ)⁻¹XV0,
        //     which inverts an n × n matrix where the code under test solves a p × p system in precision form.
        // (2) Under the prior, y ~ multivariate t with 2a0 df, location X·m0 and scale (b0/a0)(I + XV0Xᵀ); its log density
        //     at y is the log evidence.
        var rng = new Xoshiro256StarStar(seed);
        var records = Enumerable.Range(0, 14)
            .Select(_ => new PlotRecord(rng.NextInt(3), rng.NextInt(3), 1 + rng.NextInt(2), 20 + 2 * Samplers.StandardNormal(ref rng)))
            .ToList();
        ArmPrior[] arms = [new(19, 3), new(21, 2), new(20, 4)];
        double g = 2.5, w = 3, blockSd = 1.5, roundSd = 1.0;
        var prior = AdjustedModelPrior.Proper(arms, g, w, blockSd, roundSd);
        var fit = AdjustedModel.Fit(records, 3, adjustment, prior);
        var columns = fit.Columns;
        int p = columns.Count, n = records.Count;

        var v0 = Matrix<double>.Build.Dense(p, p);
        var m0 = Vector<double>.Build.Dense(p);
        for (int i = 0; i < 3; i++)
        {
            v0[i, i] = arms[i].Sd * arms[i].Sd / (g * g);
            m0[i] = arms[i].Mean;
        }
        void Effects(int first, int levels, double sd)
        {
            for (int i = 0; i < levels - 1; i++)
                for (int j = 0; j < levels - 1; j++)
                    v0[first + i, first + j] = sd * sd / (g * g) * levels / (levels - 1.0) * ((i == j ? 1 : 0) - 1.0 / levels);
        }
        Effects(columns.FirstBlockColumn, columns.Blocks.Count, blockSd);
        Effects(columns.FirstRoundColumn, columns.Rounds.Count, roundSd);

        var x = Matrix<double>.Build.DenseOfRowArrays(records.Select(r => DeviationRow(r, columns)));
        var y = Vector<double>.Build.DenseOfEnumerable(records.Select(r => r.Value));
        var s = Matrix<double>.Build.DenseIdentity(n) + x * v0 * x.Transpose();
        var sInverse = s.Inverse();
        var gain = v0 * x.Transpose() * sInverse;
        var mn = m0 + gain * (y - x * m0);
        var vn = v0 - gain * x * v0;
        for (int i = 0; i < p; i++)
        {
            NumericAssert.Relative(mn[i], fit.Posterior.Mean(i)!.Value, 1e-11, $"m_n[{i}]");
            for (int j = 0; j < p; j++)
                NumericAssert.Absolute(vn[i, j], fit.Posterior.Covariance(i, j), 1e-11 * vn[i, i], $"V_n[{i},{j}]");
        }

        double a0 = w / 2, b0 = a0 * g * g, nu = 2 * a0;
        var d = y - x * m0;
        double q = d * sInverse * d / (b0 / a0);
        double logDetScale = n * Math.Log(b0 / a0) + s.Cholesky().DeterminantLn;
        double logDensity = SpecialFunctions.LogGamma((nu + n) / 2) - SpecialFunctions.LogGamma(nu / 2)
            - n / 2.0 * Math.Log(nu * Math.PI) - 0.5 * logDetScale - (nu + n) / 2 * Math.Log(1 + q / nu);
        NumericAssert.Relative(logDensity, fit.Posterior.LogMarginalLikelihood!.Value, 1e-11, "ln p(y)");
        Assert.Equal(a0 + n / 2.0, fit.Posterior.Shape, 12);
    }

    [Fact]
    public void An_arm_never_observed_keeps_exactly_its_own_prior()
    {
        // Common practice for a conjugate model with independent priors: a coefficient no plot touches keeps its prior
        // conditional on σ² (mean m0, V_n = V0 = s²/g², no correlation with the rest); only σ²'s posterior learns from the others.
        var records = AnalysisData.Records(AnalysisData.GomezYields);
        var arms = Enumerable.Repeat(new ArmPrior(5000, 400), 7).ToArray();
        arms[6] = new ArmPrior(5200, 300);
        var fit = AdjustedModel.Fit(records, 7, ModelAdjustment.Block, AdjustedModelPrior.Proper(arms, 350, 2));
        Assert.True(fit.IsIdentified(6));
        Assert.Equal(0, fit.Plots(6));
        Assert.Equal(5200, fit.ArmMean(6)!.Value, 9);
        Assert.Equal(300.0 * 300 / (350 * 350), fit.Posterior.Covariance(6, 6), 14);
        for (int j = 0; j < fit.Columns.Count; j++)
            if (j != 6) Assert.Equal(0, fit.Posterior.Covariance(6, j), 14);
        Assert.Equal(7, fit.ArmsJoint!.Dimension);
    }

    [Fact]
    public void A_proper_prior_gives_every_arm_a_posterior_even_where_rounds_confound_them()
    {
        // Common practice: with a proper prior every coefficient has a proper posterior, identified by the data or not.
        // Arm 0 only in round 1 and arm 1 only in round 2 (no arm links the rounds), so the flat prior cannot separate
        // them from the round effect; here even a prior sd 10⁴ times the noise guess leaves them finite and the
        // confounded direction as wide as that prior.
        var records = new List<PlotRecord> { new(0, 0, 1, 10), new(0, 1, 1, 12), new(1, 0, 2, 15), new(1, 1, 2, 13) };
        var arms = new[] { new ArmPrior(12, 1e4), new ArmPrior(12, 1e4) };
        var fit = AdjustedModel.Fit(records, 2, ModelAdjustment.BlockAndRound, AdjustedModelPrior.Proper(arms, 1, 2, 1e4, 1e4));
        Assert.Equal(new[] { 0, 1 }, fit.IdentifiedArms);
        var interval = CredibleInterval.EqualTailed(fit.ArmMarginal(0)!);
        Assert.True(double.IsFinite(interval.Lower) && double.IsFinite(interval.Upper));
        Assert.True(interval.Width > 1e3);
    }

    [Fact]
    public void A_very_wide_prior_approaches_least_squares()
    {
        // Common practice: as V0 → ∞ the conjugate posterior mean tends to the least-squares estimate (here Gomez & Gomez's
        // treatment means, Table 2.5 totals / 4).
        double[] expected = [5124, 5070.25, 5304.25, 4847.75, 4708, 4703.25];
        var arms = Enumerable.Repeat(new ArmPrior(0, 1e7), 6).ToArray();
        var fit = AdjustedModel.Fit(AnalysisData.Records(AnalysisData.GomezYields), 6, ModelAdjustment.Block, AdjustedModelPrior.Proper(arms, 300, 2));
        for (int i = 0; i < 6; i++) NumericAssert.Relative(expected[i], fit.ArmMean(i)!.Value, 1e-6, $"arm {i}");
    }

    [Fact]
    public void Default_effect_sds_are_the_widest_arm_sd()
    {
        var prior = AdjustedModelPrior.Proper([new ArmPrior(5, 1), new ArmPrior(6, 3)], 2, 2);
        Assert.Equal((3.0, 3.0), (prior.BlockEffectSd, prior.RoundEffectSd));
        Assert.Throws<ArgumentOutOfRangeException>(() => AdjustedModelPrior.Proper([new ArmPrior(5, 0)], 2, 2));
        Assert.Throws<ArgumentException>(() => AdjustedModel.Fit([new PlotRecord(0, 0, 1, 1)], 3, ModelAdjustment.None, prior));
    }

    private static double[] DeviationRow(PlotRecord r, ModelColumns columns)
    {
        // The documented coding: arm indicator; per factor 1 in the level's column, −1 in every column for the last level.
        var x = new double[columns.Count];
        x[r.Arm] = 1;
        void Code(int first, IReadOnlyList<int> levels, int label)
        {
            if (levels.Count < 2) return;
            int level = levels.ToList().IndexOf(label);
            if (level < levels.Count - 1) x[first + level] = 1;
            else
                for (int i = 0; i < levels.Count - 1; i++) x[first + i] = -1;
        }
        Code(columns.FirstBlockColumn, columns.Blocks, r.Block);
        Code(columns.FirstRoundColumn, columns.Rounds, r.Round);
        return x;
    }
}
