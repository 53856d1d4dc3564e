using DesignCompiler.Analysis;
using DesignCompiler.Analysis.Rcbd;

namespace DesignCompiler.Tests.Analysis;

/// <summary>Data an analysis of variance cannot use get a problem that says what is wrong and what to do, never an exception.</summary>
public sealed class AnalysisProblemTests
{
    [Fact]
    public void A_single_block_is_too_small()
    {
        // Common practice: an RCBD needs at least two treatments and two blocks for any error df.
        var result = RcbdAnalysis.Analyse(RcbdTable.Complete(new double[,] { { 1 }, { 2 }, { 3 } }));
        Assert.False(result.Succeeded);
        Assert.Equal(AnalysisProblemKind.TableTooSmall, result.Problem!.Kind);
        Assert.Contains("3 × 1", result.Problem.Message);
        Assert.NotEmpty(result.Problem.Hint);
    }

    [Fact]
    public void A_treatment_with_no_plot_is_named()
    {
        var result = RcbdAnalysis.Analyse(new RcbdTable(new double?[,] { { 1, 2, 3 }, { null, null, null }, { 4, 5, 7 } }));
        Assert.Equal(AnalysisProblemKind.EmptyTreatmentOrBlock, result.Problem!.Kind);
        Assert.Contains("treatment 2", result.Problem.Message);
    }

    [Fact]
    public void Unlinked_groups_of_treatments_are_refused()
    {
        // Treatments 1–2 only in blocks 1–2 and treatments 3–4 only in blocks 3–4: no plot links the two groups, so no
        // contrast between them is estimable (common practice: a block design must be connected). Error df would be 9 − 8 = 1.
        var result = RcbdAnalysis.Analyse(new RcbdTable(new double?[,]
        {
            { 1, 2, null, null }, { 3, 5, null, null }, { null, null, 4, 6 }, { null, null, 9, 8 },
        }));
        Assert.Equal(AnalysisProblemKind.Disconnected, result.Problem!.Kind);
    }

    [Fact]
    public void Too_many_missing_plots_leave_no_error_df()
    {
        // Error df = (t − 1)(b − 1) − m (common practice): a 2 × 2 table with one plot lost has none.
        var result = RcbdAnalysis.Analyse(new RcbdTable(new double?[,] { { 1, 2 }, { 3, null } }));
        Assert.Equal(AnalysisProblemKind.NoErrorDegreesOfFreedom, result.Problem!.Kind);
        Assert.Contains("1 of the 4 plots", result.Problem.Message);
    }

    [Fact]
    public void An_exact_fit_reports_no_F_rather_than_infinity()
    {
        // Purely additive data (y = row + column) leave an error SS of zero: F is undefined, not reported.
        var anova = RcbdAnalysis.Analyse(RcbdTable.Complete(new double[,] { { 1, 2, 3 }, { 2, 3, 4 }, { 5, 6, 7 } })).Value!;
        Assert.Equal(0, anova.Error.SumOfSquares, 12);
        Assert.Null(anova.Treatment.F);
        Assert.Null(anova.Treatment.P);
    }
}
