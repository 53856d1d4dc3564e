using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

public class StandardNormalTests
{
    [Fact]
    public void QuantileAtNinetySevenAndAHalfPercent()
    {
        // NK04 (REFERENCES.md §3): z_0.975 = 1.95996398454005423552459443052, mpmath at 50 digits, for the
        // decimal p; the double 0.975 lies 2.2e-17 lower, which moves z by 3.8e-16.
        NumericAssert.Relative(1.95996398454005423552459443052, StandardNormal.Quantile(0.975), 5e-16, "z(0.975)");
    }

    // Expected values: mpmath 1.3.0 ncdf at 40 digits (make_reference_values.py "normal").
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
    public void UpperTailMatchesMpmath(double z, double expected)
    {
        NumericAssert.Relative(expected, StandardNormal.UpperTail(z), 3e-15, $"Q({z})");
        NumericAssert.Relative(expected, StandardNormal.Cdf(-z), 3e-15, $"Φ({-z})");
    }

    // Expected values: mpmath findroot on ncdf at 40 digits, at the double p.
    [Theory]
    [InlineData(1e-300, -37.04709629936119923654704)]
    [InlineData(1e-100, -21.27345356096532429417952)]
    [InlineData(1e-20, -9.262340089798407579572095)]
    [InlineData(1e-10, -6.361340902404056199100397)]
    [InlineData(0.001, -3.090232306167813535358005)]
    [InlineData(0.3, -0.5244005127080408159694544)]
    [InlineData(0.9, 1.281551565544600593487448)]
    public void QuantileMatchesMpmath(double p, double expected) =>
        NumericAssert.Relative(expected, StandardNormal.Quantile(p), 4e-16, $"z({p})");

    [Fact]
    public void QuantileIsExactlyAntisymmetric()
    {
        // For p ≥ ½ the complement 1 − p is exact, so Φ⁻¹(p) = −Φ⁻¹(1 − p) holds bit for bit.
        foreach (double p in new[] { 0.975, 0.6, 1 - Math.Pow(2, -40) })
        {
            Assert.Equal(-StandardNormal.Quantile(1 - p), StandardNormal.Quantile(p));
        }
        Assert.Equal(0.0, StandardNormal.Quantile(0.5));
    }

    [Fact]
    public void LogPdfIsTheNormalDensity()
    {
        // φ(z) = e^(−z²/2)/√(2π).
        foreach (double z in new[] { 0.0, 1.5, -7.0 })
        {
            NumericAssert.Relative(Math.Exp(-z * z / 2) / Math.Sqrt(2 * Math.PI), Math.Exp(StandardNormal.LogPdf(z)), 4e-15, "φ");
            NumericAssert.Relative(Math.Exp(-z * z / 2) / Math.Sqrt(2 * Math.PI), StandardNormal.Pdf(z), 4e-15, "φ");
        }
    }
}
