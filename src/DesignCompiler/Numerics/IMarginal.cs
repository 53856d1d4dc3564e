namespace DesignCompiler.Numerics;

/// <summary>
/// One arm's posterior distribution for its mean (or for any continuous value derived from it).
/// Implementations are immutable and safe to share across threads.
/// </summary>
public interface IMarginal
{
    /// <summary>The mean; for a distribution without one (Student-t with df ≤ 1) its centre of symmetry.</summary>
    double Mean { get; }

    /// <summary>The standard deviation; +∞ when the variance does not exist.</summary>
    double StdDev { get; }

    /// <summary>Lower end of the support, possibly −∞.</summary>
    double LowerBound { get; }

    /// <summary>Upper end of the support, possibly +∞.</summary>
    double UpperBound { get; }

    double LogDensity(double x);

    double Density(double x);

    /// <summary>P(X ≤ x).</summary>
    double Cdf(double x);

    /// <summary>P(X &gt; x) = 1 − Cdf(x), computed without cancellation where it is small.</summary>
    double UpperTail(double x);

    /// <summary>The x with Cdf(x) = p.</summary>
    double Quantile(double p);
}
