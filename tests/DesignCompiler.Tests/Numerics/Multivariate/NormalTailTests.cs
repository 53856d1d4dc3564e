using DesignCompiler.Numerics;
using DesignCompiler.Numerics.Multivariate;

namespace DesignCompiler.Tests.Numerics.Multivariate;

public class NormalTailTests
{
    // mpmath 1 − ncdf at 40 digits (Numerics/reference/make_reference_values.py, the values StandardNormalTests use).
    [Theory]
    [InlineData(-5, 0.9999997133484281208060883)]
    [InlineData(-1, 0.8413447460685429485852325)]
    [InlineData(0.5, 0.3085375387259868963622954)]
    [InlineData(1.9, 0.02871655981600180522919203)]
    [InlineData(2.1, 0.01786442056281655287739616)]
    [InlineData(5, 0.0000002866515718791939116737523)]
    [InlineData(10, 7.619853024160526065973343e-24)]
    [InlineData(20, 2.753624118606233695075623e-89)]
    [InlineData(37.5, 4.605353009581954843827969e-308)]
    public void UpperTailMatchesMpmath(double z, double expected) =>
        NumericAssert.Relative(expected, NormalTail.Upper(z), 5e-15, $"1 − Φ({z})");

    // The same file's inverse-CDF values (mpmath findroot on ncdf): the upper quantile of q is −Φ⁻¹(q).
    [Theory]
    [InlineData(1e-300, -37.04709629936119923654704)]
    [InlineData(1e-100, -21.27345356096532429417952)]
    [InlineData(1e-20, -9.262340089798407579572095)]
    [InlineData(1e-10, -6.361340902404056199100397)]
    [InlineData(0.001, -3.090232306167813535358005)]
    [InlineData(0.3, -0.5244005127080408159694544)]
    public void UpperQuantileMatchesMpmath(double q, double quantile) =>
        NumericAssert.Relative(-quantile, NormalTail.UpperQuantile(q), 2e-15, $"upper quantile of {q}");

    [Fact]
    public void AgreesWithTheAccurateNormalEverywhere()
    {
        // Against StandardNormal (itself checked against mpmath) on a dense grid: every tail to 1e-14 relative
        // while it is a normal double, every quantile to 3e-15 · max(1, z).
        for (int i = 0; i <= 20000; i++)
        {
            double z = -8 + 45.5 * i / 20000;
            double expected = StandardNormal.UpperTail(z);
            NumericAssert.Relative(expected, NormalTail.Upper(z), 1e-14, $"tail at {z}");
            double q = 0.5 * Math.Exp(-690.0 * i / 20000);
            double x = -StandardNormal.Quantile(q);
            NumericAssert.Absolute(x, NormalTail.UpperQuantile(q), 3e-15 * Math.Max(1, x), $"quantile of {q}");
        }
    }

    [Fact]
    public void IntervalsFarOutKeepTheirRelativeAccuracy()
    {
        // P(8 < Z < 8.5) from two upper tails, and its mirror (elementary; reference values above).
        double expected = StandardNormal.UpperTail(8) - StandardNormal.UpperTail(8.5);
        NumericAssert.Relative(expected, NormalTail.Between(8, 8.5), 1e-13, "far right");
        NumericAssert.Relative(expected, NormalTail.Between(-8.5, -8), 1e-13, "far left");
        Assert.Equal(0.0, NormalTail.Between(1, 1));
        Assert.Equal(1.0, NormalTail.Between(double.NegativeInfinity, double.PositiveInfinity));
    }
}
