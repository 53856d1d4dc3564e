using System.Runtime.Intrinsics;
using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

/// <summary>
/// e^x and ln x written in plain arithmetic, so that the eight-lane forms the P(best) quadrature uses give
/// the scalar bits on every machine. They must be as accurate as the runtime's own functions and the lanes
/// must agree with the scalar form exactly, or the two evaluation paths of a panel would differ.
/// </summary>
public class RepeatableMathTests
{
    // mpmath.exp and mpmath.log of the double nearest each argument, at 40 digits.
    private static readonly (double X, double Exp)[] ExpReference =
    [
        (1, 2.71828182845904523536),
        (-0.5, 0.6065306597126334236038),
        (1e-10, 1.000000000100000000005),
        (0.34657359, 1.41421356197715390501),
        (12.25, 208981.2888697129615117),
        (-3.75, 0.02351774585600910823615),
        (709.7, 1.65498402768026440308e+308),
        (-708.5, 2.006132305331305820381e-308),
    ];

    private static readonly (double X, double Log)[] LogReference =
    [
        (2, 0.6931471805599453094172321),
        (0.75, -0.287682072451780927439219),
        (1e-300, -690.7755278982137051803383),
        (double.Epsilon, -744.4400719213812623141073),
        (1.0000000009313225746154785156250, 9.313225741817976469000627e-10),
        (3.5e200, 461.7697815673045048175807),
        (0.7071, -0.3465831803719420002781364),
        (1.4142, 0.3465640001880033091390958),
    ];

    // mpmath.log1p of the double nearest each argument, at 40 digits.
    private static readonly (double F, double Log1p)[] Log1pReference =
    [
        (1e-20, 9.999999999999999451482715e-21),
        (-1e-8, -1.000000005000000054255895e-8),
        (-0.29, -0.3424903089467759185600292),
        (0.2, 0.1823215567939546354635766),
    ];

    [Fact]
    public void ExpMatchesMpmathToAUnitInTheLastPlace()
    {
        foreach (var (x, expected) in ExpReference) Assert.True(Ulps(RepeatableMath.Exp(x), expected) <= 1, $"exp({x:R})");
    }

    [Fact]
    public void LogMatchesMpmathToAUnitInTheLastPlace()
    {
        foreach (var (x, expected) in LogReference) Assert.True(Ulps(RepeatableMath.Log(x), expected) <= 1, $"log({x:R})");
        foreach (var (f, expected) in Log1pReference) Assert.True(Ulps(RepeatableMath.Log1pSmall(f), expected) <= 1, $"log1p({f:R})");
    }

    [Fact]
    public void AgreesWithTheRuntimeFunctionsOverTheirRange()
    {
        // The runtime's Math.Exp and Math.Log call the platform's C library, itself within a unit in the last
        // place; the two may differ by one unit each way.
        var random = new Random(20261202);
        for (var i = 0; i < 200_000; i++)
        {
            var scale = (i % 4) switch { 0 => 745.0, 1 => 1.0, 2 => 40.0, _ => 1e-6 };
            var x = (2 * random.NextDouble() - 1) * scale;
            Assert.True(Ulps(RepeatableMath.Exp(x), Math.Exp(x)) <= 2, $"exp({x:R})");
            var y = i % 5 == 0 ? 1 + (random.NextDouble() - 0.5) * 1e-7 : Math.Exp((2 * random.NextDouble() - 1) * 708);
            Assert.True(Ulps(RepeatableMath.Log(y), Math.Log(y)) <= 2, $"log({y:R})");
        }
    }

    [Fact]
    public void EdgesOfTheRangeGiveTheLimits()
    {
        Assert.Equal(double.PositiveInfinity, RepeatableMath.Exp(709.79));
        Assert.Equal(1.7928227943945155e308, RepeatableMath.Exp(709.78));
        Assert.Equal(double.Epsilon, RepeatableMath.Exp(-745.13));
        Assert.Equal(0.0, RepeatableMath.Exp(-745.14));
        Assert.Equal(0.0, RepeatableMath.Exp(double.NegativeInfinity));
        Assert.Equal(double.PositiveInfinity, RepeatableMath.Exp(double.PositiveInfinity));
        Assert.True(double.IsNaN(RepeatableMath.Exp(double.NaN)));
        Assert.Equal(1.0, RepeatableMath.Exp(0.0));
        Assert.Equal(double.NegativeInfinity, RepeatableMath.Log(0.0));
        Assert.Equal(double.PositiveInfinity, RepeatableMath.Log(double.PositiveInfinity));
        Assert.True(double.IsNaN(RepeatableMath.Log(-1.0)));
        Assert.True(double.IsNaN(RepeatableMath.Log(double.NaN)));
        Assert.Equal(0.0, RepeatableMath.Log(1.0));
        // A subnormal argument: ln(1e-310) by mpmath, 40 digits.
        Assert.True(Ulps(RepeatableMath.Log(1e-310), -713.8013788281541651006) <= 1);
    }

    [Fact]
    public void LanesGiveTheScalarBits()
    {
        var random = new Random(7);
        double[] special = [0, -0.0, 1, -1, double.NaN, double.PositiveInfinity, double.NegativeInfinity, double.Epsilon,
            2.2250738585072014e-308, 1e-310, 709.78, 709.79, -745.13, -745.14, -708.5, 1e308, 0.2928932188134524, -0.29];
        var points = special.Concat(Enumerable.Range(0, 8000).Select(i => i % 2 == 0
            ? (2 * random.NextDouble() - 1) * 750
            : Math.Exp((2 * random.NextDouble() - 1) * 700))).ToArray();
        var lanes = new double[8];
        for (var start = 0; start + 8 <= points.Length; start += 8)
        {
            points.AsSpan(start, 8).CopyTo(lanes);
            var v = Vector512.Create(lanes);
            var exp = RepeatableMath.Exp(v);
            var log = RepeatableMath.Log(v);
            var small = RepeatableMath.Log1pSmall(Vector512.Create(lanes.Select(x => Math.Clamp(x, -0.29, 0.29)).ToArray()));
            for (var l = 0; l < 8; l++)
            {
                SameBits(RepeatableMath.Exp(lanes[l]), exp[l]);
                SameBits(RepeatableMath.Log(lanes[l]), log[l]);
                SameBits(RepeatableMath.Log1pSmall(Math.Clamp(lanes[l], -0.29, 0.29)), small[l]);
            }
        }
    }

    private static void SameBits(double scalar, double lane)
    {
        if (double.IsNaN(scalar)) Assert.True(double.IsNaN(lane));
        else Assert.Equal(BitConverter.DoubleToInt64Bits(scalar), BitConverter.DoubleToInt64Bits(lane));
    }

    // Distance in units in the last place of the expected value.
    private static double Ulps(double actual, double expected)
    {
        if (actual == expected) return 0;
        double magnitude = Math.Abs(expected);
        double ulp = Math.Max(Math.BitIncrement(magnitude) - magnitude, double.Epsilon);
        return Math.Abs(actual - expected) / ulp;
    }

    // x^n exactly (Python's fractions.Fraction of the double x, raised to n), rounded once to a double.
    [Theory]
    [InlineData(0.9, 10, 0.3486784401000001)]
    [InlineData(0.999, 1000, 0.36769542477096373)]
    [InlineData(0.1, 7, 1.0000000000000004e-07)]
    [InlineData(1e-30, 10, 1.0000000000000009e-300)]
    [InlineData(0.7310585786300049, 999, 1.225252342285837e-136)]
    [InlineData(0.999999, 3, 0.999997000003)]
    public void Integer_powers_are_within_their_rounding_budget_and_the_lanes_agree(double x, int n, double exact)
    {
        double power = RepeatableMath.Power(x, n);
        // x^n is a product of n factors, and any order of forming a product of n numbers is within
        // γ(n−1) ≈ (n−1)·u relative (N. J. Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed., §3.1; from memory).
        double budget = (n - 1) * 1.1102230246251565e-16 * (1 + 1e-10);
        Assert.True(Math.Abs(power - exact) <= budget * exact, $"{x}^{n} = {power:R}, exact {exact:R}");
        var lanes = RepeatableMath.Power(Vector512.Create(x), n);
        for (int l = 0; l < 8; l++) Assert.Equal(BitConverter.DoubleToInt64Bits(power), BitConverter.DoubleToInt64Bits(lanes[l]));
    }

    [Fact]
    public void Integer_powers_reach_the_subnormals_and_zero_like_the_exact_value()
    {
        // 0.5^1074 is the smallest subnormal exactly; one more halving rounds to zero (IEEE 754, common practice).
        Assert.Equal(double.Epsilon, RepeatableMath.Power(0.5, 1074));
        Assert.Equal(0.0, RepeatableMath.Power(0.5, 1076));
        Assert.Equal(1.0, RepeatableMath.Power(0.3, 0));
        Assert.Equal(0.0, RepeatableMath.Power(0.0, 5));
    }
}
