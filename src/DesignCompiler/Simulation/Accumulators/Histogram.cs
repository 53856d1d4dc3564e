namespace DesignCompiler.Simulation.Accumulators;

/// <summary>
/// Exact counts of a whole-number figure over 0..<see cref="Maximum"/> (plots of an arm in a
/// round, an arm's plots in a trial). Integer counts merge exactly in any order, and give
/// exact quantiles without keeping any replication.
/// </summary>
public sealed class Histogram
{
    private readonly long[] _counts;

    public Histogram(int maximum) => _counts = new long[maximum + 1];

    public int Maximum => _counts.Length - 1;

    public long Total { get; private set; }

    public long this[int value] => _counts[value];

    public ReadOnlySpan<long> Counts => _counts;

    public void Add(int value)
    {
        _counts[value]++;
        Total++;
    }

    public void Add(Histogram other)
    {
        if (other.Maximum != Maximum) throw new ArgumentException("Histograms of different ranges cannot be merged.");
        for (var i = 0; i < _counts.Length; i++) _counts[i] += other._counts[i];
        Total += other.Total;
    }

    internal void Set(IReadOnlyList<long> counts)
    {
        if (counts.Count != _counts.Length) throw new FormatException("a histogram has the wrong number of bins");
        Total = 0;
        for (var i = 0; i < _counts.Length; i++)
        {
            if (counts[i] < 0) throw new FormatException("a histogram count is negative");
            _counts[i] = counts[i];
            Total += counts[i];
        }
    }

    /// <summary>The mean value, from exact integer sums.</summary>
    public double Mean()
    {
        if (Total == 0) return double.NaN;
        Int128 sum = 0;
        for (var i = 0; i < _counts.Length; i++) sum += (Int128)i * _counts[i];
        return (double)sum / Total;
    }

    /// <summary>
    /// The smallest value x with at least <paramref name="percent"/> % of the replications at or
    /// below x (the inverse of the empirical distribution function, Hyndman and Fan's type 1;
    /// common practice). Compared in integers, so no rounding can move it. Null when empty.
    /// </summary>
    public int? Quantile(int percent)
    {
        if (Total == 0) return null;
        Int128 cumulative = 0;
        for (var i = 0; i < _counts.Length; i++)
        {
            cumulative += _counts[i];
            if (cumulative * 100 >= (Int128)percent * Total) return i;
        }
        return Maximum;
    }
}
