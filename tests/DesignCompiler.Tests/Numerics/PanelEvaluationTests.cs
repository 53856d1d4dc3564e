using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

/// <summary>
/// The P(best) quadrature evaluates each beta arm at a whole panel's nodes in one call, with the continued
/// fraction and the prefactor's series run in vector lanes. The values must be the incomplete beta function
/// (checked against mpmath) and bit for bit what the one-point evaluation gives, or plans would differ
/// between the two paths.
/// </summary>
public class PanelEvaluationTests
{
    // The smaller tail at the mean and ±1, ±6 sd: a, b, x, which tail (0: I_x(a, b), 1: 1 − I_x(a, b)), value;
    // mpmath.betainc(a, b, 0, x) or betainc(a, b, x, 1), regularized, at 40 digits.
    private static readonly double[][] Reference =
    [
        [30, 70, 0.02641000539399313, 0, 1.5524184645442617692e-23],
        [30, 70, 0.2544016675656655, 0, 0.15955952744686039853],
        [30, 70, 0.3, 1, 0.48837489544139087871],
        [30, 70, 0.34559833243433447, 1, 0.15954243393078752749],
        [30, 70, 0.5735899946060068, 1, 1.5342721792206529379e-8],
        [2, 3, 0.2, 0, 0.18080000000000001705],
        [2, 3, 0.4, 1, 0.47519999999999996163],
        [2, 3, 0.6000000000000001, 1, 0.17919999999999989768],
        [12.5, 20.25, 0.2980576248083716, 0, 0.16208421483152615784],
        [12.5, 20.25, 0.3816793893129771, 1, 0.48863069598607046898],
        [12.5, 20.25, 0.46530115381758264, 1, 0.16195629323983639136],
        [12.5, 20.25, 0.8834099763406102, 1, 5.0615070413339741707e-12],
        [400, 700, 0.2766514530445832, 0, 1.8571619831314247381e-10],
        [400, 700, 0.34913887853773357, 0, 0.15875377825630045191],
        [400, 700, 0.36363636363636365, 1, 0.4977265021235023182],
        [400, 700, 0.3781338487349937, 1, 0.15875306291331753473],
        [400, 700, 0.4506212742281441, 1, 2.4269142293157554318e-9],
    ];

    [Fact]
    public void ManyPointsGiveTheIncompleteBetaFunction()
    {
        foreach (var group in Reference.GroupBy(r => (r[0], r[1])))
        {
            var rows = group.ToArray();
            IQuadratureProfile beta = new BetaMarginal(group.Key.Item1, group.Key.Item2);
            var x = rows.Select(r => r[2]).ToArray();
            var density = new double[x.Length];
            var cdf = new double[x.Length];
            var upper = new double[x.Length];
            beta.EvaluateMany(x, density, cdf, upper);
            for (int j = 0; j < x.Length; j++)
            {
                // The smaller tail is the one computed directly; it keeps its relative accuracy.
                double actual = rows[j][3] == 0 ? cdf[j] : upper[j];
                NumericAssert.Relative(rows[j][4], actual, 1e-13, $"tail {rows[j][3]} at {x[j]} of Beta{group.Key}");
            }
        }
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(2.5, 7)]
    [InlineData(30, 70)]
    [InlineData(3550, 6450)]
    [InlineData(1200, 8800)]
    [InlineData(1, 400)]
    [InlineData(0.5, 0.5)]
    public void ManyPointsAreBitForBitTheOnePointValues(double a, double b)
    {
        // A panel's worth of nodes and more, across the whole support and close to both bounds, so that both
        // fractions, the padding of short groups and every branch of the series are exercised.
        var marginal = new BetaMarginal(a, b);
        var x = Enumerable.Range(0, 37).Select(i => i == 0 ? 1e-12 : i == 36 ? 1 - 1e-12 : marginal.Quantile(i / 36.0)).ToArray();
        var density = new double[x.Length];
        var cdf = new double[x.Length];
        var upper = new double[x.Length];
        ((IQuadratureProfile)marginal).EvaluateMany(x, density, cdf, upper);
        var distance = x.Select(v => Math.Min(v, 0.5)).ToArray();
        var nearDensity = new double[x.Length];
        var nearCdf = new double[x.Length];
        var nearUpper = new double[x.Length];
        ((IBoundedProfile)marginal).EvaluateNearBoundMany(upper: true, distance, nearDensity, nearCdf, nearUpper);
        for (int j = 0; j < x.Length; j++)
        {
            ((IQuadratureProfile)marginal).Evaluate(x[j], out double f, out double c, out double u);
            Assert.Equal(BitConverter.DoubleToInt64Bits(f), BitConverter.DoubleToInt64Bits(density[j]));
            Assert.Equal(BitConverter.DoubleToInt64Bits(c), BitConverter.DoubleToInt64Bits(cdf[j]));
            Assert.Equal(BitConverter.DoubleToInt64Bits(u), BitConverter.DoubleToInt64Bits(upper[j]));
            ((IBoundedProfile)marginal).EvaluateNearBound(true, distance[j], out f, out c, out u);
            Assert.Equal(BitConverter.DoubleToInt64Bits(f), BitConverter.DoubleToInt64Bits(nearDensity[j]));
            Assert.Equal(BitConverter.DoubleToInt64Bits(c), BitConverter.DoubleToInt64Bits(nearCdf[j]));
        }
    }

    [Theory]
    [InlineData(0.3, 2.0)]    // a < 1: the split series for the upper tail near 0
    [InlineData(1.0, 0.5)]
    [InlineData(4.5, 1.0)]
    [InlineData(60, 3.0)]     // the centred prefactor
    [InlineData(2500, 40.0)]
    public void GammaPanelsAreBitForBitTheOnePointValues(double shape, double rate)
    {
        // A panel's gamma points run the series and the continued fraction in lanes; each must get what it
        // would alone, on both sides of x = a + 1 where the two methods meet, at 0 and far out.
        var marginal = new GammaMarginal(shape, rate);
        var x = Enumerable.Range(0, 37).Select(i => i == 0 ? 0.0 : i == 36 ? 1e6 * shape / rate : marginal.Quantile(i / 36.0)).ToArray();
        x[18] = (shape + 1.0) / rate;
        AssertManyPointsAreTheOnePointValues(marginal, x);
    }

    [Theory]
    [InlineData(50.0)]       // the smallest shape that takes the uniform expansion
    [InlineData(64.5)]
    [InlineData(1e5)]
    public void GammaPanelsAcrossTheUniformExpansionsEdgeAreBitForBit(double shape)
    {
        // From shape 50 on, points with |eta| <= 0.8 (x/a between about 0.40 and 2.0) take the expansion in lanes
        // and the others the series or the continued fraction: groups of eight that straddle either edge must
        // still give every point its one-point value.
        var marginal = new GammaMarginal(shape, 1.0);
        var x = Enumerable.Range(0, 41).Select(i => shape * (0.3 + 1.9 * i / 40.0)).ToArray();
        AssertManyPointsAreTheOnePointValues(marginal, x);
    }

    [Theory]
    [InlineData(0.0, 1.0)]
    [InlineData(5.2, 0.04)]
    [InlineData(-1e3, 250.0)]
    public void NormalPanelsAreBitForBitTheOnePointValues(double mean, double sd)
    {
        // A normal arm's points run in lanes: both sides of the mean (the tail taken beyond |z|), the mean itself,
        // the far tails where the Chebyshev pieces change and past underflow, and a group short of eight.
        var marginal = new NormalMarginal(mean, sd);
        var z = new[] { -40.0, -37.0, -12.0, -4.0, -1.0, -0.25, -1e-9, 0.0, 1e-9, 0.25, 1.0, 2.5, 4.0, 8.0, 12.0, 20.0, 37.0, 38.0, double.PositiveInfinity };
        AssertManyPointsAreTheOnePointValues(marginal, z.Select(v => mean + v * sd).ToArray());
    }

    // EvaluateMany against Evaluate at every point, bit for bit; returns the CDFs.
    private static double[] AssertManyPointsAreTheOnePointValues(IQuadratureProfile marginal, double[] x)
    {
        var density = new double[x.Length];
        var cdf = new double[x.Length];
        var upper = new double[x.Length];
        marginal.EvaluateMany(x, density, cdf, upper);
        for (int j = 0; j < x.Length; j++)
        {
            marginal.Evaluate(x[j], out double f, out double c, out double u);
            Assert.Equal(BitConverter.DoubleToInt64Bits(f), BitConverter.DoubleToInt64Bits(density[j]));
            Assert.Equal(BitConverter.DoubleToInt64Bits(c), BitConverter.DoubleToInt64Bits(cdf[j]));
            Assert.Equal(BitConverter.DoubleToInt64Bits(u), BitConverter.DoubleToInt64Bits(upper[j]));
        }
        return cdf;
    }

    [Theory]
    [InlineData(1)]
    [InlineData(3.5)]
    [InlineData(17)]
    [InlineData(2000)]
    [InlineData(2e5)]        // past StudentT.LargeDf, where the tails come from the expansion instead
    public void StudentTPanelsAreBitForBitTheOnePointValues(double df)
    {
        // The t tails of a panel go through the beta kernel's lanes together; each point must get what it
        // would alone, at the centre (t = 0 exactly), in both tails and far out.
        var marginal = new StudentTMarginal(df, 3.0, 0.5);
        var x = Enumerable.Range(0, 37).Select(i => 3.0 + 0.5 * (i - 18) * (i % 5 == 0 ? 40.0 : 0.7)).ToArray();
        var cdf = AssertManyPointsAreTheOnePointValues(marginal, x);
        Assert.Equal(0.5, cdf[18]);
    }

    [Theory]
    [InlineData(2.5, 7)]     // ln prefactor from ln x and ln(1 − x) directly
    [InlineData(30, 70)]     // the same, relative to the mean
    [InlineData(12.5, 20.25)]
    [InlineData(400, 700)]   // the centred series, which ignores the shared logarithms
    public void SharedLogarithmsGiveTheOnePointValuesBitForBit(double a, double b)
    {
        // The quadrature computes ln x and ln(1 − x) once per panel for all its beta arms; each arm must get
        // exactly what it would compute alone.
        var marginal = new BetaMarginal(a, b);
        var x = Enumerable.Range(1, 21).Select(i => marginal.Quantile(i / 22.0)).ToArray();
        var y = x.Select(v => 1.0 - v).ToArray();
        var logX = new double[x.Length];
        var logY = new double[x.Length];
        BetaKernel.LogsMany(x, y, logX, logY);
        var density = new double[x.Length];
        var cdf = new double[x.Length];
        var upper = new double[x.Length];
        marginal.EvaluatePanel(x, y, logX, logY, density, cdf, upper);
        for (int j = 0; j < x.Length; j++)
        {
            ((IQuadratureProfile)marginal).Evaluate(x[j], out double f, out double c, out double u);
            Assert.Equal(BitConverter.DoubleToInt64Bits(f), BitConverter.DoubleToInt64Bits(density[j]));
            Assert.Equal(BitConverter.DoubleToInt64Bits(c), BitConverter.DoubleToInt64Bits(cdf[j]));
            Assert.Equal(BitConverter.DoubleToInt64Bits(u), BitConverter.DoubleToInt64Bits(upper[j]));
        }
    }
}
