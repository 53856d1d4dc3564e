using DesignCompiler.Analysis;
using DesignCompiler.Analysis.Adjusted;
using DesignCompiler.Analysis.Estimates;
using DesignCompiler.Tests.Numerics;

namespace DesignCompiler.Tests.Analysis;

public sealed class ArmEstimateTests
{
    [Fact]
    public void Naive_mean_has_the_textbook_t_interval()
    {
        // Murphy (2007) data: x̄ = 1.4, s² = 2.5/4; interval x̄ ± t(0.975; 4)·s/√5 with t(0.975; 4) = 2.77644510519779436
        // (mpmath; printed t tables give 2.776).
        var records = new[] { 1.2, 0.8, 2.5, 1.9, 0.6 }.Select(v => new PlotRecord(0, 0, 1, v)).ToList();
        var estimate = NaiveMean.Estimate(records, 0);
        double half = 2.77644510519779435780310484675 * Math.Sqrt(0.625 / 5);
        Assert.Equal(EstimateStatus.Estimated, estimate.Status);
        Assert.Equal(1.4, estimate.Mean!.Value, 14);
        NumericAssert.Relative(1.4 - half, estimate.Lower!.Value, 1e-13, "lower");
        NumericAssert.Relative(1.4 + half, estimate.Upper!.Value, 1e-13, "upper");
        Assert.Equal(4, estimate.Df);
    }

    [Fact]
    public void Round_stratified_mean_weights_rounds_by_the_design()
    {
        // Stratified mean with a pooled within-stratum variance (common practice): rounds (5, 6) and (7, 9, 8) with design
        // weights 4 and 10 → (4·5.5 + 10·8)/14 = 51/7; s² = 2.5/3 on 3 df; Var = s²·[(4/14)²/2 + (10/14)²/3];
        // interval (5.95160120787634208, 8.61982736355222935) with t(0.975; 3) (mpmath, reference/analysis_reference_values.py).
        var records = new List<PlotRecord> { new(0, 0, 1, 5), new(0, 1, 1, 6), new(0, 0, 2, 7), new(0, 1, 2, 9), new(0, 0, 2, 8), new(1, 0, 2, 99) };
        var weights = new Dictionary<int, double> { [1] = 4, [2] = 10 };
        var estimate = RoundStratifiedMean.Estimate(records, 0, weights);
        Assert.Equal(51.0 / 7, estimate.Mean!.Value, 14);
        NumericAssert.Relative(5.95160120787634207935980518709, estimate.Lower!.Value, 1e-13, "lower");
        NumericAssert.Relative(8.61982736355222934921162338434, estimate.Upper!.Value, 1e-13, "upper");
        Assert.Equal(3, estimate.Df);
    }

    [Fact]
    public void Round_stratified_mean_renormalises_over_the_rounds_the_arm_has()
    {
        // An arm seen only in round 2 is its round-2 mean whatever the other rounds weigh (the weights renormalise).
        var records = new List<PlotRecord> { new(0, 0, 2, 7), new(0, 1, 2, 9) };
        var weights = new Dictionary<int, double> { [1] = 4, [2] = 10, [3] = 6 };
        var estimate = RoundStratifiedMean.Estimate(records, 0, weights);
        Assert.Equal(8, estimate.Mean!.Value, 14);
        // With one plot per round there is no within-round spread to estimate: a mean (4·5 + 10·7)/14 = 45/7, no interval.
        var single = RoundStratifiedMean.Estimate([new(0, 0, 1, 5), new(0, 0, 2, 7)], 0, weights);
        Assert.Equal(EstimateStatus.MeanOnly, single.Status);
        Assert.Equal(45.0 / 7, single.Mean!.Value, 14);
        Assert.Null(single.Lower);
        Assert.Throws<ArgumentException>(() => RoundStratifiedMean.Estimate([new(0, 0, 9, 5)], 0, weights));
    }

    [Fact]
    public void Three_ways_side_by_side_on_the_complete_block_table()
    {
        // On a balanced table all three means coincide with the treatment means (Gomez & Gomez Table 2.5 totals / 4); the
        // adjusted interval under the flat prior is ȳ ± t(0.975; 15)·√(MS_E/4), t = 2.13144954555977568 (mpmath).
        var records = AnalysisData.Records(AnalysisData.GomezYields);
        var fit = AdjustedModel.Fit(records, 7, ModelAdjustment.Block, AdjustedModelPrior.Flat);
        var comparison = ArmEstimates.Compare(records, fit, new Dictionary<int, double> { [1] = 1 });
        Assert.Equal(7, comparison.Count);
        var first = comparison[0];
        Assert.Equal(5124, first.Naive.Mean!.Value, 9);
        Assert.Equal(5124, first.RoundStratified.Mean!.Value, 9);
        Assert.Equal(5124, first.Adjusted.Mean!.Value, 9);
        double half = 2.13144954555977568214507262373 * Math.Sqrt(9950257.0 / 90 / 4);
        NumericAssert.Relative(5124 - half, first.Adjusted.Lower!.Value, 1e-12, "adjusted lower");
        Assert.Equal(15, first.Adjusted.Df!.Value, 12);
        // The seventh arm was never sown: no data for the plain means, unidentified for the flat-prior model.
        Assert.Equal(EstimateStatus.NoData, comparison[6].Naive.Status);
        Assert.Equal(EstimateStatus.NoData, comparison[6].RoundStratified.Status);
        Assert.Equal(EstimateStatus.Unidentified, comparison[6].Adjusted.Status);
        Assert.Null(comparison[6].Adjusted.Mean);
    }
}
