using DesignCompiler.Randomness;

namespace DesignCompiler.Tests.Randomness;

/// <summary>
/// The whole distribution of the discrete samplers, not just two moments: Pearson chi-square
/// against the exact probability mass function (common practice), in both the inversion and the
/// transformed-rejection regime, fixed seeds, p-value band [0.001, 0.999]. The mass functions
/// are computed here from the textbook formulas with the test-side log-gamma, independently of
/// the library's log-factorial.
/// </summary>
public class DiscreteSamplerFitTests
{
    private const int Draws = 400_000;

    [Theory]
    [InlineData(30, 0.2)]       // inversion (np = 6)
    [InlineData(40, 0.25)]      // BTRS, just past the switch (np = 10)
    [InlineData(200, 0.5)]      // BTRS
    [InlineData(5000, 0.07)]    // BTRS, wide
    [InlineData(300, 0.9)]      // BTRS after reflection
    [InlineData(60, 0.95)]      // inversion after reflection
    public void BinomialMatchesItsMassFunction(int n, double p)
    {
        var rng = new Xoshiro256StarStar(7000 + (ulong)n);
        var samples = new int[Draws];
        for (int i = 0; i < Draws; i++)
        {
            samples[i] = Samplers.Binomial(ref rng, n, p);
        }

        double logP = Math.Log(p);
        double logQ = Math.Log(1 - p);
        double logN = SpecialFunctions.LogGamma(n + 1.0);
        double Mass(int k) => Math.Exp(logN - SpecialFunctions.LogGamma(k + 1.0) - SpecialFunctions.LogGamma(n - k + 1.0) + k * logP + (n - k) * logQ);
        var (pValue, df) = ChiSquare.FitPValue(samples, Mass, 0, n);
        Assert.True(df >= 5, $"only {df} degrees of freedom");
        Assert.InRange(pValue, 0.001, 0.999);
    }

    [Theory]
    [InlineData(0.7)]     // inversion
    [InlineData(9.5)]     // inversion, near the switch
    [InlineData(10.0)]    // PTRS at the switch
    [InlineData(37.0)]    // PTRS
    [InlineData(4000.0)]  // PTRS, wide
    public void PoissonMatchesItsMassFunction(double lambda)
    {
        var rng = new Xoshiro256StarStar(8000 + (ulong)lambda);
        var samples = new int[Draws];
        for (int i = 0; i < Draws; i++)
        {
            samples[i] = Samplers.Poisson(ref rng, lambda);
        }

        double logLambda = Math.Log(lambda);
        double Mass(int k) => Math.Exp(k * logLambda - lambda - SpecialFunctions.LogGamma(k + 1.0));
        int high = (int)(lambda + 12 * Math.Sqrt(lambda) + 20);
        var (pValue, df) = ChiSquare.FitPValue(samples, Mass, 0, high);
        Assert.True(df >= 3, $"only {df} degrees of freedom");
        Assert.InRange(pValue, 0.001, 0.999);
    }

    [Fact]
    public void TheFitTestWouldCatchARoundedNormalApproximation()
    {
        // Power check: Binomial(40, 0.25) drawn as a rounded normal with the right mean and
        // variance must fail the same test.
        const int n = 40;
        const double p = 0.25;
        var rng = new Xoshiro256StarStar(7040);
        var samples = new int[Draws];
        for (int i = 0; i < Draws; i++)
        {
            double x = Math.Round(n * p + Math.Sqrt(n * p * (1 - p)) * Samplers.StandardNormal(ref rng));
            samples[i] = (int)Math.Clamp(x, 0, n);
        }

        double logN = SpecialFunctions.LogGamma(n + 1.0);
        double Mass(int k) => Math.Exp(logN - SpecialFunctions.LogGamma(k + 1.0) - SpecialFunctions.LogGamma(n - k + 1.0) + k * Math.Log(p) + (n - k) * Math.Log(1 - p));
        Assert.True(ChiSquare.FitPValue(samples, Mass, 0, n).PValue < 1e-6);
    }
}
