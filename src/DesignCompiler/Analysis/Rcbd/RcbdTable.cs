namespace DesignCompiler.Analysis.Rcbd;

/// <summary>
/// A randomized complete block table: one plot per treatment per block, treatments as rows and blocks (replications)
/// as columns. A plot that was lost is null.
/// </summary>
public sealed class RcbdTable
{
    private readonly double?[,] values;

    /// <exception cref="ArgumentException">A recorded value is not finite.</exception>
    public RcbdTable(double?[,] values)
    {
        ArgumentNullException.ThrowIfNull(values);
        foreach (var v in values)
            if (v is { } x && !double.IsFinite(x)) throw new ArgumentException("Every recorded value must be finite.", nameof(values));
        this.values = (double?[,])values.Clone();
    }

    /// <summary>A table with every plot recorded.</summary>
    public static RcbdTable Complete(double[,] values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var copy = new double?[values.GetLength(0), values.GetLength(1)];
        for (int i = 0; i < values.GetLength(0); i++)
            for (int j = 0; j < values.GetLength(1); j++) copy[i, j] = values[i, j];
        return new RcbdTable(copy);
    }

    /// <summary>t, the number of treatments (rows).</summary>
    public int Treatments => values.GetLength(0);

    /// <summary>b, the number of blocks (columns).</summary>
    public int Blocks => values.GetLength(1);

    public double? this[int treatment, int block] => values[treatment, block];

    public int MissingCount
    {
        get
        {
            int count = 0;
            foreach (var v in values) if (v is null) count++;
            return count;
        }
    }
}
