using DesignCompiler.Numerics.LinearModel;
using DesignCompiler.Randomness;
using DesignCompiler.Tests.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace DesignCompiler.Tests.Analysis;

public sealed class CholeskyTests
{
    [Fact]
    public void Factor_of_the_textbook_example_is_exact()
    {
        // A common worked example (Wikipedia, "Cholesky decomposition", from memory): A = [[4, 12, −16], [12, 37, −43],
        // [−16, −43, 98]] = L·Lᵀ with L = [[2, 0, 0], [6, 1, 0], [−8, 5, 3]], so det A = (2·1·3)² = 36.
        var factor = Cholesky.Factor(new double[,] { { 4, 12, -16 }, { 12, 37, -43 }, { -16, -43, 98 } });
        double[,] expected = { { 2, 0, 0 }, { 6, 1, 0 }, { -8, 5, 3 } };
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++) Assert.Equal(expected[i, j], factor.Lower(i, j), 14);
        Assert.True(factor.IsPositiveDefinite);
        Assert.Equal(Math.Log(36), factor.LogDeterminant, 14);
    }

    [Theory]
    [InlineData(1UL, 1)]
    [InlineData(2UL, 4)]
    [InlineData(3UL, 9)]
    [InlineData(4UL, 17)]
    public void Solve_inverse_and_log_determinant_agree_with_MathNet(ulong seed, int size)
    {
        // Reference library: MathNet.Numerics 5.0 (its own Cholesky, inverse and determinant).
        var a = RandomSpd(seed, size);
        var rng = new Xoshiro256StarStar(seed + 100);
        var b = Enumerable.Range(0, size).Select(_ => Samplers.StandardNormal(ref rng)).ToArray();
        var reference = Matrix<double>.Build.DenseOfArray(a);
        var factor = Cholesky.Factor(a);

        var x = factor.Solve(b);
        var expectedX = reference.Cholesky().Solve(Vector<double>.Build.DenseOfArray(b));
        for (int i = 0; i < size; i++) NumericAssert.Relative(expectedX[i], x[i], 1e-11, $"x[{i}]");

        var inverse = factor.Inverse();
        var expectedInverse = reference.Inverse();
        for (int i = 0; i < size; i++)
            for (int j = 0; j < size; j++)
                NumericAssert.Absolute(expectedInverse[i, j], inverse[i, j], 1e-11 * expectedInverse.L1Norm(), $"inverse[{i},{j}]");

        NumericAssert.Relative(reference.Cholesky().DeterminantLn, factor.LogDeterminant, 1e-12, "ln det");
    }

    [Fact]
    public void A_dependent_column_is_left_out_and_the_inverse_is_a_generalised_inverse()
    {
        // Column 3 of X is column 1 + column 2, so XᵀX has rank 3 of 4. Penrose (1955), condition 1: a generalised inverse
        // G of A satisfies A·G·A = A. Products by MathNet.
        double[,] x = { { 1, 0, 1, 2 }, { 0, 1, 1, 0 }, { 1, 1, 2, 1 }, { 1, 0, 1, -1 }, { 0, 1, 1, 3 } };
        var gram = DenseMatrix.Gram(x);
        var factor = Cholesky.Factor(gram);
        Assert.Equal(3, factor.Rank);
        Assert.False(factor.IsPositiveDefinite);
        Assert.True(factor.IsDependent(2));
        Assert.Equal(3, Matrix<double>.Build.DenseOfArray(x).Rank());

        var a = Matrix<double>.Build.DenseOfArray(gram);
        var g = Matrix<double>.Build.DenseOfArray(factor.Inverse());
        var back = a * g * a;
        for (int i = 0; i < 4; i++)
            for (int j = 0; j < 4; j++) NumericAssert.Absolute(gram[i, j], back[i, j], 1e-10, $"AGA[{i},{j}]");
    }

    [Fact]
    public void A_matrix_that_is_not_positive_semidefinite_is_refused()
    {
        // Common practice: [[1, 2], [2, 1]] has eigenvalues 3 and −1.
        Assert.Throws<ArgumentException>(() => Cholesky.Factor(new double[,] { { 1, 2 }, { 2, 1 } }));
        Assert.Throws<ArgumentException>(() => Cholesky.Factor(new double[,] { { 1, double.NaN }, { double.NaN, 1 } }));
    }

    private static double[,] RandomSpd(ulong seed, int size)
    {
        // BᵀB + I for a random B is symmetric positive definite.
        var rng = new Xoshiro256StarStar(seed);
        var b = new double[size + 2, size];
        for (int i = 0; i < size + 2; i++)
            for (int j = 0; j < size; j++) b[i, j] = Samplers.StandardNormal(ref rng);
        var a = DenseMatrix.Gram(b);
        for (int i = 0; i < size; i++) a[i, i] += 1;
        return a;
    }
}
