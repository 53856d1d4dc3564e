namespace DesignCompiler.Numerics.LinearModel;

/// <summary>
/// A multivariate Student-t: x = μ + z/√(w/ν) with z ~ N(0, Σ) and w ~ χ²_ν. Σ is the scale matrix (the covariance
/// is ν/(ν − 2)·Σ for ν &gt; 2). Each coordinate alone is a location-scale t with ν degrees of freedom and scale √Σ[i, i].
/// </summary>
public sealed class MultivariateT
{
    private readonly double[] location;
    private readonly double[,] scale;

    public MultivariateT(double df, IReadOnlyList<double> location, double[,] scale)
    {
        ArgumentNullException.ThrowIfNull(location);
        ArgumentNullException.ThrowIfNull(scale);
        if (!StudentT.ValidDf(df)) throw new ArgumentOutOfRangeException(nameof(df), "Degrees of freedom must be positive and finite.");
        int k = location.Count;
        if (scale.GetLength(0) != k || scale.GetLength(1) != k)
            throw new ArgumentException("The scale matrix must be square with one row per coordinate.", nameof(scale));
        Df = df;
        this.location = location.ToArray();
        this.scale = (double[,])scale.Clone();
    }

    public double Df { get; }

    public int Dimension => location.Length;

    public double Location(int i) => location[i];

    /// <summary>Σ[i, j].</summary>
    public double Scale(int i, int j) => scale[i, j];

    /// <summary>The correlation Σ[i, j]/√(Σ[i, i]·Σ[j, j]) of coordinates i and j.</summary>
    public double Correlation(int i, int j) => scale[i, j] / Math.Sqrt(scale[i, i] * scale[j, j]);

    /// <summary>Coordinate i alone.</summary>
    public StudentTMarginal Marginal(int i) => new(Df, location[i], Math.Sqrt(scale[i, i]));
}
