using DesignCompiler.Analysis.Rcbd;
using DesignCompiler.Tests.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace DesignCompiler.Tests.Analysis;

/// <summary>Missing plots: Yates's estimate, Gomez &amp; Gomez's bias correction, Yates's iteration.</summary>
public sealed class MissingPlotTests
{
    [Fact]
    public void Yates_estimate_and_bias_reproduce_the_Florida_example_from_its_totals()
    {
        // University of Florida on-farm manual (REFERENCES.md §10): t = b = 3, T = 56, B = 78, G = 274 →
        // X = (3·56 + 3·78 − 274)/(2·2) = 32; treatment SS reduced by [78 − 32·(3 − 1)]²/(3·(3 − 1)) = 32.67.
        // Gomez & Gomez's B = [B_o − (t − 1)X]²/(t(t − 1)) with B_o the block's recorded total reproduces that 32.67 (= 98/3).
        double x = MissingPlots.SingleEstimate(3, 3, 56, 78, 274);
        Assert.Equal(32, x, 14);
        double bias = MissingPlots.SingleTreatmentBias(3, 78, x);
        Assert.Equal(32.67, Math.Round(bias, 2));
        Assert.Equal(98.0 / 3, bias, 13);
    }

    [Fact]
    public void Analysis_with_one_missing_plot_reproduces_the_Florida_adjusted_table()
    {
        // Same manual: adjusted treatment SS 196.00 (2 df), error 3 df with SS 10.67, F = 27.53. Its F is 98.00/3.56, from
        // mean squares rounded to two decimals; unrounded, F = 98/(32/9) = 27.5625 (exact fractions,
        // reference/analysis_reference_values.py "MissingPlotTests").
        var anova = RcbdAnalysis.Analyse(new RcbdTable(AnalysisData.FloridaMissingPlot)).Value!;
        var estimate = Assert.Single(anova.Missing!.Plots);
        Assert.Equal((0, 2), (estimate.Treatment, estimate.Block));
        Assert.Equal(32, estimate.Value, 12);
        Assert.Equal(196.0, anova.Treatment.SumOfSquares, 10);
        Assert.Equal(2, anova.Treatment.Df);
        Assert.Equal(3, anova.Error.Df);
        Assert.Equal(10.67, Math.Round(anova.Error.SumOfSquares, 2));
        Assert.Equal(27.5625, anova.Treatment.F!.Value, 10);
        Assert.Equal(27.53, Math.Round(98.00 / Math.Round(anova.Error.MeanSquare!.Value, 2), 2));
        NumericAssert.Relative(0.0117256636747781122302729511269, anova.Treatment.P!.Value, 1e-11, "P");
        Assert.Equal(98.0 / 3, anova.Missing.TreatmentBias, 10);
        Assert.Equal(7, anova.Total.Df);
        // Lines add up to the recorded plots' total SS, 667/2 (exact), with blocks ignoring treatments 761/6.
        Assert.Equal(667.0 / 2, anova.Total.SumOfSquares, 10);
        Assert.Equal(761.0 / 6, anova.Replication.SumOfSquares, 10);
        Assert.Equal(anova.Total.SumOfSquares, anova.Replication.SumOfSquares + anova.Treatment.SumOfSquares + anova.Error.SumOfSquares, 10);
    }

    [Fact]
    public void Completed_table_gives_the_manual_s_unadjusted_table()
    {
        // The manual's ANOVA "with the estimate": blocks 2 df 98.67, treatments 2 df 228.67, error 4 df 10.67, total 8 df 338.00.
        var completed = RcbdAnalysis.Analyse(new RcbdTable(AnalysisData.FloridaMissingPlot)).Value!.Missing!.Completed;
        var anova = RcbdAnalysis.Analyse(completed).Value!;
        Assert.Equal(98.67, Math.Round(anova.Replication.SumOfSquares, 2));
        Assert.Equal(228.67, Math.Round(anova.Treatment.SumOfSquares, 2));
        Assert.Equal((4, 10.67), (anova.Error.Df, Math.Round(anova.Error.SumOfSquares, 2)));
        Assert.Equal((8, 338.00), (anova.Total.Df, Math.Round(anova.Total.SumOfSquares, 2)));
    }

    [Fact]
    public void Iteration_with_one_missing_plot_agrees_with_the_closed_form_bias()
    {
        // With one plot the exact adjusted treatment SS (blocks-only error SS minus full error SS) equals Gomez & Gomez's
        // corrected SS. Checked by removing each Gomez plot in turn and comparing against MathNet least squares.
        for (int i = 0; i < 6; i++)
            for (int j = 0; j < 4; j++)
            {
                var table = WithMissing(AnalysisData.GomezYields, (i, j));
                var anova = RcbdAnalysis.Analyse(table).Value!;
                var (full, blocksOnly, fitted) = LeastSquares(table);
                NumericAssert.Relative(full, anova.Error.SumOfSquares, 1e-9, $"error SS without ({i},{j})");
                NumericAssert.Relative(blocksOnly - full, anova.Treatment.SumOfSquares, 1e-9, $"treatment SS without ({i},{j})");
                NumericAssert.Relative(fitted[(i, j)], anova.Missing!.Plots[0].Value, 1e-12, $"estimate of ({i},{j})");
            }
    }

    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(5)]
    public void Yates_iteration_for_several_plots_settles_on_the_least_squares_values(int lost)
    {
        // Yates (1933): the iterated estimates are the least-squares fitted values, and the adjusted treatment SS is the
        // extra error SS of the blocks-only fit. Reference library: MathNet.Numerics QR least squares on the recorded plots,
        // with treatment (dummy) coding, a parametrisation independent of the code under test.
        (int, int)[] cells = [(0, 1), (3, 2), (5, 0), (2, 3), (4, 1)];
        var table = WithMissing(AnalysisData.GomezYields, cells[..lost]);
        var anova = RcbdAnalysis.Analyse(table).Value!;
        var (full, blocksOnly, fitted) = LeastSquares(table);
        Assert.Equal(15 - lost, anova.Error.Df);
        Assert.Equal(23 - lost, anova.Total.Df);
        NumericAssert.Relative(full, anova.Error.SumOfSquares, 1e-9, "error SS");
        NumericAssert.Relative(blocksOnly - full, anova.Treatment.SumOfSquares, 1e-9, "treatment SS");
        foreach (var plot in anova.Missing!.Plots)
            NumericAssert.Relative(fitted[(plot.Treatment, plot.Block)], plot.Value, 1e-10, $"estimate of ({plot.Treatment},{plot.Block})");
        Assert.True(anova.Missing.Sweeps > 1);
        Assert.Equal(anova.Total.SumOfSquares, anova.Replication.SumOfSquares + anova.Treatment.SumOfSquares + anova.Error.SumOfSquares, 6);
    }

    private static RcbdTable WithMissing(double[,] values, params (int Treatment, int Block)[] lost)
    {
        var table = new double?[values.GetLength(0), values.GetLength(1)];
        for (int i = 0; i < values.GetLength(0); i++)
            for (int j = 0; j < values.GetLength(1); j++) table[i, j] = values[i, j];
        foreach (var (i, j) in lost) table[i, j] = null;
        return new RcbdTable(table);
    }

    // Error SS of y ~ treatment + block and of y ~ block on the recorded plots, and the full fit's value at every cell.
    private static (double Full, double BlocksOnly, Dictionary<(int, int), double> Fitted) LeastSquares(RcbdTable table)
    {
        int t = table.Treatments, b = table.Blocks;
        var rows = new List<(int I, int J, double Y)>();
        for (int i = 0; i < t; i++)
            for (int j = 0; j < b; j++)
                if (table[i, j] is { } v) rows.Add((i, j, v));
        var y = Vector<double>.Build.DenseOfEnumerable(rows.Select(r => r.Y));

        double[] Row(int i, int j, bool treatments)
        {
            var x = new double[1 + (treatments ? t - 1 : 0) + (b - 1)];
            x[0] = 1;
            int k = 1;
            if (treatments)
            {
                if (i > 0) x[k + i - 1] = 1;
                k += t - 1;
            }
            if (j > 0) x[k + j - 1] = 1;
            return x;
        }

        double Rss(bool treatments, out Vector<double> beta)
        {
            var x = Matrix<double>.Build.DenseOfRowArrays(rows.Select(r => Row(r.I, r.J, treatments)));
            beta = x.QR().Solve(y);
            return (y - x * beta).L2Norm() * (y - x * beta).L2Norm();
        }

        double full = Rss(true, out var coefficients);
        double blocksOnly = Rss(false, out _);
        var fitted = new Dictionary<(int, int), double>();
        for (int i = 0; i < t; i++)
            for (int j = 0; j < b; j++)
                fitted[(i, j)] = Vector<double>.Build.DenseOfArray(Row(i, j, true)) * coefficients;
        return (full, blocksOnly, fitted);
    }
}
