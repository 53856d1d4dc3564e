namespace DesignCompiler.Tests.Randomness;

/// <summary>Checks the test-side chi-square machinery before the sampler tests lean on it.</summary>
public class ChiSquareHelperTests
{
    // Reference values: mpmath 1.3.0, gammainc(df/2, x/2, inf, regularized=True) at 30 digits.
    [Theory]
    [InlineData(1, 3.841458820694124, 0.050000000000000057435)]
    [InlineData(9, 16.918977604620448, 0.050000000000000031508)]
    [InlineData(23, 35.17246162690806, 0.049999999999999990217)]
    [InlineData(9, 2.0, 0.99146760662881353451)]
    [InlineData(23, 10.0, 0.99127664526668898139)]
    [InlineData(4, 30.0, 4.8944371280292126139e-6)]
    [InlineData(50, 49.0, 0.51349508364129067656)]
    [InlineData(100, 150.0, 0.00090393204235400908576)]
    [InlineData(2, 0.0001, 0.99995000124997916692)]
    public void UpperTailMatchesMpmath(int df, double statistic, double expected)
    {
        double actual = ChiSquare.UpperTail(df, statistic);
        Assert.True(Math.Abs(actual - expected) <= 1e-10 * expected, $"Q = {actual:R}, expected {expected:R}");
    }

    // Critical values: mpmath 1.3.0, findroot on the regularized lower incomplete gamma.
    [Theory]
    [InlineData(9, 1.15194954622356, 0.999)]
    [InlineData(9, 27.8771648712566, 0.001)]
    [InlineData(23, 7.52923976523009, 0.999)]
    [InlineData(23, 49.7282324664315, 0.001)]
    public void CriticalValuesHaveTheirTailProbability(int df, double critical, double upperTail)
    {
        Assert.Equal(upperTail, ChiSquare.UpperTail(df, critical), 1e-12);
    }

    // mpmath 1.3.0, loggamma(z), 25 digits.
    [Theory]
    [InlineData(22.0, 45.38013889847690802616047)]
    [InlineData(101.0, 363.73937555556349014408)]
    [InlineData(1000001.0, 12815518.38465816962425108)]
    public void LogGammaMatchesMpmath(double z, double expected)
    {
        Assert.True(Math.Abs(SpecialFunctions.LogGamma(z) - expected) <= 2e-15 * expected);
    }
}
