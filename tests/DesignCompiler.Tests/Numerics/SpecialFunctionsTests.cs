using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

public class SpecialFunctionsTests
{
    // Expected values: mpmath 1.3.0 loggamma at 40 digits (reference/make_reference_values.py, section "special").
    [Theory]
    [InlineData(1e-300, 690.7755278982137051803383)]
    [InlineData(1e-8, 18.42068073818020888445275)]
    [InlineData(0.1, 2.252712651734205902006238)]
    [InlineData(0.5, 0.5723649429247000870717137)]
    [InlineData(0.9999999, 5.772157468444192826317855e-8)]
    [InlineData(1.5, -0.1207822376352452223455184)]
    [InlineData(2.0000001, 4.227843666532497923203435e-8)]
    [InlineData(2.5, 0.2846828704729191596324947)]
    [InlineData(3.7, 1.428072326665388129200498)]
    [InlineData(7.25, 7.052185450738539444925749)]
    [InlineData(9.999, 12.79957578007741371468892)]
    [InlineData(10, 12.80182748008146961120772)]
    [InlineData(10.5, 13.94062521940376363316124)]
    [InlineData(100, 359.134205369575398776044)]
    [InlineData(12345.678, 103959.9199055460598243294)]
    [InlineData(1e6, 12815504.56914761165997697)]
    [InlineData(1e15, 33538776394910668.90982021)]
    public void LogGammaMatchesMpmath(double x, double expected) =>
        NumericAssert.Relative(expected, SpecialFunctions.LogGamma(x), 2e-15, $"lnΓ({x})");

    [Fact]
    public void LogGammaAtTheZerosIsExact()
    {
        // Γ(1) = Γ(2) = 1 (DLMF 5.4.1).
        Assert.Equal(0.0, SpecialFunctions.LogGamma(1.0));
        Assert.Equal(0.0, SpecialFunctions.LogGamma(2.0));
    }

    [Fact]
    public void LogGammaOfIntegersIsTheLogFactorial()
    {
        // Γ(n+1) = n! (DLMF 5.4.1), accumulated exactly in a decimal.
        decimal factorial = 1;
        for (int n = 1; n <= 25; n++)
        {
            factorial *= n;
            NumericAssert.Relative(Math.Log((double)factorial), SpecialFunctions.LogGamma(n + 1), 4e-16, $"ln {n}!");
        }
    }

    // Expected values: mpmath 1.3.0 log(beta(a, b)) at 40 digits (reference/make_reference_values.py).
    [Theory]
    [InlineData(0.5, 0.5, 1.144729885849400174143427)]
    [InlineData(2, 3, -2.484906649788000310229709)]
    [InlineData(0.001, 5, 6.905672657062074721953789)]
    [InlineData(20.5, 30.5, -34.69279479307282563392255)]
    [InlineData(5000, 5000, -6934.464865071676609155826)]
    [InlineData(1201, 8801, -3674.060222247928619635756)]
    [InlineData(1e6, 1000001, -1386300.696510101676271429)]
    [InlineData(3, 1e7, -47.66114007231498905496359)]
    [InlineData(0.01, 1e7, 4.438298922027438508428994)]
    [InlineData(1e7, 1e7, -13862950.40473459568285914)]
    public void LogBetaMatchesMpmath(double a, double b, double expected) =>
        NumericAssert.Relative(expected, SpecialFunctions.LogBeta(a, b), 2e-15, $"ln B({a},{b})");

    [Fact]
    public void LogBetaIsSymmetric()
    {
        // B(a,b) = B(b,a) (DLMF 5.12.1).
        foreach (var (a, b) in new[] { (0.3, 7.0), (12.0, 3.5), (400.0, 9000.0), (2.0, 1e6) })
        {
            Assert.Equal(SpecialFunctions.LogBeta(a, b), SpecialFunctions.LogBeta(b, a));
        }
    }

    // Expected values: mpmath 1.3.0 erfc at 40 digits (reference/make_reference_values.py).
    [Theory]
    [InlineData(-3, 1.999977909503001414558627)]
    [InlineData(-0.5, 1.520499877813046537682747)]
    [InlineData(0, 1.0)]
    [InlineData(1e-10, 0.9999999998871620832904487)]
    [InlineData(0.3, 0.671373240540872583810382)]
    [InlineData(1, 0.1572992070502851306587794)]
    [InlineData(1.4, 0.04771488023735120360037678)]
    [InlineData(1.5, 0.03389485352468927293302374)]
    [InlineData(2, 0.004677734981047265837930744)]
    [InlineData(5, 1.537459794428034850188343e-12)]
    [InlineData(10, 2.088487583762544757000786e-45)]
    [InlineData(26, 5.663192408856142846475728e-296)]
    public void ErfcMatchesMpmath(double x, double expected) =>
        NumericAssert.Relative(expected, SpecialFunctions.Erfc(x), 3e-15, $"erfc({x})");

    // Expected values: mpmath 1.3.0 erf at 40 digits.
    [Theory]
    [InlineData(1e-10, 1.12837916709551261500173e-10)]
    [InlineData(0.3, 0.328626759459127416189618)]
    [InlineData(1.2, 0.9103139782296353683659318)]
    public void ErfMatchesMpmath(double x, double expected) =>
        NumericAssert.Relative(expected, SpecialFunctions.Erf(x), 2e-16, $"erf({x})");

    // Expected values: mpmath 1.3.0 log1p, expm1 and log1p(x) − x at 40 digits.
    [Theory]
    [InlineData(1e-20, 9.999999999999999451482715e-21, 9.999999999999999451582715e-21, -4.999999999999999451497328e-41)]
    [InlineData(1e-9, 9.999999995000000626149247e-10, 1.000000000500000062448258e-9, -4.999999996666667291982581e-19)]
    [InlineData(-0.3, -0.3566749439387323630523098, -0.2591817793182821257083918, -0.05667494393873237415454003)]
    [InlineData(0.7, 0.5306282510621703701086485, 1.013752707470476432195965, -0.1693717489378295854824305)]
    public void ElementaryHelpersMatchMpmath(double x, double log1p, double expm1, double log1pMinusX)
    {
        NumericAssert.Relative(log1p, SpecialFunctions.Log1p(x), 2e-16, "log1p");
        NumericAssert.Relative(expm1, SpecialFunctions.Expm1(x), 2e-16, "expm1");
        NumericAssert.Relative(log1pMinusX, SpecialFunctions.Log1pMinusX(x), 4e-16, "log1p − x");
    }

    [Fact]
    public void InvalidArgumentsGiveNaNNotExceptions()
    {
        Assert.True(double.IsNaN(SpecialFunctions.LogGamma(-1.0)));
        Assert.True(double.IsPositiveInfinity(SpecialFunctions.LogGamma(0.0)));
        Assert.True(double.IsNaN(SpecialFunctions.LogBeta(0.0, 1.0)));
    }
}
