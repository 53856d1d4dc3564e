using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

/// <summary>
/// The P(best) screen drops arms whose cheap, closed-form bounds end below where another arm's surely begin.
/// That is only safe if the bounds contain the support: the 1e-16 tail quantiles.
/// </summary>
public class SupportScreenTests
{
    // a, b, lower and upper 1e-16 quantiles of Beta(a, b): bisection on mpmath.betainc (regularized), 30 digits.
    [Theory]
    [InlineData(30, 70, 0.046662883121155068, 0.69921145470496941)]
    [InlineData(2, 3, 4.0824829157497413e-9, 0.99999707598012431)]
    [InlineData(1, 40, 2.5000000000000001e-18, 0.60189282944650275)]
    [InlineData(400, 700, 0.25151515051146703, 0.48657272801200939)]
    public void CheapBoundsContainTheTailQuantiles(double a, double b, double lower, double upper)
    {
        IQuadratureProfile beta = new BetaMarginal(a, b);
        Assert.True(beta.WideSupport(1e-16, out double lo, out double hi));
        Assert.True(lo <= lower, $"lower bound {lo} above the quantile {lower}");
        Assert.True(hi >= upper, $"upper bound {hi} below the quantile {upper}");
        // And the support the quadrature searches for lies inside them, whatever its search tolerance.
        beta.Support(1e-16, out double searchedLo, out double searchedHi, out _, out _);
        Assert.InRange(searchedLo, lo, hi);
        Assert.InRange(searchedHi, lo, hi);
    }

    [Fact]
    public void ScreenedArmsGetZeroAndTheOthersTheirTwoArmValue()
    {
        // Beta(200, 9800) sits about 40 sd below the other two; with it screened out the rest is the two-arm
        // problem, whose answer is P(X > Y) for X ~ Beta(30, 70), Y ~ Beta(35, 65) (mpmath: the quadrature of
        // f_X · betainc(35, 65, 0, x) over [0, 1] at 30 digits, 0.223776978581439012).
        var result = ProbabilityOfBest.Compute([new BetaMarginal(30, 70), new BetaMarginal(200, 9800), new BetaMarginal(35, 65)]);
        Assert.Equal(0.0, result.Probabilities[1]);
        NumericAssert.Absolute(0.223776978581439012, result.Probabilities[0], 1e-12, "P(Beta(30,70) best)");
    }
}
