namespace DesignCompiler.Numerics.LinearModel;

/// <summary>
/// The posterior of a normal linear model: β | σ², y ~ N(m_n, σ²·V_n) and σ² | y ~ InvGamma(a_n, b_n), so the marginal
/// of β is multivariate t with ν = 2a_n, location m_n and scale (b_n/a_n)·V_n.
/// </summary>
/// <remarks>
/// Under the flat prior a coefficient the data do not identify (an arm never observed, or one confounded with a
/// round) has no posterior: <see cref="IsEstimable"/> is false and <see cref="Mean"/>, <see cref="Marginal"/> give
/// null, never NaN. Nor has any coefficient when the noise is not identified (no residual degrees of freedom, or an
/// exact fit).
/// </remarks>
public sealed class RegressionPosterior
{
    private readonly double[] mean;
    private readonly double[,] covariance;
    private readonly bool[] estimable;

    internal RegressionPosterior(int observations, int rank, double[] mean, double[,] covariance, bool[] estimable,
        double shape, double scale, double residualSumOfSquares, double? logMarginalLikelihood)
    {
        Observations = observations;
        Rank = rank;
        this.mean = mean;
        this.covariance = covariance;
        this.estimable = estimable;
        Shape = shape;
        Scale = scale;
        ResidualSumOfSquares = residualSumOfSquares;
        LogMarginalLikelihood = logMarginalLikelihood;
    }

    public int Observations { get; }

    public int Coefficients => mean.Length;

    /// <summary>The numerical rank of Λ0 + XᵀX (p for a proper prior).</summary>
    public int Rank { get; }

    /// <summary>a_n.</summary>
    public double Shape { get; }

    /// <summary>b_n.</summary>
    public double Scale { get; }

    /// <summary>ν = 2a_n, the degrees of freedom of every marginal (n − r under the flat prior).</summary>
    public double Df => 2 * Shape;

    /// <summary>Σ(y − X·m_n)².</summary>
    public double ResidualSumOfSquares { get; }

    /// <summary>Whether σ² has a proper posterior: a_n &gt; 0 and b_n &gt; 0.</summary>
    public bool NoiseIdentified => Shape > 0 && Scale > 0;

    /// <summary>
    /// b_n/a_n, the factor that turns V_n into the t scale matrix. Under the flat prior it is RSS/(n − r), the
    /// residual mean square of least squares, exactly; the posterior mean of σ², b_n/(a_n − 1), is larger.
    /// </summary>
    public double? NoiseScaleSquared => NoiseIdentified ? Scale / Shape : null;

    /// <summary>E[σ² | y] = b_n/(a_n − 1), defined for a_n &gt; 1.</summary>
    public double? NoiseVarianceMean => NoiseIdentified && Shape > 1 ? Scale / (Shape - 1) : null;

    /// <summary>ln p(y) under a proper prior (null under the flat prior, whose evidence is not defined).</summary>
    public double? LogMarginalLikelihood { get; }

    /// <summary>Whether coefficient j has a posterior of its own.</summary>
    public bool IsEstimable(int j) => estimable[j] && NoiseIdentified;

    /// <summary>m_n[j], or null when j is not identified.</summary>
    public double? Mean(int j) => estimable[j] ? mean[j] : null;

    /// <summary>V_n[i, j], the posterior covariance of β in units of σ² (zero in rows the flat prior cannot identify).</summary>
    public double Covariance(int i, int j) => covariance[i, j];

    /// <summary>The t marginal of coefficient j, or null when it is not identified.</summary>
    public StudentTMarginal? Marginal(int j)
    {
        if (!IsEstimable(j)) return null;
        double scale2 = Scale / Shape * covariance[j, j];
        return scale2 > 0 ? new StudentTMarginal(Df, mean[j], Math.Sqrt(scale2)) : null;
    }

    /// <summary>The joint multivariate t of the given coefficients, or null when any of them is not identified.</summary>
    public MultivariateT? Joint(IReadOnlyList<int> columns)
    {
        ArgumentNullException.ThrowIfNull(columns);
        if (columns.Count == 0 || columns.Any(j => !IsEstimable(j))) return null;
        int k = columns.Count;
        double factor = Scale / Shape;
        var scale = new double[k, k];
        var location = new double[k];
        for (int a = 0; a < k; a++)
        {
            location[a] = mean[columns[a]];
            for (int b = 0; b < k; b++) scale[a, b] = factor * covariance[columns[a], columns[b]];
        }
        return new MultivariateT(Df, location, scale);
    }
}
