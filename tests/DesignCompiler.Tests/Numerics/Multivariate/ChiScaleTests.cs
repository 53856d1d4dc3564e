using DesignCompiler.Numerics.Multivariate;

namespace DesignCompiler.Tests.Numerics.Multivariate;

public class ChiScaleTests
{
    // The weighted map w → (s, weight) must reproduce the law of s = √(χ²_ν/ν): ∫₀¹ weight dw = 1,
    // E[s²] = 1 and, for ν > 2, E[1/s²] = ν/(ν − 2) (moments of χ²_ν and of its inverse; common textbook results).
    // Integrated by the midpoint rule on 2·10⁵ cells after w = 3x² − 2x³ (dw = 6x(1 − x) dx), which smooths the
    // w^½ the weight can have at the ends (it is w^((√ν − 2)/2) there for ν ≥ 4).
    [Theory]
    [InlineData(0.5)]
    [InlineData(1.0)]
    [InlineData(3.0)]
    [InlineData(4.0)]
    [InlineData(9.0)]
    [InlineData(120.0)]
    [InlineData(1e6)]
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
        NumericAssert.Absolute(1.0, mass / cells, 1e-9, "total weight");
        NumericAssert.Absolute(1.0, second / cells, 1e-8, "E[s²]");
        if (nu > 3) NumericAssert.Relative(nu / (nu - 2), inverseSecond / cells, 1e-7, "E[1/s²]");
    }
}
