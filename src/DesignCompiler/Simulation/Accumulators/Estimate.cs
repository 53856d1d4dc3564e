namespace DesignCompiler.Simulation.Accumulators;

/// <summary>A Monte Carlo estimate: the mean over <see cref="Count"/> replications and its standard error.</summary>
public readonly record struct Estimate(double Mean, double StandardError, long Count)
{
    /// <summary>No replication contributed: both numbers are NaN and print as "null" or "-".</summary>
    public static Estimate None { get; } = new(double.NaN, double.NaN, 0);

    /// <summary>z for a two-sided 95 % normal interval (Φ⁻¹(0.975), common practice).</summary>
    public const double Z95 = 1.959963984540054;

    public double Lower95 => Mean - Z95 * StandardError;
    public double Upper95 => Mean + Z95 * StandardError;

    /// <summary>A proportion: k of n, with the standard error of a mean of 0/1 values (sample variance, as for every other figure).</summary>
    public static Estimate FromCount(long n, long k)
    {
        if (n == 0) return None;
        var p = (double)k / n;
        if (n == 1) return new Estimate(p, double.NaN, 1);
        // nΣx² − (Σx)² = nk − k² for 0/1 values, exactly in 128-bit integers.
        var spread = (Int128)n * k - (Int128)k * k;
        var nn = (double)n;
        return new Estimate(p, Math.Sqrt((double)spread / (nn * nn * (nn - 1))), n);
    }
}
