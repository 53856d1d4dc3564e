namespace DesignCompiler.Numerics.LinearModel;

/// <summary>
/// The Cholesky factor A = L·Lᵀ of a small dense symmetric positive semi-definite matrix, computed column by
/// column (the left-looking form of Golub &amp; Van Loan, <i>Matrix Computations</i>, §4.2; section from memory).
/// </summary>
/// <remarks>
/// A column whose pivot falls to rounding noise is a linear combination of the columns before it. Rather than
/// fail, the factorisation marks it dependent and leaves it out, which is exactly the Cholesky factor of the
/// submatrix of the remaining columns. <see cref="Solve"/>, <see cref="Inverse"/> and <see cref="LogDeterminant"/>
/// then work on that submatrix: the inverse, padded with zeros, is a generalised inverse of A, which is what a
/// least-squares fit of a rank-deficient design needs. For a positive definite A nothing is left out and all
/// three are the ordinary ones.
/// </remarks>
public sealed class Cholesky
{
    // A pivot below this fraction of its own diagonal entry is what rounding leaves of a column that the earlier
    // columns span: design matrices of 0/±1 codes give exact zeros, and genuine pivots are many orders larger.
    internal const double DependenceTolerance = 1e-10;

    private readonly double[,] lower;
    private readonly bool[] dependent;

    private Cholesky(double[,] lower, bool[] dependent, int rank)
    {
        this.lower = lower;
        this.dependent = dependent;
        Rank = rank;
    }

    /// <summary>Factors a symmetric matrix (only its lower triangle is read).</summary>
    /// <exception cref="ArgumentException">The matrix is not square, holds a value that is not finite, or is not positive semi-definite.</exception>
    public static Cholesky Factor(double[,] a) => Factor(a, DependenceTolerance);

    /// <summary>Factors with a chosen tolerance; 0 leaves out only columns whose pivot is not positive at all.</summary>
    internal static Cholesky Factor(double[,] a, double dependenceTolerance)
    {
        ArgumentNullException.ThrowIfNull(a);
        int n = a.GetLength(0);
        if (a.GetLength(1) != n) throw new ArgumentException("The matrix must be square.", nameof(a));
        var l = new double[n, n];
        var skip = new bool[n];
        int rank = 0;
        for (int j = 0; j < n; j++)
        {
            double diagonal = a[j, j];
            if (!double.IsFinite(diagonal)) throw new ArgumentException("The matrix holds a value that is not finite.", nameof(a));
            double pivot = diagonal;
            for (int k = 0; k < j; k++) pivot -= l[j, k] * l[j, k];
            if (diagonal < 0 || pivot < -DependenceTolerance * diagonal - double.Epsilon)
                throw new ArgumentException("The matrix is not positive semi-definite.", nameof(a));
            if (pivot <= dependenceTolerance * diagonal)
            {
                skip[j] = true;
                continue;
            }
            double root = Math.Sqrt(pivot);
            l[j, j] = root;
            rank++;
            for (int i = j + 1; i < n; i++)
            {
                double s = a[i, j];
                if (!double.IsFinite(s)) throw new ArgumentException("The matrix holds a value that is not finite.", nameof(a));
                for (int k = 0; k < j; k++) s -= l[i, k] * l[j, k];
                l[i, j] = s / root;
            }
        }
        return new Cholesky(l, skip, rank);
    }

    public int Size => dependent.Length;

    /// <summary>How many columns were kept: the numerical rank of A.</summary>
    public int Rank { get; }

    public bool IsPositiveDefinite => Rank == Size;

    /// <summary>Whether column k was left out as a combination of the columns before it.</summary>
    public bool IsDependent(int k) => dependent[k];

    /// <summary>L[i, j] (zero above the diagonal and in dependent columns).</summary>
    public double Lower(int i, int j) => lower[i, j];

    /// <summary>
    /// x with A·x = b on the kept columns; entries of dependent columns are zero and b's entries there are not read.
    /// </summary>
    public double[] Solve(ReadOnlySpan<double> b)
    {
        int n = Size;
        if (b.Length != n) throw new ArgumentException("The right-hand side has the wrong length.", nameof(b));
        var x = new double[n];
        for (int i = 0; i < n; i++)
        {
            if (dependent[i]) continue;
            double s = b[i];
            for (int k = 0; k < i; k++) s -= lower[i, k] * x[k];
            x[i] = s / lower[i, i];
        }
        for (int i = n - 1; i >= 0; i--)
        {
            if (dependent[i]) continue;
            double s = x[i];
            for (int k = i + 1; k < n; k++) s -= lower[k, i] * x[k];
            x[i] = s / lower[i, i];
        }
        return x;
    }

    /// <summary>A⁻¹ (for a singular A: the inverse of the kept submatrix, zero in the dependent rows and columns).</summary>
    public double[,] Inverse()
    {
        int n = Size;
        var inverse = new double[n, n];
        var unit = new double[n];
        for (int j = 0; j < n; j++)
        {
            if (dependent[j]) continue;
            unit[j] = 1;
            var column = Solve(unit);
            unit[j] = 0;
            for (int i = 0; i < n; i++) inverse[i, j] = column[i];
        }
        // The two triangles are computed by different sums; make the result exactly symmetric.
        for (int i = 0; i < n; i++)
            for (int j = 0; j < i; j++)
                inverse[i, j] = inverse[j, i] = 0.5 * (inverse[i, j] + inverse[j, i]);
        return inverse;
    }

    /// <summary>ln det A = 2 Σ ln L[k, k] (for a singular A: of the kept submatrix).</summary>
    public double LogDeterminant
    {
        get
        {
            double sum = 0;
            for (int k = 0; k < Size; k++)
                if (!dependent[k]) sum += Math.Log(lower[k, k]);
            return 2 * sum;
        }
    }
}
