namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// Checks and factors the k × k scale matrix Σ of a multivariate normal or t. A wrong matrix is a caller's bug
/// (the model that produces it is tested), so these throw <see cref="ArgumentException"/>.
/// </summary>
internal static class ScaleMatrix
{
    // Relative asymmetry tolerated: a matrix built as A Aᵀ or by an update formula can differ in the last bits.
    private const double Asymmetry = 1e-12;

    // See SemidefiniteFactor.
    private const double ZeroPivot = 1e-12;
    private const double IndefinitePivot = 1e-8;
    private const double ResidualCorrelation = 1e-5;

    public static void Validate(double[,] scale, int k, string name)
    {
        ArgumentNullException.ThrowIfNull(scale, name);
        if (scale.GetLength(0) != k || scale.GetLength(1) != k)
            throw new ArgumentException($"The scale matrix must be {k} × {k}, one row and column per arm.", name);
        for (int i = 0; i < k; i++)
        {
            if (!(scale[i, i] >= 0) || double.IsInfinity(scale[i, i]))
                throw new ArgumentException($"Diagonal entry {i} of the scale matrix must be finite and non-negative.", name);
            for (int j = 0; j < i; j++)
            {
                double a = scale[i, j], b = scale[j, i];
                if (!double.IsFinite(a) || !double.IsFinite(b))
                    throw new ArgumentException($"Entry ({i}, {j}) of the scale matrix is not finite.", name);
                double size = Math.Max(Math.Max(Math.Abs(a), Math.Abs(b)), Math.Sqrt(scale[i, i] * scale[j, j]));
                if (Math.Abs(a - b) > Asymmetry * size)
                    throw new ArgumentException($"The scale matrix is not symmetric at ({i}, {j}).", name);
            }
        }
    }

    /// <summary>
    /// Lower-triangular L with L Lᵀ = Σ, in the arms' own order, for a positive semidefinite Σ: a pivot whose
    /// remaining variance is at most 1e-12 of the arm's own is taken as 0 and its column left empty; that arm is
    /// then an exact linear function of the arms before it. Throws when Σ is not positive semidefinite (a
    /// remaining variance below −1e-8 of the arm's own, or a dependent arm still correlated with a later one).
    /// </summary>
    public static double[,] SemidefiniteFactor(double[,] scale, string name)
    {
        int k = scale.GetLength(0);
        var l = new double[k, k];
        var empty = new bool[k];
        for (int j = 0; j < k; j++)
        {
            double own = scale[j, j];
            double d = own;
            for (int c = 0; c < j; c++) d -= l[j, c] * l[j, c];
            if (d < -IndefinitePivot * own) throw new ArgumentException("The scale matrix is not positive semidefinite.", name);
            empty[j] = d <= ZeroPivot * own;
            double pivot = empty[j] ? 0.0 : Math.Sqrt(d);
            l[j, j] = pivot;
            for (int i = j + 1; i < k; i++)
            {
                double sum = scale[i, j];
                for (int c = 0; c < j; c++) sum -= l[i, c] * l[j, c];
                if (empty[j])
                {
                    if (Math.Abs(sum) > ResidualCorrelation * Math.Sqrt(own * scale[i, i]))
                        throw new ArgumentException("The scale matrix is not positive semidefinite.", name);
                }
                else l[i, j] = sum / pivot;
            }
        }
        return l;
    }
}
