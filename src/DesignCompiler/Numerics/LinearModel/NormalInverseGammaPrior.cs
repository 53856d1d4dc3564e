namespace DesignCompiler.Numerics.LinearModel;

/// <summary>
/// The conjugate prior of the normal linear model y = Xβ + ε, ε ~ N(0, σ²I):
/// β | σ² ~ N(m0, σ²·Λ0⁻¹) and σ² ~ InvGamma(a0, b0) (shape a0, scale b0).
/// </summary>
/// <remarks>
/// The prior is held by its precision Λ0 = V0⁻¹ so that the reference prior is simply Λ0 = 0 (see <see cref="Flat"/>).
/// A proper prior needs Λ0 positive definite, a0 &gt; 0 and b0 &gt; 0; a prior that is flat in some coefficients
/// and proper in others is not offered, because its noise shape would have no one right value.
/// </remarks>
public sealed class NormalInverseGammaPrior
{
    private readonly double[] mean;
    private readonly double[,] precision;

    private NormalInverseGammaPrior(double[] mean, double[,] precision, double shape, double scale, bool flat)
    {
        this.mean = mean;
        this.precision = precision;
        Shape = shape;
        Scale = scale;
        IsFlat = flat;
    }

    /// <summary>A proper prior: mean m0, precision Λ0 (symmetric positive definite), shape a0 &gt; 0, scale b0 &gt; 0.</summary>
    public static NormalInverseGammaPrior Proper(IReadOnlyList<double> mean, double[,] precision, double shape, double scale)
    {
        ArgumentNullException.ThrowIfNull(mean);
        ArgumentNullException.ThrowIfNull(precision);
        int p = mean.Count;
        if (precision.GetLength(0) != p || precision.GetLength(1) != p)
            throw new ArgumentException("The precision must be square with one row per coefficient.", nameof(precision));
        if (mean.Any(m => !double.IsFinite(m))) throw new ArgumentException("Prior means must be finite.", nameof(mean));
        if (!(shape > 0) || !double.IsFinite(shape)) throw new ArgumentOutOfRangeException(nameof(shape), "The shape a0 must be positive and finite.");
        if (!(scale > 0) || !double.IsFinite(scale)) throw new ArgumentOutOfRangeException(nameof(scale), "The scale b0 must be positive and finite.");
        for (int i = 0; i < p; i++)
            for (int j = 0; j < i; j++)
                if (precision[i, j] != precision[j, i]) throw new ArgumentException("The precision must be symmetric.", nameof(precision));
        if (!Cholesky.Factor(precision).IsPositiveDefinite)
            throw new ArgumentException("The precision must be positive definite for a proper prior.", nameof(precision));
        return new NormalInverseGammaPrior(mean.ToArray(), (double[,])precision.Clone(), shape, scale, flat: false);
    }

    /// <summary>
    /// The reference prior p(β, σ²) ∝ 1/σ²: Λ0 → 0, b0 = 0 and a0 = −r/2, where r is the number of coefficients
    /// the data identify (r = p for a full-rank design). Its posterior is the classical least-squares result
    /// (Gelman et al., <i>Bayesian Data Analysis</i>, 3rd ed., §14.2; section from memory): β̂, (XᵀX)⁻¹ and
    /// σ² ~ InvGamma((n − r)/2, RSS/2), so the noise scale b_n/a_n is the residual mean square RSS/(n − r).
    /// </summary>
    public static NormalInverseGammaPrior Flat(int coefficients)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(coefficients);
        // a0 is set at the update, once the rank is known; the stored −p/2 is the full-rank value.
        return new NormalInverseGammaPrior(new double[coefficients], new double[coefficients, coefficients], -0.5 * coefficients, 0, flat: true);
    }

    public bool IsFlat { get; }

    public int Coefficients => mean.Length;

    /// <summary>a0.</summary>
    public double Shape { get; }

    /// <summary>b0.</summary>
    public double Scale { get; }

    public double Mean(int i) => mean[i];

    /// <summary>Λ0[i, j] = (V0⁻¹)[i, j].</summary>
    public double Precision(int i, int j) => precision[i, j];

    internal ReadOnlySpan<double> MeanVector => mean;

    internal double[,] PrecisionMatrix => precision;
}
