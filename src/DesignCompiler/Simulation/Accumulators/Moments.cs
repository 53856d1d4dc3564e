namespace DesignCompiler.Simulation.Accumulators;

/// <summary>
/// Count, exact sum and exact sum of squares of one per-replication figure: enough for its
/// mean and Monte Carlo standard error, whatever the order the replications were added in.
/// </summary>
public sealed class Moments
{
    public long Count { get; private set; }
    public ExactSum Sum { get; } = new();
    public ExactSum Squares { get; } = new();

    public void Add(double value)
    {
        Count++;
        Sum.Add(value);
        // x² exactly, as the rounded product plus its rounding error, which a fused multiply-add
        // gives exactly (an error-free transformation; Ogita, Rump and Oishi 2005, from memory).
        var square = value * value;
        Squares.Add(square);
        Squares.Add(Math.FusedMultiplyAdd(value, value, -square));
    }

    public void Add(Moments other)
    {
        Count += other.Count;
        Sum.Add(other.Sum);
        Squares.Add(other.Squares);
    }

    /// <summary>Restores a saved state (from a partial summary file).</summary>
    internal void Set(long count, System.Numerics.BigInteger sumUnits, System.Numerics.BigInteger squareUnits)
    {
        Count = count;
        Sum.SetUnits(sumUnits);
        Squares.SetUnits(squareUnits);
    }

    /// <summary>
    /// The mean and its standard error s/√n, with the sample variance s² = (nΣx² − (Σx)²)/(n(n−1))
    /// formed in exact integer arithmetic from exact sums of x and x², so a figure that never
    /// varies has standard error 0 exactly rather than rounding noise (common practice for the
    /// standard error of a mean).
    /// </summary>
    public Estimate Estimate()
    {
        if (Count == 0) return Accumulators.Estimate.None;
        var mean = ScaledInteger.ToDouble(Sum.Units, -1074) / Count;
        if (Count == 1) return new Estimate(mean, double.NaN, 1);
        var s = Sum.Units;
        var spread = ((Squares.Units * Count) << 1074) - s * s;
        var nTimesSquaredDeviations = Math.Max(0, ScaledInteger.ToDouble(spread, -2148));
        var n = (double)Count;
        return new Estimate(mean, Math.Sqrt(nTimesSquaredDeviations / (n * n * (n - 1))), Count);
    }
}
