using DesignCompiler.Numerics.Multivariate;
using DesignCompiler.Randomness;

namespace DesignCompiler.Tests.Numerics.Multivariate;

public class JointSamplerTests
{
    private const double Inf = double.PositiveInfinity;

    private static readonly double[] Mu = [1.0, 1.2, 0.7];
    private static readonly double[,] Sigma = { { 0.09, 0.03, 0.02 }, { 0.03, 0.16, 0.05 }, { 0.02, 0.05, 0.04 } };

    [Fact]
    public void TheSameStreamGivesTheSameDraws()
    {
        var sampler = new JointSampler(Mu, Sigma, 5);
        var a = Draws(sampler, 50, 42);
        var b = Draws(sampler, 50, 42);
        var c = Draws(sampler, 50, 43);
        Assert.Equal(a, b);
        Assert.NotEqual(a, c);
    }

    [Fact]
    public void ADrawUsesTheDocumentedNumbersInOrder()
    {
        // Normals as ⌈k/2⌉ polar pairs, then the chi-square as twice a Gamma(ν/2): rebuilt here from the samplers
        // and the factor L of Σ (computed by hand: L = chol(Σ), the standard Cholesky–Banachiewicz recurrence).
        double l11 = 0.3, l21 = 0.1, l22 = Math.Sqrt(0.16 - 0.01), l31 = 0.02 / 0.3;
        double l32 = (0.05 - l31 * l21) / l22, l33 = Math.Sqrt(0.04 - l31 * l31 - l32 * l32);
        var rng = new Xoshiro256StarStar(7);
        Samplers.StandardNormalPair(ref rng, out double z1, out double z2);
        Samplers.StandardNormalPair(ref rng, out double z3, out _);
        double s = Math.Sqrt(2 * Samplers.Gamma(ref rng, 2.5) / 5);
        var draw = new double[3];
        var stream = new Xoshiro256StarStar(7);
        new JointSampler(Mu, Sigma, 5).Draw(ref stream, draw);
        NumericAssert.Absolute(1.0 + l11 * z1 / s, draw[0], 1e-14, "θ1");
        NumericAssert.Absolute(1.2 + (l21 * z1 + l22 * z2) / s, draw[1], 1e-14, "θ2");
        NumericAssert.Absolute(0.7 + (l31 * z1 + l32 * z2 + l33 * z3) / s, draw[2], 1e-14, "θ3");
        Assert.Equal(rng.NextUInt64(), stream.NextUInt64());
    }

    // Sample moments against the definitions: mean μ; covariance Σ for the normal and ν/(ν − 2) Σ for the
    // multivariate t (Kotz and Nadarajah 2004, Multivariate t Distributions and Their Applications, ch. 1; from
    // memory). Tolerances are 5 standard errors of each sample moment (common practice for a fixed-seed check).
    [Theory]
    [InlineData(Inf)]
    [InlineData(8.0)]
    public void SampleMomentsMatchTheDistribution(double nu)
    {
        const int n = 40000;
        var sampler = new JointSampler(Mu, Sigma, nu);
        var rng = new Xoshiro256StarStar(2026);
        var draw = new double[3];
        var sum = new double[3];
        var cross = new double[3, 3];
        var all = new double[n, 3];
        for (int r = 0; r < n; r++)
        {
            sampler.Draw(ref rng, draw);
            for (int i = 0; i < 3; i++) all[r, i] = draw[i];
        }
        for (int r = 0; r < n; r++)
        {
            for (int i = 0; i < 3; i++) sum[i] += all[r, i];
        }
        double factor = double.IsPositiveInfinity(nu) ? 1.0 : nu / (nu - 2);
        for (int i = 0; i < 3; i++)
        {
            double mean = sum[i] / n;
            NumericAssert.Absolute(Mu[i], mean, 5 * Math.Sqrt(factor * Sigma[i, i] / n), $"mean {i}");
            for (int j = 0; j < 3; j++)
            {
                double c = 0;
                for (int r = 0; r < n; r++) c += (all[r, i] - sum[i] / n) * (all[r, j] - sum[j] / n);
                cross[i, j] = c / (n - 1);
            }
        }
        for (int i = 0; i < 3; i++)
        {
            for (int j = 0; j < 3; j++)
            {
                double expected = factor * Sigma[i, j];
                // sd of a sample covariance of normals is about √((Σii Σjj + Σij²)/n); the t's heavier tails (ν = 8)
                // roughly double it, so allow 10 of the normal's.
                double se = factor * Math.Sqrt((Sigma[i, i] * Sigma[j, j] + Sigma[i, j] * Sigma[i, j]) / n);
                NumericAssert.Absolute(expected, cross[i, j], 10 * se, $"cov({i},{j})");
            }
        }
    }

    [Fact]
    public void SumToZeroEffectsStayOnTheirConstraint()
    {
        // Σ = P D P with P = I − 11ᵀ/k is singular: every draw of θ − μ must sum to zero (to rounding).
        int k = 5;
        var sigma = new double[k, k];
        double[] d = [0.04, 0.09, 0.01, 0.16, 0.05];
        for (int i = 0; i < k; i++)
        {
            for (int j = 0; j < k; j++)
            {
                double s = 0;
                for (int l = 0; l < k; l++) s += ((i == l ? 1.0 : 0.0) - 1.0 / k) * d[l] * ((j == l ? 1.0 : 0.0) - 1.0 / k);
                sigma[i, j] = s;
            }
        }
        var sampler = new JointSampler(new double[k], sigma, 4);
        var rng = new Xoshiro256StarStar(11);
        var draw = new double[k];
        double spread = 0;
        for (int r = 0; r < 1000; r++)
        {
            sampler.Draw(ref rng, draw);
            Assert.True(Math.Abs(draw.Sum()) < 1e-12 * (1 + draw.Sum(Math.Abs)), $"draw {r} sums to {draw.Sum()}");
            spread += Math.Abs(draw[0]);
        }
        Assert.True(spread > 10, "the draws are not all zero");
    }

    [Fact]
    public void ThompsonFrequenciesMatchTheProbabilityOfBest()
    {
        // P(best) estimated by counting the best arm in joint draws (plain Monte Carlo, binomial standard error
        // √(p(1 − p)/n); common practice) agrees with CorrelatedBestArm within 4 standard errors plus its bound.
        const int n = 40000;
        var sampler = new JointSampler(Mu, Sigma, 5);
        var rng = new Xoshiro256StarStar(99);
        var draw = new double[3];
        var wins = new int[3];
        for (int r = 0; r < n; r++)
        {
            sampler.Draw(ref rng, draw);
            int best = 0;
            for (int i = 1; i < 3; i++)
            {
                if (draw[i] > draw[best]) best = i;
            }
            wins[best]++;
        }
        var result = CorrelatedBestArm.Compute(Mu, Sigma, 5);
        for (int i = 0; i < 3; i++)
        {
            double p = result.Probabilities[i];
            NumericAssert.Absolute(p, wins[i] / (double)n, 4 * Math.Sqrt(p * (1 - p) / n) + result.ErrorBound, $"arm {i}");
        }
    }

    private static double[] Draws(JointSampler sampler, int count, ulong seed)
    {
        var rng = new Xoshiro256StarStar(seed);
        var all = new double[count * sampler.Count];
        for (int r = 0; r < count; r++) sampler.Draw(ref rng, all.AsSpan(r * sampler.Count, sampler.Count));
        return all;
    }
}
