using DesignCompiler.Randomness;

namespace DesignCompiler.Tests.Randomness;

/// <summary>
/// Sample mean and variance of each sampler within 4 standard errors of the exact moments, on
/// fixed seeds. Exact means, variances and excess kurtoses κ are the common textbook formulas
/// (e.g. Johnson, Kotz and Balakrishnan, <i>Continuous/Univariate Discrete Distributions</i>;
/// from memory). Standard errors: σ/√N for the mean and σ²·√((κ + 2)/N) for the sample variance
/// (large-sample formula, common practice).
/// </summary>
public class SamplerMomentTests
{
    private const int Draws = 200_000;

    [Fact]
    public void StandardNormal()
    {
        var rng = new Xoshiro256StarStar(101);
        AssertMoments(Draw(() => Samplers.StandardNormal(ref rng)), mean: 0.0, variance: 1.0, excessKurtosis: 0.0);
    }

    [Fact]
    public void NormalPairIsTwoIndependentNormals()
    {
        var rng = new Xoshiro256StarStar(102);
        var first = new double[Draws];
        var second = new double[Draws];
        for (int i = 0; i < Draws; i++)
        {
            Samplers.StandardNormalPair(ref rng, out first[i], out second[i]);
        }

        AssertMoments(first, 0.0, 1.0, 0.0);
        AssertMoments(second, 0.0, 1.0, 0.0);

        // Correlation of independent variables: standard error 1/√N (common practice).
        double correlation = 0.0;
        for (int i = 0; i < Draws; i++)
        {
            correlation += first[i] * second[i];
        }

        Assert.InRange(correlation / Draws, -4 / Math.Sqrt(Draws), 4 / Math.Sqrt(Draws));
    }

    [Theory]
    [InlineData(0.05)]
    [InlineData(0.3)]
    [InlineData(1.0)]
    [InlineData(2.5)]
    [InlineData(50.0)]
    public void Gamma(double shape)
    {
        // Gamma(k, 1): mean k, variance k, excess kurtosis 6/k.
        var rng = new Xoshiro256StarStar(200 + (ulong)(shape * 100));
        AssertMoments(Draw(() => Samplers.Gamma(ref rng, shape)), shape, shape, 6.0 / shape);
    }

    [Theory]
    [InlineData(0.5, 0.5)]
    [InlineData(2.0, 5.0)]
    [InlineData(0.1, 3.0)]
    [InlineData(0.02, 0.03)]
    [InlineData(1201.0, 8801.0)]
    public void Beta(double a, double b)
    {
        // Beta(a, b): mean a/(a+b), variance ab/((a+b)²(a+b+1)),
        // excess kurtosis 6[(a−b)²(a+b+1) − ab(a+b+2)] / [ab(a+b+2)(a+b+3)].
        var rng = new Xoshiro256StarStar(300 + (ulong)(a * 1000 + b));
        double s = a + b;
        double mean = a / s;
        double variance = a * b / (s * s * (s + 1));
        double kurtosis = 6 * ((a - b) * (a - b) * (s + 1) - a * b * (s + 2)) / (a * b * (s + 2) * (s + 3));
        double[] samples = Draw(() => Samplers.Beta(ref rng, a, b));
        Assert.All(samples, x => Assert.InRange(x, 0.0, 1.0));
        AssertMoments(samples, mean, variance, kurtosis);
    }

    [Theory]
    [InlineData(20, 0.3)]
    [InlineData(1000, 0.004)]
    [InlineData(1000, 0.3)]
    [InlineData(1000, 0.8)]
    [InlineData(5000, 0.5)]
    [InlineData(1_000_000, 0.01)]
    [InlineData(7, 1.0)]
    [InlineData(7, 0.0)]
    public void Binomial(int n, double p)
    {
        // Binomial(n, p): mean np, variance npq, excess kurtosis (1 − 6pq)/(npq).
        var rng = new Xoshiro256StarStar(400 + (ulong)n);
        double[] samples = Draw(() => Samplers.Binomial(ref rng, n, p));
        Assert.All(samples, x => Assert.InRange(x, 0, n));
        double npq = n * p * (1 - p);
        if (npq == 0)
        {
            Assert.All(samples, x => Assert.Equal(n * p, x));
            return;
        }

        AssertMoments(samples, n * p, npq, (1 - 6 * p * (1 - p)) / npq);
    }

    [Theory]
    [InlineData(0.2)]
    [InlineData(3.5)]
    [InlineData(9.99)]
    [InlineData(10.0)]
    [InlineData(250.0)]
    [InlineData(1e6)]
    public void Poisson(double lambda)
    {
        // Poisson(λ): mean λ, variance λ, excess kurtosis 1/λ.
        var rng = new Xoshiro256StarStar(500 + (ulong)lambda);
        AssertMoments(Draw(() => Samplers.Poisson(ref rng, lambda)), lambda, lambda, 1.0 / lambda);
    }

    [Fact]
    public void DegenerateAndInvalidParameters()
    {
        var rng = new Xoshiro256StarStar(600);
        Assert.Equal(0, Samplers.Poisson(ref rng, 0.0));
        Assert.Equal(0, Samplers.Binomial(ref rng, 0, 0.4));
        Assert.Throws<ArgumentOutOfRangeException>(() => Samplers.Gamma(ref rng, 0.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => Samplers.Gamma(ref rng, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => Samplers.Beta(ref rng, 1.0, -1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => Samplers.Binomial(ref rng, -1, 0.5));
        Assert.Throws<ArgumentOutOfRangeException>(() => Samplers.Binomial(ref rng, 5, 1.5));
        Assert.Throws<ArgumentOutOfRangeException>(() => Samplers.Poisson(ref rng, -1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => Samplers.Poisson(ref rng, double.PositiveInfinity));
    }

    private static double[] Draw(Func<double> sampler)
    {
        var samples = new double[Draws];
        for (int i = 0; i < Draws; i++)
        {
            samples[i] = sampler();
        }

        return samples;
    }

    private static void AssertMoments(double[] samples, double mean, double variance, double excessKurtosis)
    {
        int n = samples.Length;
        double sum = 0.0;
        foreach (double x in samples)
        {
            sum += x;
        }

        double sampleMean = sum / n;
        double squares = 0.0;
        foreach (double x in samples)
        {
            squares += (x - sampleMean) * (x - sampleMean);
        }

        double sampleVariance = squares / (n - 1);
        double meanError = Math.Sqrt(variance / n);
        double varianceError = variance * Math.Sqrt((excessKurtosis + 2.0) / n);
        Assert.True(Math.Abs(sampleMean - mean) <= 4 * meanError, $"mean {sampleMean:R}, expected {mean:R} ± {4 * meanError:G3}");
        Assert.True(Math.Abs(sampleVariance - variance) <= 4 * varianceError, $"variance {sampleVariance:R}, expected {variance:R} ± {4 * varianceError:G3}");
    }
}
