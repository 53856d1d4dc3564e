using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

public class MarginalTests
{
    public static TheoryData<IMarginal> Marginals => new()
    {
        new BetaMarginal(3, 7),
        new BetaMarginal(0.5, 0.5),
        new BetaMarginal(1201, 8801),
        new NormalMarginal(7.0 / 9, Math.Sqrt(40.0 / 9)),
        new StudentTMarginal(9, 7.0 / 6, Math.Sqrt(61.0 / 405)),
        new StudentTMarginal(1, 0, 2),
        new GammaMarginal(21, 6),
        new GammaMarginal(0.7, 0.1),
        new AffineMarginal(new BetaMarginal(30, 70), -2.5, 1),
        new AffineMarginal(new GammaMarginal(5, 2), 3, -4),
    };

    [Theory]
    [MemberData(nameof(Marginals))]
    public void TailsAddUpAndQuantilesInvert(IMarginal m)
    {
        foreach (double p in new[] { 1e-9, 0.025, 0.3, 0.5, 0.8, 0.975 })
        {
            double x = m.Quantile(p);
            Assert.InRange(x, m.LowerBound, m.UpperBound);
            NumericAssert.Relative(p, m.Cdf(x), 1e-12, $"{m} F(Q({p}))");
            NumericAssert.Absolute(1.0, m.Cdf(x) + m.UpperTail(x), 1e-15, $"{m} F + Q");
        }
    }

    [Theory]
    [MemberData(nameof(Marginals))]
    public void DensityIsTheDerivativeOfTheCdf(IMarginal m)
    {
        // Central difference of the CDF over ±h against the density; checks that LogDensity, Density and
        // Cdf describe the same distribution.
        foreach (double p in new[] { 0.1, 0.5, 0.9 })
        {
            double x = m.Quantile(p), h = 1e-5 * Math.Min(m.Quantile(0.75) - m.Quantile(0.25), Math.Min(x - m.LowerBound, m.UpperBound - x));
            double slope = (m.Cdf(x + h) - m.Cdf(x - h)) / (2 * h);
            NumericAssert.Relative(slope, m.Density(x), 1e-6, $"{m} density at {x}");
            double logDensity = Math.Log(m.Density(x));
            NumericAssert.Absolute(logDensity, m.LogDensity(x), 1e-14 * Math.Max(1, Math.Abs(logDensity)), $"{m} log density");
        }
    }

    [Fact]
    public void NormalPosteriorIntervalFromTheWorkedExample()
    {
        // NK05/NK06 (REFERENCES.md §3, Murphy 2007 known-variance model): posterior N(7/9, 4/9) for μ, 95% interval
        // 7/9 ± 1.96·(2/3) = (−0.528864878582258379238618509236, 2.08442043413781393479417406479).
        var interval = CredibleInterval.EqualTailed(new NormalMarginal(7.0 / 9, 2.0 / 3));
        NumericAssert.Relative(-0.528864878582258379238618509236, interval.Lower, 1e-14, "NK05");
        NumericAssert.Relative(2.08442043413781393479417406479, interval.Upper, 1e-14, "NK06");
    }

    [Fact]
    public void StudentTPosteriorFromTheWorkedExample()
    {
        // NG08, NG11–NG13 (REFERENCES.md §3, normal-gamma model after Murphy 2007): the marginal of μ is t with
        // df 9, location 7/6, scale √(61/405) = 0.388094426590510681029356525132; P(μ ≤ 1 | D) =
        // 0.3388472107024222676009414; 95% interval (0.288736079712880565978880471744, 2.04459725362045276735445286159).
        var mu = new StudentTMarginal(9, 7.0 / 6, Math.Sqrt(61.0 / 405));
        NumericAssert.Relative(0.388094426590510681029356525132, mu.Scale, 1e-15, "NG08");
        NumericAssert.Relative(0.3388472107024222676009414, mu.Cdf(1), 1e-14, "NG11");
        var interval = CredibleInterval.EqualTailed(mu);
        NumericAssert.Relative(0.288736079712880565978880471744, interval.Lower, 1e-13, "NG12");
        NumericAssert.Relative(2.04459725362045276735445286159, interval.Upper, 1e-14, "NG13");
    }

    [Fact]
    public void GammaPosteriorFromTheWorkedExample()
    {
        // GP03–GP05 (REFERENCES.md §4, Bayes Rules! ch. 5): Gamma(21, 6) has mean 7/2, variance 7/12 and
        // P(λ > 4) = 0.242638687336755661266817083355.
        var lambda = new GammaMarginal(21, 6);
        NumericAssert.Relative(3.5, lambda.Mean, 1e-15, "GP03");
        NumericAssert.Relative(7.0 / 12, lambda.StdDev * lambda.StdDev, 1e-15, "GP04");
        NumericAssert.Relative(0.242638687336755661266817083355, lambda.UpperTail(4), 1e-14, "GP05");
    }

    [Fact]
    public void MomentsAndBounds()
    {
        var beta = new BetaMarginal(2, 6);
        NumericAssert.Relative(0.25, beta.Mean, 1e-15, "beta mean");
        NumericAssert.Relative(Math.Sqrt(2.0 * 6 / (64 * 9)), beta.StdDev, 1e-15, "beta sd");
        Assert.Equal(double.PositiveInfinity, new StudentTMarginal(2, 0, 1).StdDev);
        NumericAssert.Relative(Math.Sqrt(5.0 / 3), new StudentTMarginal(5, 0, 1).StdDev, 1e-15, "t sd");
        var affine = new AffineMarginal(beta, -4, 3);
        NumericAssert.Relative(2.0, affine.Mean, 1e-15, "affine mean");
        Assert.Equal(-1.0, affine.LowerBound);
        Assert.Equal(3.0, affine.UpperBound);
    }

    [Fact]
    public void NegativeScaleSwapsTheTails()
    {
        // u = −x + 1 for x ~ Beta(a,b) is Beta(b,a) in distribution.
        var reflected = new AffineMarginal(new BetaMarginal(3, 8), -1, 1);
        var mirror = new BetaMarginal(8, 3);
        foreach (double u in new[] { 0.01, 0.4, 0.93 })
        {
            NumericAssert.Relative(mirror.Cdf(u), reflected.Cdf(u), 1e-13, "cdf");
            NumericAssert.Relative(mirror.UpperTail(u), reflected.UpperTail(u), 1e-13, "upper");
            NumericAssert.Relative(mirror.Density(u), reflected.Density(u), 1e-13, "density");
        }
        NumericAssert.Relative(mirror.Quantile(1e-12), reflected.Quantile(1e-12), 1e-12, "quantile in the far tail");
    }

    [Fact]
    public void EqualityFollowsTheParameters()
    {
        Assert.Equal(new BetaMarginal(2, 3), new BetaMarginal(2, 3));
        Assert.NotEqual(new BetaMarginal(2, 3), new BetaMarginal(3, 2));
        Assert.Equal(new AffineMarginal(new GammaMarginal(2, 1), 2, 1), new AffineMarginal(new GammaMarginal(2, 1), 2, 1));
        Assert.NotEqual<IMarginal>(new NormalMarginal(0, 1), new StudentTMarginal(1e9, 0, 1));
    }

    [Fact]
    public void TextIsCultureInvariant()
    {
        var previous = System.Globalization.CultureInfo.CurrentCulture;
        try
        {
            System.Globalization.CultureInfo.CurrentCulture = new System.Globalization.CultureInfo("de-DE");
            Assert.Equal("Beta(2.5, 3)", new BetaMarginal(2.5, 3).ToString());
            Assert.Equal("[0.5, 1.25]", new CredibleInterval(0.5, 1.25).ToString());
        }
        finally
        {
            System.Globalization.CultureInfo.CurrentCulture = previous;
        }
    }

    [Fact]
    public void InvalidParametersAreRejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new BetaMarginal(0, 1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new NormalMarginal(0, -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new StudentTMarginal(double.NaN, 0, 1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new GammaMarginal(1, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => new AffineMarginal(new BetaMarginal(1, 1), 0, 0));
    }
}
