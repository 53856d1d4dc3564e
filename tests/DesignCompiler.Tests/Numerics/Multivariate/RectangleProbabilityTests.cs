using DesignCompiler.Numerics.Multivariate;

namespace DesignCompiler.Tests.Numerics.Multivariate;

public class RectangleProbabilityTests
{
    private const double Inf = double.PositiveInfinity;

    // Bivariate normal orthant P(X > 0, Y > 0) = 1/4 + arcsin(ρ)/(2π) (Sheppard 1899, attribution from memory;
    // shared/REFERENCES.md §11). ρ = 0.5 gives 1/3.
    [Theory]
    [InlineData(-0.95)]
    [InlineData(-0.5)]
    [InlineData(0.0)]
    [InlineData(0.3)]
    [InlineData(0.5)]
    [InlineData(0.9)]
    [InlineData(0.999)]
    public void BivariateOrthantMatchesSheppard(double rho)
    {
        var estimate = Orthant(Correlation(2, (_, _) => rho), Inf);
        double exact = 0.25 + Math.Asin(rho) / (2 * Math.PI);
        NumericAssert.Absolute(exact, estimate.Value, estimate.Error, $"ρ = {rho}, within its own error estimate");
        Assert.True(estimate.ReachedAccuracy && estimate.Error <= LatticeSettings.DefaultAccuracy, estimate.ToString());
    }

    // Trivariate normal orthant = 1/8 + (arcsin ρ12 + arcsin ρ13 + arcsin ρ23)/(4π) (shared/REFERENCES.md §11;
    // Sheppard, from memory). Equal ρ = 0.5 gives 1/4.
    [Theory]
    [InlineData(0.5, 0.5, 0.5)]
    [InlineData(0.3, -0.4, 0.6)]
    [InlineData(-0.2, -0.3, -0.1)]
    [InlineData(0.9, 0.8, 0.75)]
    public void TrivariateOrthantMatchesTheArcsineFormula(double r12, double r13, double r23)
    {
        var sigma = new double[,] { { 1, r12, r13 }, { r12, 1, r23 }, { r13, r23, 1 } };
        var estimate = Orthant(sigma, Inf);
        double exact = 0.125 + (Math.Asin(r12) + Math.Asin(r13) + Math.Asin(r23)) / (4 * Math.PI);
        NumericAssert.Absolute(exact, estimate.Value, estimate.Error, "within its own error estimate");
        Assert.True(estimate.Error <= LatticeSettings.DefaultAccuracy, estimate.ToString());
    }

    // Equicorrelated normals with ρ = ½ are X_j = (W + E_j)/√2 with W, E_j iid; X_j > 0 for all j says W exceeds
    // every −E_j, i.e. one of k + 1 iid normals is the largest: P = 1/(k + 1) (common textbook result, from memory).
    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(6)]
    [InlineData(9)]
    [InlineData(19)]
    public void EquicorrelatedHalfGivesOneOverKPlusOne(int k)
    {
        var estimate = Orthant(Correlation(k, (_, _) => 0.5), Inf);
        NumericAssert.Absolute(1.0 / (k + 1), estimate.Value, estimate.Error, $"k = {k}");
        Assert.True(estimate.Error <= LatticeSettings.DefaultAccuracy, estimate.ToString());
    }

    // P(X_j > h for all j), equicorrelated ρ: ∫ φ(w) Φ((√ρ w − h)/√(1 − ρ))^k dw, by mpmath.quad at 30 digits
    // (reference/make_multivariate_references.py, "Equicorrelated"). The k = 12 value is 1/13, as above.
    [Theory]
    [InlineData(6, 0.3, -0.2, 0.12975180306270192708)]
    [InlineData(8, 0.7, 0.5, 0.077245019502379109746)]
    [InlineData(12, 0.5, 0.0, 0.076923076923076923077)]
    public void EquicorrelatedOrthantsMatchMpmath(int k, double rho, double h, double expected)
    {
        var sigma = Correlation(k, (_, _) => rho);
        var estimate = RectangleProbability.Compute(new double[k], sigma, Inf, Enumerable.Repeat(h, k).ToArray(), Enumerable.Repeat(Inf, k).ToArray());
        NumericAssert.Absolute(expected, estimate.Value, estimate.Error, $"k = {k}, ρ = {rho}, h = {h}");
    }

    // Bivariate normal with nonzero limits and a rectangle, by conditioning on X and integrating with mpmath.quad
    // (reference/make_multivariate_references.py, "BvnUpper", "BvnRectangle"). The location is moved to show it is
    // subtracted: X ~ N((0.2, −0.1), ·) with limits shifted by the same amounts.
    [Theory]
    [InlineData(0.3, -0.5, 0.6, 0.34362253011121080987)]
    [InlineData(-1.2, 0.4, -0.7, 0.24735555201405793669)]
    [InlineData(1.5, 2.0, 0.95, 0.022100008764184882795)]
    public void BivariateUpperOrthantsMatchMpmath(double h, double k, double rho, double expected)
    {
        var sigma = new double[,] { { 4, 2 * rho * 1.5 }, { 2 * rho * 1.5, 2.25 } };
        var estimate = RectangleProbability.Compute([0.2, -0.1], sigma, Inf, [0.2 + 2 * h, -0.1 + 1.5 * k], [Inf, Inf]);
        NumericAssert.Absolute(expected, estimate.Value, estimate.Error, "BvnUpper");
    }

    [Fact]
    public void BivariateRectangleMatchesMpmath()
    {
        // BvnRectangle(−1, 0.5, −0.3, 2, 0.4) = 0.30882594417939347314 (make_multivariate_references.py).
        var estimate = RectangleProbability.Compute([0, 0], Correlation(2, (_, _) => 0.4), Inf, [-1, -0.3], [0.5, 2]);
        NumericAssert.Absolute(0.30882594417939347314, estimate.Value, estimate.Error, "rectangle");
    }

    // Bivariate t with nonzero limits: the normal probability with limits times s = √(χ²_ν/ν), integrated over s by
    // mpmath.quad (reference/make_multivariate_references.py, "BvtUpper"; Genz and Bretz 2002 §2 for the identity).
    [Theory]
    [InlineData(0.3, -0.5, 0.6, 3.0, 0.34229689046402275064)]
    [InlineData(-1.2, 0.4, -0.7, 7.5, 0.23957038136818844838)]
    [InlineData(1.0, 1.0, 0.2, 2.0, 0.074327392914975147177)]
    public void BivariateTOrthantsMatchMpmath(double h, double k, double rho, double nu, double expected)
    {
        var estimate = RectangleProbability.Compute([0, 0], Correlation(2, (_, _) => rho), nu, [h, k], [Inf, Inf]);
        NumericAssert.Absolute(expected, estimate.Value, estimate.Error, $"BvtUpper ν = {nu}");
        Assert.True(estimate.Error <= LatticeSettings.DefaultAccuracy, estimate.ToString());
    }

    // A centred orthant has the same probability under every elliptical distribution with the same correlation,
    // so the multivariate t's trivariate orthant is the normal's arcsine formula for any ν (common textbook
    // result, from memory: the orthant depends only on the direction of the vector, not its length).
    [Theory]
    [InlineData(1.0)]
    [InlineData(3.0)]
    [InlineData(30.0)]
    public void CentredTOrthantMatchesTheNormalFormula(double nu)
    {
        double r12 = 0.3, r13 = -0.4, r23 = 0.6;
        var estimate = Orthant(new double[,] { { 1, r12, r13 }, { r12, 1, r23 }, { r13, r23, 1 } }, nu);
        double exact = 0.125 + (Math.Asin(r12) + Math.Asin(r13) + Math.Asin(r23)) / (4 * Math.PI);
        NumericAssert.Absolute(exact, estimate.Value, estimate.Error, $"ν = {nu}");
    }

    [Fact]
    public void LargeDegreesOfFreedomTendToTheNormal()
    {
        // t_ν → normal as ν → ∞ (common textbook result); the gap is O(1/ν), 1e-6 at ν = 1e6, far below the errors.
        double[] limits = [0.3, -0.5, 0.1];
        var sigma = new double[,] { { 1, 0.4, 0.2 }, { 0.4, 1, -0.3 }, { 0.2, -0.3, 1 } };
        var normal = RectangleProbability.Compute(new double[3], sigma, Inf, limits, [Inf, Inf, Inf]);
        var t = RectangleProbability.Compute(new double[3], sigma, 1e6, limits, [Inf, Inf, Inf]);
        NumericAssert.Absolute(normal.Value, t.Value, normal.Error + t.Error + 1e-5, "ν = 1e6 against the normal");
    }

    [Fact]
    public void OneVariableIsExact()
    {
        // A single variable is the univariate CDF (common practice): Φ(1) − Φ(−0.5) and the t₄ version of the same.
        var normal = RectangleProbability.Compute([0], new double[,] { { 1 } }, Inf, [-0.5], [1]);
        Assert.True(normal.Error <= 1e-14, normal.ToString());
        NumericAssert.Absolute(DesignCompiler.Numerics.StandardNormal.Cdf(1) - DesignCompiler.Numerics.StandardNormal.Cdf(-0.5), normal.Value, 1e-15, "normal");
        var t = RectangleProbability.Compute([1], new double[,] { { 4 } }, 4, [0], [3]);
        NumericAssert.Absolute(DesignCompiler.Numerics.StudentT.Cdf(4, 1) - DesignCompiler.Numerics.StudentT.Cdf(4, -0.5), t.Value, 1e-15, "t");
    }

    // A perfectly correlated pair is one variable: with X2 = X1, P(X1 > a, X2 > b) = 1 − Φ(max(a, b)); with
    // X2 = −X1, P(X1 > a, −X1 > b) = Φ(−b) − Φ(a) (elementary). The singular row is folded into the first column.
    [Theory]
    [InlineData(1.0, 0.2, 0.7)]
    [InlineData(-1.0, -0.4, -0.3)]
    public void SingularPairsReduceToOneVariable(double rho, double a, double b)
    {
        var estimate = RectangleProbability.Compute([0, 0], new double[,] { { 1, rho }, { rho, 1 } }, Inf, [a, b], [Inf, Inf]);
        double exact = rho > 0
            ? DesignCompiler.Numerics.StandardNormal.UpperTail(Math.Max(a, b))
            : DesignCompiler.Numerics.StandardNormal.Cdf(-b) - DesignCompiler.Numerics.StandardNormal.Cdf(a);
        Assert.True(estimate.Error <= 1e-14, estimate.ToString());
        NumericAssert.Absolute(exact, estimate.Value, 1e-14, "singular pair");
    }

    [Fact]
    public void SingularTrivariateMatchesTheBivariateItReducesTo()
    {
        // X3 = (X1 + X2)/√(2 + 2ρ) is determined by X1, X2; with limit −∞ on X3 it drops out, leaving Sheppard's
        // bivariate orthant (shared/REFERENCES.md §11).
        double rho = 0.3, c = 1 / Math.Sqrt(2 + 2 * rho);
        double c13 = c * (1 + rho);
        var sigma = new double[,] { { 1, rho, c13 }, { rho, 1, c13 }, { c13, c13, 1 } };
        var estimate = RectangleProbability.Compute(new double[3], sigma, Inf, [0, 0, double.NegativeInfinity], [Inf, Inf, Inf]);
        NumericAssert.Absolute(0.25 + Math.Asin(rho) / (2 * Math.PI), estimate.Value, estimate.Error + 1e-12, "singular trivariate");
    }

    // The error estimate is a statistical one (3 standard errors over 10 shifts, covering about 98.5 % of the time:
    // the two-sided t₉ tail beyond 3 is 0.0150, mpmath). Over 20 seeds of the shifts, in closed-form cases, it must
    // cover the true error nearly always: at most 2 misses in 20 (expected 0.3).
    [Fact]
    public void ErrorEstimateCoversTheTrueErrorAcrossSeeds()
    {
        double r12 = 0.3, r13 = -0.4, r23 = 0.6;
        var trivariate = new double[,] { { 1, r12, r13 }, { r12, 1, r23 }, { r13, r23, 1 } };
        double trivariateExact = 0.125 + (Math.Asin(r12) + Math.Asin(r13) + Math.Asin(r23)) / (4 * Math.PI);
        var equicorrelated = Correlation(5, (_, _) => 0.5);
        int misses = 0, trials = 0;
        for (ulong seed = 1; seed <= 20; seed++)
        {
            var settings = LatticeSettings.Default with { Seed = seed, Accuracy = 1e-3 };
            var a = RectangleProbability.Compute(new double[3], trivariate, Inf, new double[3], [Inf, Inf, Inf], settings);
            var b = RectangleProbability.Compute(new double[5], equicorrelated, 4.0, new double[5], Enumerable.Repeat(Inf, 5).ToArray(), settings);
            if (Math.Abs(a.Value - trivariateExact) > a.Error) misses++;
            if (Math.Abs(b.Value - 1.0 / 6) > b.Error) misses++;
            trials += 2;
        }
        Assert.True(misses <= 2, $"{misses} of {trials} error estimates missed the true error");
    }

    [Fact]
    public void TheBudgetStopsTheRefinementAndSaysSo()
    {
        var settings = LatticeSettings.Default with { Accuracy = 1e-9, MaxPointsPerShift = 256 };
        var estimate = RectangleProbability.Compute(new double[4], Correlation(4, (_, _) => 0.5), Inf, new double[4], Enumerable.Repeat(Inf, 4).ToArray(), settings);
        Assert.False(estimate.ReachedAccuracy);
        Assert.Equal(256, estimate.PointsPerShift);
        NumericAssert.Absolute(0.2, estimate.Value, estimate.Error, "P = 1/5 (equicorrelated ½, as above)");
    }

    [Fact]
    public void EmptyAndImpossibleRectanglesAreExactlyZero()
    {
        Assert.Equal(0.0, RectangleProbability.Compute([0, 0], Correlation(2, (_, _) => 0.2), Inf, [1, 0], [0.5, 1]).Value);
        // A constant variable (variance 0) outside its limits (common practice: a point mass is in or out).
        var constant = RectangleProbability.Compute([0, 0.5], new double[,] { { 1, 0 }, { 0, 0 } }, Inf, [0, 1], [Inf, Inf]);
        Assert.Equal(0.0, constant.Value);
    }

    [Fact]
    public void BadArgumentsAreRefused()
    {
        Assert.Throws<ArgumentException>(() => Orthant(new double[,] { { 1, 0.5 }, { 0.4, 1 } }, Inf));
        Assert.Throws<ArgumentException>(() => Orthant(new double[,] { { 1, 0.9, 0.9 }, { 0.9, 1, -0.9 }, { 0.9, -0.9, 1 } }, Inf));
        Assert.Throws<ArgumentException>(() => Orthant(new double[,] { { 1, double.NaN }, { double.NaN, 1 } }, Inf));
        Assert.Throws<ArgumentOutOfRangeException>(() => Orthant(Correlation(2, (_, _) => 0.1), 0));
        Assert.Throws<ArgumentException>(() => RectangleProbability.Compute([0, 0], Correlation(2, (_, _) => 0.1), Inf, [0], [1, 1]));
    }

    internal static double[,] Correlation(int k, Func<int, int, double> offDiagonal)
    {
        var sigma = new double[k, k];
        for (int i = 0; i < k; i++)
        {
            for (int j = 0; j < k; j++) sigma[i, j] = i == j ? 1.0 : offDiagonal(Math.Min(i, j), Math.Max(i, j));
        }
        return sigma;
    }

    private static LatticeEstimate Orthant(double[,] sigma, double nu)
    {
        int k = sigma.GetLength(0);
        return RectangleProbability.Compute(new double[k], sigma, nu, new double[k], Enumerable.Repeat(Inf, k).ToArray());
    }
}
