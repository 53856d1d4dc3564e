using System.Globalization;
using DesignCompiler.Analysis;
using DesignCompiler.Analysis.Adjusted;
using DesignCompiler.Analysis.Estimates;
using DesignCompiler.Analysis.Rcbd;

namespace DesignCompiler.Tests.Analysis;

/// <summary>The same records give bit-identical results under any culture and whatever the threads (common practice for trialc).</summary>
public sealed class AnalysisDeterminismTests
{
    [Fact]
    public void Results_and_messages_do_not_change_under_a_German_culture_or_on_other_threads()
    {
        string invariant = UnderCulture("en-US", Summary);
        Assert.Equal(invariant, UnderCulture("de-DE", Summary));
        var parallel = new string[4];
        Parallel.For(0, 4, i => parallel[i] = UnderCulture("de-DE", Summary));
        Assert.All(parallel, s => Assert.Equal(invariant, s));
    }

    // Every figure as its exact bit pattern (round-trip hex), and the problem texts as written.
    private static string Summary()
    {
        var records = AnalysisData.Records(AnalysisData.FloridaMissingPlot);
        var prior = AdjustedModelPrior.Proper([new ArmPrior(30, 10), new ArmPrior(30, 10), new ArmPrior(30, 10)], 3, 2);
        var fit = AdjustedModel.Fit(records, 3, ModelAdjustment.Block, prior);
        var anova = RcbdAnalysis.Analyse(new RcbdTable(AnalysisData.FloridaMissingPlot)).Value!;
        var estimates = ArmEstimates.Compare(records, fit, new Dictionary<int, double> { [1] = 9 });
        var problem = RcbdAnalysis.Analyse(new RcbdTable(new double?[,] { { 1, 2 }, { 3, null } })).Problem!;
        var numbers = new List<double> { fit.Posterior.Scale, fit.Posterior.LogMarginalLikelihood!.Value, anova.Treatment.P!.Value, anova.CvPercent!.Value };
        for (int arm = 0; arm < 3; arm++)
        {
            numbers.Add(fit.ArmMean(arm)!.Value);
            numbers.Add(fit.ArmsJoint!.Scale(arm, 0));
            numbers.AddRange([estimates[arm].Adjusted.Lower!.Value, estimates[arm].Naive.Upper!.Value]);
        }
        return string.Join(",", numbers.Select(v => BitConverter.DoubleToInt64Bits(v).ToString("X16", CultureInfo.InvariantCulture)))
            + "|" + problem.Message + "|" + problem.Hint;
    }

    private static T UnderCulture<T>(string name, Func<T> action)
    {
        var before = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo(name);
            return action();
        }
        finally
        {
            CultureInfo.CurrentCulture = before;
        }
    }
}
