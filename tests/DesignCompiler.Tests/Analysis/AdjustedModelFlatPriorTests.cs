using DesignCompiler.Analysis;
using DesignCompiler.Analysis.Adjusted;
using DesignCompiler.Analysis.Rcbd;
using DesignCompiler.Numerics;
using DesignCompiler.Tests.Numerics;

namespace DesignCompiler.Tests.Analysis;

/// <summary>
/// Under the flat prior p(β, σ²) ∝ 1/σ² the adjusted model is classical least squares (Gelman et al., <i>Bayesian Data
/// Analysis</i>, 3rd ed., §14.2, from memory): checked against the RCBD closed forms of Gomez &amp; Gomez (1984).
/// </summary>
public sealed class AdjustedModelFlatPriorTests
{
    private static AdjustedModelFit FitGomez(ModelAdjustment adjustment) =>
        AdjustedModel.Fit(AnalysisData.Records(AnalysisData.GomezYields), 6, adjustment, AdjustedModelPrior.Flat);

    [Fact]
    public void Arm_means_are_the_treatment_means_of_the_complete_block_table()
    {
        // For a complete RCBD the least-squares treatment means are the plain row means (Gomez & Gomez Table 2.5 totals / 4).
        double[] expected = [5124, 5070.25, 5304.25, 4847.75, 4708, 4703.25];
        var fit = FitGomez(ModelAdjustment.Block);
        for (int arm = 0; arm < 6; arm++) Assert.Equal(expected[arm], fit.ArmMean(arm)!.Value, 9);
    }

    [Fact]
    public void Noise_scale_is_the_error_mean_square_exactly()
    {
        // With the reference prior a_n = (n − r)/2 and b_n = RSS/2, so b_n/a_n = RSS/(n − r) = MS_error:
        // 9950257/90 = 110,558.41 with 15 df (Gomez & Gomez Table 2.6: 110,558). The posterior mean of σ², b_n/(a_n − 1),
        // is RSS/13 instead.
        var fit = FitGomez(ModelAdjustment.Block);
        var anova = RcbdAnalysis.Analyse(RcbdTable.Complete(AnalysisData.GomezYields)).Value!;
        Assert.Equal(15, fit.Posterior.Df, 12);
        NumericAssert.Relative(9950257.0 / 90, fit.Posterior.NoiseScaleSquared!.Value, 1e-12, "b_n/a_n");
        NumericAssert.Relative(anova.Error.MeanSquare!.Value, fit.Posterior.NoiseScaleSquared.Value, 1e-12, "against the ANOVA");
        NumericAssert.Relative(9950257.0 / 6 / 13, fit.Posterior.NoiseVarianceMean!.Value, 1e-12, "b_n/(a_n − 1)");
    }

    [Fact]
    public void Arm_posteriors_are_the_classical_intervals_and_independent()
    {
        // Common practice for an RCBD: the standard error of a treatment mean is √(MS_E/r), treatment means are uncorrelated,
        // and the 95 % interval is ȳ ± t(0.975; 15)·SE, t(0.975; 15) = 2.13144954555977568 (mpmath).
        var fit = FitGomez(ModelAdjustment.Block);
        double se = Math.Sqrt(9950257.0 / 90 / 4);
        var joint = fit.ArmsJoint!;
        Assert.Equal(6, joint.Dimension);
        for (int i = 0; i < 6; i++)
        {
            NumericAssert.Relative(se * se, joint.Scale(i, i), 1e-12, $"scale[{i},{i}]");
            for (int k = 0; k < i; k++) NumericAssert.Absolute(0, joint.Correlation(i, k), 1e-12, $"correlation {i},{k}");
            var interval = CredibleInterval.EqualTailed(fit.ArmMarginal(i)!);
            double half = 2.13144954555977568214507262373 * se;
            NumericAssert.Relative(fit.ArmMean(i)!.Value - half, interval.Lower, 1e-12, $"lower {i}");
            NumericAssert.Relative(fit.ArmMean(i)!.Value + half, interval.Upper, 1e-12, $"upper {i}");
        }
    }

    [Fact]
    public void Block_effects_are_replication_means_less_the_grand_mean()
    {
        // RCBD closed form (common practice): the least-squares block effect is ȳ_.j − ȳ.., and the effects sum to zero.
        var fit = FitGomez(ModelAdjustment.Block);
        double grand = 59515.0 / 12;
        for (int j = 0; j < 4; j++)
        {
            double mean = Enumerable.Range(0, 6).Average(i => AnalysisData.GomezYields[i, j]);
            Assert.Equal(mean - grand, fit.BlockEffect(j)!.Value, 8);
        }
        Assert.Equal(0, Enumerable.Range(0, 4).Sum(j => fit.BlockEffect(j)!.Value), 8);
        Assert.Null(fit.BlockEffect(99));
    }

    [Fact]
    public void Without_blocks_the_noise_scale_is_the_completely_randomized_error_mean_square()
    {
        // One-way analysis: within-treatment MS = (replication SS + error SS)/18 = 3602737/18 (exact fractions from Table 2.5).
        var fit = FitGomez(ModelAdjustment.None);
        Assert.Equal(18, fit.Posterior.Df, 12);
        NumericAssert.Relative(3602737.0 / 18, fit.Posterior.NoiseScaleSquared!.Value, 1e-12, "b_n/a_n");
        Assert.Equal(5124, fit.ArmMean(0)!.Value, 9);
    }

    [Fact]
    public void With_a_missing_plot_arm_means_are_the_completed_table_means()
    {
        // Florida manual example: with X = 32 in place the treatment totals are 88, 95, 123 over three blocks, and the error
        // is 32/3 on 3 df (REFERENCES.md §10). Least squares on the eight recorded plots gives the same (Yates 1933).
        var fit = AdjustedModel.Fit(AnalysisData.Records(AnalysisData.FloridaMissingPlot), 3, ModelAdjustment.Block, AdjustedModelPrior.Flat);
        Assert.Equal(88.0 / 3, fit.ArmMean(0)!.Value, 10);
        Assert.Equal(95.0 / 3, fit.ArmMean(1)!.Value, 10);
        Assert.Equal(41, fit.ArmMean(2)!.Value, 10);
        Assert.Equal(3, fit.Posterior.Df, 12);
        Assert.Equal(32.0 / 9, fit.Posterior.NoiseScaleSquared!.Value, 10);
    }

    [Fact]
    public void An_arm_never_observed_is_unidentified_and_the_others_are_not()
    {
        var records = AnalysisData.Records(AnalysisData.GomezYields);
        var fit = AdjustedModel.Fit(records, 7, ModelAdjustment.Block, AdjustedModelPrior.Flat);
        Assert.False(fit.IsIdentified(6));
        Assert.Null(fit.ArmMean(6));
        Assert.Null(fit.ArmMarginal(6));
        Assert.Equal(Enumerable.Range(0, 6), fit.IdentifiedArms);
        Assert.Equal(5124, fit.ArmMean(0)!.Value, 9);
        Assert.Equal(6, fit.ArmsJoint!.Dimension);
    }

    [Fact]
    public void An_exact_fit_leaves_the_noise_and_so_every_arm_unidentified()
    {
        // y = arm + block exactly: no residual, so σ² has no posterior (flat prior, b_n = 0) and no marginal exists.
        var records = new List<PlotRecord>();
        for (int arm = 0; arm < 3; arm++)
            for (int block = 0; block < 3; block++) records.Add(new PlotRecord(arm, block, 1, 10 * arm + block));
        var fit = AdjustedModel.Fit(records, 3, ModelAdjustment.Block, AdjustedModelPrior.Flat);
        Assert.False(fit.Posterior.NoiseIdentified);
        Assert.Empty(fit.IdentifiedArms);
        Assert.Null(fit.ArmsJoint);
    }
}
