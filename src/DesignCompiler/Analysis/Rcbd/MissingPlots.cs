namespace DesignCompiler.Analysis.Rcbd;

/// <summary>
/// Estimates for lost plots of a randomized complete block table, so that the usual analysis can run on the completed
/// table with one error degree of freedom fewer per estimate.
/// </summary>
/// <remarks>
/// One plot: Yates's (1933) closed form. Several: Yates's iterative method — give every missing plot a starting value,
/// then repeatedly replace each in turn by the one-plot formula, with the other missing plots at their current values,
/// until no estimate moves. Each replacement minimises the error sum of squares over that one plot, so the sweeps are
/// coordinate descent on a convex quadratic and settle on the least-squares values: the fitted treatment + block
/// values of the recorded plots (Yates 1933). The tests check that against an independent least-squares fit.
/// </remarks>
public static class MissingPlots
{
    private const int SweepLimit = 100_000;

    /// <summary>
    /// X = (tT + bB − G)/((t − 1)(b − 1)) (Yates 1933; Allan &amp; Wishart 1930), with T, B and G the totals of the recorded
    /// plots of the missing plot's treatment, of its block and of the whole table.
    /// </summary>
    public static double SingleEstimate(int treatments, int blocks, double treatmentTotal, double blockTotal, double grandTotal) =>
        (treatments * treatmentTotal + blocks * blockTotal - grandTotal) / ((treatments - 1.0) * (blocks - 1.0));

    /// <summary>
    /// The upward bias of the treatment sum of squares when one plot is replaced by its estimate X:
    /// B = [B_o − (t − 1)X]²/(t(t − 1)), with B_o the total of the recorded plots in the missing plot's block
    /// (Gomez &amp; Gomez 1984, §7.1.2.1). It is exact: the treatment SS less B is the treatment SS adjusted for blocks.
    /// </summary>
    public static double SingleTreatmentBias(int treatments, double blockTotal, double estimate)
    {
        double d = blockTotal - (treatments - 1.0) * estimate;
        return d * d / (treatments * (treatments - 1.0));
    }

    /// <summary>The table with every missing plot at its estimate, and the sweeps used (0 for one missing plot); null if the iteration did not settle.</summary>
    internal static (double[,] Completed, int Sweeps)? Complete(RcbdTable table)
    {
        int t = table.Treatments, b = table.Blocks;
        var cells = new double[t, b];
        var missing = new List<(int Treatment, int Block)>();
        for (int i = 0; i < t; i++)
            for (int j = 0; j < b; j++)
            {
                if (table[i, j] is { } v) cells[i, j] = v;
                else missing.Add((i, j));
            }
        if (missing.Count == 0) return (cells, 0);
        if (missing.Count == 1)
        {
            var (i, j) = missing[0];
            cells[i, j] = SingleEstimate(t, b, RowTotal(cells, i), ColumnTotal(cells, j), GrandTotal(cells));
            return (cells, 0);
        }

        Start(table, cells, missing);
        double size = 1;
        foreach (var v in cells) size = Math.Max(size, Math.Abs(v));
        // Estimates are sums of a few dozen totals; a change below this is rounding, not progress.
        double settled = 1e-12 * size;
        for (int sweep = 1; sweep <= SweepLimit; sweep++)
        {
            double largest = 0;
            foreach (var (i, j) in missing)
            {
                double current = cells[i, j];
                double estimate = SingleEstimate(t, b, RowTotal(cells, i) - current, ColumnTotal(cells, j) - current, GrandTotal(cells) - current);
                largest = Math.Max(largest, Math.Abs(estimate - current));
                cells[i, j] = estimate;
            }
            if (largest <= settled) return (cells, sweep);
        }
        return null;
    }

    // The additive guess from what was recorded: treatment mean + block mean − grand mean.
    private static void Start(RcbdTable table, double[,] cells, List<(int Treatment, int Block)> missing)
    {
        int t = table.Treatments, b = table.Blocks;
        double grand = 0;
        int count = 0;
        var rowSum = new double[t];
        var rowCount = new int[t];
        var columnSum = new double[b];
        var columnCount = new int[b];
        for (int i = 0; i < t; i++)
            for (int j = 0; j < b; j++)
                if (table[i, j] is { } v)
                {
                    grand += v;
                    count++;
                    rowSum[i] += v;
                    rowCount[i]++;
                    columnSum[j] += v;
                    columnCount[j]++;
                }
        foreach (var (i, j) in missing)
            cells[i, j] = rowSum[i] / rowCount[i] + columnSum[j] / columnCount[j] - grand / count;
    }

    private static double RowTotal(double[,] cells, int i)
    {
        double s = 0;
        for (int j = 0; j < cells.GetLength(1); j++) s += cells[i, j];
        return s;
    }

    private static double ColumnTotal(double[,] cells, int j)
    {
        double s = 0;
        for (int i = 0; i < cells.GetLength(0); i++) s += cells[i, j];
        return s;
    }

    private static double GrandTotal(double[,] cells)
    {
        double s = 0;
        foreach (var v in cells) s += v;
        return s;
    }
}
