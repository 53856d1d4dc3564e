using DesignCompiler.Numerics;
using DesignCompiler.Numerics.Multivariate;

namespace DesignCompiler.Tests.Numerics.Multivariate;

public class ChiScaleTests
{
    // Whichever map a ν gets, w → (s, weight) must reproduce the law of s = √(χ²_ν/ν): ∫₀¹ weight dw = 1,
    // E[s²] = 1 and, for ν > 2, E[1/s²] = ν/(ν − 2) (moments of χ²_ν and of its inverse; common textbook results).
    // Integrated by the midpoint rule on 2·10⁵ cells after w = 3x² − 2x³ (dw = 6x(1 − x) dx), which smooths the
    // power laws both maps have at the ends.
    [Theory]
    [InlineData(0.3)]
    [InlineData(1.0)]
    [InlineData(3.0)]
    [InlineData(4.0)]
    [InlineData(9.0)]
    [InlineData(120.0)]
    [InlineData(1e6)]
    [InlineData(1e8)]
    public void WeightedScaleHasTheChiLaw(double nu)
    {
        var chi = new ChiScale(nu);
        const int cells = 200000;
        double mass = 0, second = 0, inverseSecond = 0;
        for (int i = 0; i < cells; i++)
        {
            double x = (i + 0.5) / cells;
            chi.Map(x * x * (3 - 2 * x), out double s, out double w);
            double weight = w * 6 * x * (1 - x);
            mass += weight;
            second += weight * s * s;
            inverseSecond += weight / (s * s);
        }
        NumericAssert.Absolute(1.0, mass / cells, 1e-8, "total weight");
        NumericAssert.Absolute(1.0, second / cells, 1e-7, "E[s²]");
        if (nu > 3) NumericAssert.Relative(nu / (nu - 2), inverseSecond / cells, 1e-6, "E[1/s²]");
    }

    // Between ν = 0.5 and 1e7 s is the tabulated inverse chi CDF: against the project's incomplete-gamma inverse
    // (tested against mpmath in IncompleteGammaTests), s = √(2 P⁻¹(ν/2, w)/ν) to 1e-9 relative, from w = 1e-15 to
    // 1 − 1e-9 (beyond that 1 − w itself carries too few digits for the comparison).
    [Theory]
    [InlineData(0.5)]
    [InlineData(1.0)]
    [InlineData(2.5)]
    [InlineData(12.0)]
    [InlineData(1e4)]
    [InlineData(1e7)]
    public void TabulatedScaleIsTheInverseChiCdf(double nu)
    {
        var chi = new ChiScale(nu);
        Assert.True(chi.IsInverse);
        for (int i = 0; i <= 400; i++)
        {
            double t = -34.5 + (34.5 + 20.7) * i / 400;
            double w = 1 / (1 + Math.Exp(-t));
            chi.Map(w, out double s, out double weight);
            double exact = Math.Sqrt(2 * IncompleteGamma.Inverse(nu / 2, w) / nu);
            Assert.Equal(1.0, weight);
            NumericAssert.Relative(exact, s, 1e-9, $"s at w = {w}");
        }
    }

    // The shared table for a ν is the table a new one would build, bit for bit, and is built once.
    [Theory]
    [InlineData(0.3)]
    [InlineData(7.5)]
    [InlineData(1e8)]
    public void SharedTablesMapAsNewOnes(double nu)
    {
        var shared = ChiScale.For(nu);
        Assert.Same(shared, ChiScale.For(nu));
        var fresh = new ChiScale(nu);
        for (int i = 0; i <= 1000; i++)
        {
            double w = i / 1000.0;
            shared.Map(w, out var s1, out var g1);
            fresh.Map(w, out var s2, out var g2);
            Assert.Equal(BitConverter.DoubleToInt64Bits(s2), BitConverter.DoubleToInt64Bits(s1));
            Assert.Equal(BitConverter.DoubleToInt64Bits(g2), BitConverter.DoubleToInt64Bits(g1));
        }
    }

    // Eight points at once map exactly as one at a time: the table's pieces, the ends of (0, 1) and the
    // logistic map outside the table (ν below 0.5 or above 1e7).
    [Theory]
    [InlineData(0.3)]
    [InlineData(0.5)]
    [InlineData(7.5)]
    [InlineData(250.0)]
    [InlineData(1e7)]
    [InlineData(1e8)]
    public void EightAtOnceMapAsOneAtATime(double nu)
    {
        var chi = new ChiScale(nu);
        var random = new Random(17);
        Span<double> w = stackalloc double[8], scale = stackalloc double[8], weight = stackalloc double[8];
        double[] ends = [0.0, 1e-300, RichtmyerPoints.Epsilon, 1e-12, 0.5, 1 - 1e-12, 1 - RichtmyerPoints.Epsilon, 1.0];
        for (int round = 0; round < 2000; round++)
        {
            for (int i = 0; i < 8; i++) w[i] = round == 0 ? ends[i] : random.NextDouble();
            chi.MapLanes(w, scale, weight);
            for (int i = 0; i < 8; i++)
            {
                chi.Map(w[i], out var s1, out var g1);
                Assert.Equal(BitConverter.DoubleToInt64Bits(s1), BitConverter.DoubleToInt64Bits(scale[i]));
                Assert.Equal(BitConverter.DoubleToInt64Bits(g1), BitConverter.DoubleToInt64Bits(weight[i]));
            }
        }
    }
}
