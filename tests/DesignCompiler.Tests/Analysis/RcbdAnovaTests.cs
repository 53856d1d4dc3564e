using DesignCompiler.Analysis.Rcbd;
using DesignCompiler.Tests.Numerics;

namespace DesignCompiler.Tests.Analysis;

/// <summary>The complete-table analysis of variance against Gomez &amp; Gomez (1984), Tables 2.5–2.6.</summary>
public sealed class RcbdAnovaTests
{
    private static RcbdAnova Gomez() => RcbdAnalysis.Analyse(RcbdTable.Complete(AnalysisData.GomezYields)).Value!;

    [Fact]
    public void Lines_round_to_the_published_table()
    {
        // Gomez & Gomez (1984) Table 2.6: replication 3 df, SS 1,944,361, MS 648,120; treatment 5 df, SS 1,198,331,
        // MS 239,666, F 2.17; error 15 df, SS 1,658,376, MS 110,558; total 23 df, SS 4,801,068.
        var anova = Gomez();
        Assert.Equal((3, 1_944_361.0, 648_120.0), (anova.Replication.Df, Math.Round(anova.Replication.SumOfSquares), Math.Round(anova.Replication.MeanSquare!.Value)));
        Assert.Equal((5, 1_198_331.0, 239_666.0), (anova.Treatment.Df, Math.Round(anova.Treatment.SumOfSquares), Math.Round(anova.Treatment.MeanSquare!.Value)));
        Assert.Equal((15, 1_658_376.0, 110_558.0), (anova.Error.Df, Math.Round(anova.Error.SumOfSquares), Math.Round(anova.Error.MeanSquare!.Value)));
        Assert.Equal((23, 4_801_068.0), (anova.Total.Df, Math.Round(anova.Total.SumOfSquares)));
        Assert.Equal(2.17, Math.Round(anova.Treatment.F!.Value, 2));
        // Same table: grand mean 4,960 kg/ha, CV 6.7 %; not significant at 5 % (tabulated F(0.05; 5, 15) = 2.90).
        Assert.Equal(4960, Math.Round(anova.GrandMean));
        Assert.Equal(6.7, Math.Round(anova.CvPercent!.Value, 1));
        Assert.True(anova.Treatment.P > 0.05);
    }

    [Fact]
    public void Lines_match_exact_arithmetic()
    {
        // Exact fractions from the yields (reference/analysis_reference_values.py, "RcbdAnovaTests"): replication SS
        // 11666165/6, treatment SS 7189985/6, error SS 9950257/6, total 28806407/6, F = 21569955/9950257; P by mpmath.
        var anova = Gomez();
        NumericAssert.Relative(11666165.0 / 6, anova.Replication.SumOfSquares, 1e-14, "replication SS");
        NumericAssert.Relative(7189985.0 / 6, anova.Treatment.SumOfSquares, 1e-14, "treatment SS");
        NumericAssert.Relative(9950257.0 / 6, anova.Error.SumOfSquares, 1e-14, "error SS");
        NumericAssert.Relative(28806407.0 / 6, anova.Total.SumOfSquares, 1e-14, "total SS");
        NumericAssert.Relative(21569955.0 / 9950257, anova.Treatment.F!.Value, 1e-14, "F");
        NumericAssert.Relative(0.112809412634841053100493597276, anova.Treatment.P!.Value, 1e-12, "P");
        NumericAssert.Relative(59515.0 / 12, anova.GrandMean, 1e-15, "grand mean");
        NumericAssert.Relative(6.70425774561565855879515027835, anova.CvPercent!.Value, 1e-14, "CV %");
        Assert.Null(anova.Replication.F);
        Assert.Null(anova.Missing);
    }

    [Fact]
    public void Relative_efficiency_of_blocking_follows_the_handbook_formula()
    {
        // RE = [(r − 1)E_b + r(t − 1)E_e] / [(rt − 1)E_e] and the df factor k = [(r−1)(t−1)+1][t(r−1)+3] /
        // ([(r−1)(t−1)+3][t(r−1)+1]) (Gomez & Gomez 1984, ch. 2; formula from memory). REFERENCES.md §10: 1.63, and 1.61
        // after the adjustment; exact fractions 373997615/228855911 and 1102308760/686567733.
        var anova = Gomez();
        Assert.Equal(1.63, Math.Round(anova.RelativeEfficiency!.Value, 2));
        Assert.Equal(1.61, Math.Round(anova.RelativeEfficiencyDfAdjusted!.Value, 2));
        NumericAssert.Relative(373997615.0 / 228855911, anova.RelativeEfficiency.Value, 1e-14, "RE");
        NumericAssert.Relative(1102308760.0 / 686567733, anova.RelativeEfficiencyDfAdjusted.Value, 1e-14, "RE adjusted");
    }

    [Fact]
    public void Treatment_means_are_the_row_means()
    {
        // Gomez & Gomez Table 2.5 treatment totals / 4 (exact).
        double[] expected = [5124, 5070.25, 5304.25, 4847.75, 4708, 4703.25];
        var anova = Gomez();
        for (int i = 0; i < 6; i++) Assert.Equal(expected[i], anova.TreatmentMeans[i], 10);
    }

    [Fact]
    public void Sums_of_squares_keep_their_digits_when_yields_carry_a_large_offset()
    {
        // Common practice: adding a constant to every plot changes no sum of squares. The deviation form keeps the error SS
        // to 1e-9 relative even at an offset of 1e7, where "raw squares minus correction factor" would lose about six digits.
        var shifted = (double[,])AnalysisData.GomezYields.Clone();
        for (int i = 0; i < 6; i++)
            for (int j = 0; j < 4; j++) shifted[i, j] += 1e7;
        var anova = RcbdAnalysis.Analyse(RcbdTable.Complete(shifted)).Value!;
        NumericAssert.Relative(9950257.0 / 6, anova.Error.SumOfSquares, 1e-9, "error SS");
        NumericAssert.Relative(7189985.0 / 6, anova.Treatment.SumOfSquares, 1e-9, "treatment SS");
    }
}
