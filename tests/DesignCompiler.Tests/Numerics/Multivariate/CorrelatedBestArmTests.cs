using System.Globalization;
using DesignCompiler.Numerics;
using DesignCompiler.Numerics.Multivariate;

namespace DesignCompiler.Tests.Numerics.Multivariate;

public class CorrelatedBestArmTests
{
    private const double Inf = double.PositiveInfinity;

    // Invented posteriors (yields in t/ha after a few rounds), used only as inputs.
    private static readonly double[] Means = [5.10, 5.32, 4.95, 5.28, 5.05, 4.80, 5.22, 5.15];
    private static readonly double[] Sds = [0.12, 0.15, 0.20, 0.10, 0.18, 0.25, 0.14, 0.16];

    // Independent arms (Σ diagonal) must agree with the exact quadrature of ProbabilityOfBest, itself tested against
    // mpmath (ProbabilityOfBestContinuousTests), within the error bound this method states.
    [Theory]
    [InlineData(3)]
    [InlineData(5)]
    [InlineData(8)]
    public void IndependentArmsAgreeWithTheExactQuadrature(int k)
    {
        var (mu, sigma) = Independent(k);
        var estimate = CorrelatedBestArm.Estimate(mu, sigma, Inf);
        var exact = ProbabilityOfBest.Compute(Marginals(k));
        AssertAgrees(exact, estimate, 0.0);
    }

    // A shared effect added to every arm (Σ = D + c 11ᵀ, as a common round effect makes it) leaves every difference
    // θ_i − θ_j as it was, so P(best) is the independent one, and E[max] too (the shared part has mean 0 and moves
    // the maximum with every arm). Elementary; the independent values from ProbabilityOfBest.
    [Fact]
    public void ASharedEffectChangesNothing()
    {
        int k = Means.Length;
        var (mu, sigma) = Independent(k);
        for (int i = 0; i < k; i++)
        {
            for (int j = 0; j < k; j++) sigma[i, j] += 0.03;
        }
        AssertAgrees(ProbabilityOfBest.Compute(Marginals(k)), CorrelatedBestArm.Estimate(mu, sigma, Inf), 0.0);
    }

    // Sum-to-zero arm effects: θ = P z with P = I − 11ᵀ/k and z independent N(μ, D). Σ = P D P is positive
    // semidefinite and singular (Σ 1 = 0), the location is P μ. Differences are those of z, so P(best) is z's
    // (ProbabilityOfBest) and E[max θ] = E[max z] − mean(μ) (elementary).
    [Fact]
    public void SumToZeroEffectsMatchTheIndependentArmsTheyCameFrom()
    {
        int k = 6;
        var (mu, d) = Independent(k);
        var (location, sigma) = Centred(mu, d);
        var estimate = CorrelatedBestArm.Estimate(location, sigma, Inf);
        AssertAgrees(ProbabilityOfBest.Compute(Marginals(k)), estimate, -mu.Average());
    }

    [Fact]
    public void NearlySingularScaleGivesTheSingularAnswer()
    {
        // The sum-to-zero matrix above plus 1e-13 I: every difference variance moves by 2e-13, nothing visible.
        int k = 6;
        var (mu, d) = Independent(k);
        var (location, sigma) = Centred(mu, d);
        for (int i = 0; i < k; i++) sigma[i, i] += 1e-13;
        AssertAgrees(ProbabilityOfBest.Compute(Marginals(k)), CorrelatedBestArm.Estimate(location, sigma, Inf), -mu.Average());
    }

    [Fact]
    public void AnArmListedTwiceSharesItsProbability()
    {
        // Arm 3 is arm 0 again (same location, same row of Σ, correlation 1): the two are one variable, so each gets
        // half of what arm 0 has among arms 0–2 alone (elementary), from ProbabilityOfBest.
        var (mu3, sigma3) = Independent(3);
        double[] mu = [.. mu3, mu3[0]];
        var sigma = new double[4, 4];
        int[] source = [0, 1, 2, 0];
        for (int i = 0; i < 4; i++)
        {
            for (int j = 0; j < 4; j++) sigma[i, j] = sigma3[source[i], source[j]];
        }
        var estimate = CorrelatedBestArm.Estimate(mu, sigma, Inf);
        var exact = ProbabilityOfBest.Compute(Marginals(3));
        var p = estimate.Result.Probabilities;
        Assert.Equal(p[0], p[3]);
        NumericAssert.Absolute(exact.Probabilities[0] / 2, p[0], estimate.Result.ErrorBound, "arm 0");
        NumericAssert.Absolute(exact.Probabilities[1], p[1], estimate.Result.ErrorBound, "arm 1");
        NumericAssert.Absolute(exact.ExpectedMaximum, estimate.Result.ExpectedMaximum, estimate.ExpectedMaximumError, "E[max]");
    }

    // Three correlated arms: P(best) from the bivariate orthants of the differences and E[max] by Gaussian
    // integration by parts, both by mpmath.quad at 30 digits (reference/make_multivariate_references.py, "ThreeArms").
    [Theory]
    [InlineData(Inf, 0.31910013793049591174, 0.67186870540980275891, 0.0090311566597013293494, 1.2925949513165183966)]
    [InlineData(5.0, 0.32300561236442128949, 0.6560863136996900621, 0.020908073935888648415, 1.3275945754933234897)]
    [InlineData(2.5, 0.3255862821676950842, 0.64096082376975853599, 0.033452894062546379815, 1.3907510373013339168)]
    public void ThreeCorrelatedArmsMatchMpmath(double nu, double p0, double p1, double p2, double expectedMaximum)
    {
        double[] mu = [1.0, 1.2, 0.7];
        var sigma = new double[,] { { 0.09, 0.03, 0.02 }, { 0.03, 0.16, 0.05 }, { 0.02, 0.05, 0.04 } };
        var estimate = CorrelatedBestArm.Estimate(mu, sigma, nu);
        var result = estimate.Result;
        double[] expected = [p0, p1, p2];
        for (int i = 0; i < 3; i++) NumericAssert.Absolute(expected[i], result.Probabilities[i], result.ErrorBound, $"P{i}");
        Assert.True(result.ErrorBound <= LatticeSettings.DefaultAccuracy, result.ToString());
        NumericAssert.Absolute(expectedMaximum, result.ExpectedMaximum, estimate.ExpectedMaximumError, "E[max]");
        for (int i = 0; i < 3; i++) NumericAssert.Absolute(expectedMaximum - mu[i], result.ExpectedLoss[i], estimate.ExpectedMaximumError, $"loss {i}");
    }

    // Two normal arms: P(θ1 > θ2) = Φ(δ/σ) with σ² = Σ11 + Σ22 − 2Σ12, and Clark's E[max] = μ1Φ(d) + μ2Φ(−d) + σφ(d)
    // (C. E. Clark 1961, Operations Research 9:145, which allows correlation; citation details from memory). Exact.
    [Fact]
    public void TwoNormalArmsAreExact()
    {
        double[] mu = [0.3, 0.1];
        var sigma = new double[,] { { 1, 0.4 }, { 0.4, 0.5 } };
        var result = CorrelatedBestArm.Compute(mu, sigma, Inf);
        double sd = Math.Sqrt(1 + 0.5 - 0.8), d = 0.2 / sd;
        Assert.True(result.ErrorBound <= 1e-14, result.ToString());
        NumericAssert.Absolute(StandardNormal.Cdf(d), result.Probabilities[0], 1e-15, "P(θ1 > θ2)");
        double clark = 0.3 * StandardNormal.Cdf(d) + 0.1 * StandardNormal.Cdf(-d) + sd * StandardNormal.Pdf(d);
        NumericAssert.Absolute(clark, result.ExpectedMaximum, 1e-14, "E[max]");
    }

    // Two t arms: the difference is t_ν(δ, σ), so P(θ1 > θ2) = T_ν(δ/σ) (common textbook result); E[max] by mpmath
    // quadrature of (μ1 + μ2)/2 + E|D|/2 (reference/make_multivariate_references.py, "TwoArmT").
    [Fact]
    public void TwoTArmsAreExact()
    {
        double[] mu = [0.3, 0.1];
        var sigma = new double[,] { { 1, 0.4 }, { 0.4, 0.5 } };
        var result = CorrelatedBestArm.Compute(mu, sigma, 4);
        double sd = Math.Sqrt(0.7);
        Assert.True(result.ErrorBound <= 1e-14, result.ToString());
        NumericAssert.Absolute(StudentT.Cdf(4, 0.2 / sd), result.Probabilities[0], 1e-15, "P(θ1 > θ2)");
        NumericAssert.Absolute(TwoArmTMaximum, result.ExpectedMaximum, 1e-13, "E[max]");
    }

    [Fact]
    public void CauchyArmsHaveProbabilitiesButNoMeanOfTheMaximum()
    {
        // ν = 1: the difference is Cauchy, P(θ1 > θ2) = ½ + atan(δ/σ)/π (elementary); E[max] does not exist (+∞).
        var result = CorrelatedBestArm.Compute([0.3, 0.1], new double[,] { { 1, 0.4 }, { 0.4, 0.5 } }, 1);
        NumericAssert.Absolute(0.5 + Math.Atan(0.2 / Math.Sqrt(0.7)) / Math.PI, result.Probabilities[0], 1e-15, "Cauchy");
        Assert.Equal(Inf, result.ExpectedMaximum);
        Assert.All(result.ExpectedLoss, loss => Assert.Equal(Inf, loss));
    }

    [Fact]
    public void OneArmIsCertainlyBest()
    {
        var result = CorrelatedBestArm.Compute([2.5], new double[,] { { 0.3 } }, 7);
        Assert.Equal(1.0, Assert.Single(result.Probabilities));
        Assert.Equal(0.0, Assert.Single(result.ExpectedLoss));
        Assert.Equal(2.5, result.ExpectedMaximum);
    }

    [Fact]
    public void AnArmFarBehindIsScreenedOut()
    {
        // Arm 5 sits 40 standard deviations of its difference behind: min_j P(θ5 > θj) ≈ 1e-350, so it gets exactly 0
        // and the others what they have without it (ProbabilityOfBest on the rest; the far arm adds nothing visible).
        var (mu, sigma) = Independent(6);
        mu[5] = 5.32 - 40 * Math.Sqrt(sigma[5, 5] + sigma[1, 1]);
        var estimate = CorrelatedBestArm.Estimate(mu, sigma, Inf);
        Assert.Equal(1, estimate.ScreenedArms);
        Assert.Equal(0.0, estimate.Result.Probabilities[5]);
        var marginals = Enumerable.Range(0, 6).Select(i => (IMarginal)new NormalMarginal(mu[i], Math.Sqrt(sigma[i, i]))).ToArray();
        AssertAgrees(ProbabilityOfBest.Compute(marginals), estimate, 0.0);
    }

    [Fact]
    public void LargeDegreesOfFreedomTendToTheNormal()
    {
        // t_ν → normal as ν → ∞ (common textbook result); at ν = 1e6 the gap is about 1e-6.
        double[] mu = [1.0, 1.2, 0.7, 1.1];
        var sigma = new double[,] { { 0.09, 0.03, 0.02, 0.01 }, { 0.03, 0.16, 0.05, 0.02 }, { 0.02, 0.05, 0.04, 0.0 }, { 0.01, 0.02, 0.0, 0.05 } };
        var normal = CorrelatedBestArm.Compute(mu, sigma, Inf);
        var t = CorrelatedBestArm.Compute(mu, sigma, 1e6);
        for (int i = 0; i < 4; i++) NumericAssert.Absolute(normal.Probabilities[i], t.Probabilities[i], normal.ErrorBound + t.ErrorBound + 1e-5, $"arm {i}");
    }

    [Fact]
    public void ProbabilitiesSumToOneAndLieInTheUnitInterval()
    {
        // Common practice for P(best) (exactly one arm is best almost surely).
        double[] mu = [1.0, 1.2, 0.7, 1.1];
        var sigma = new double[,] { { 0.09, 0.03, 0.02, 0.01 }, { 0.03, 0.16, 0.05, 0.02 }, { 0.02, 0.05, 0.04, 0.0 }, { 0.01, 0.02, 0.0, 0.05 } };
        var result = CorrelatedBestArm.Compute(mu, sigma, 3.5);
        NumericAssert.Absolute(1.0, result.Probabilities.Sum(), 1e-14, "sum");
        Assert.All(result.Probabilities, p => Assert.InRange(p, 0.0, 1.0));
        Assert.All(result.ExpectedLoss, loss => Assert.True(loss >= 0));
    }

    // The same input gives the same bits under any culture and on any thread, many at once (project rule).
    [Fact]
    public void SameInputSameBitsUnderAnyCultureAndThreads()
    {
        double[] mu = [1.0, 1.2, 0.7, 1.1, 0.95];
        var sigma = new double[,]
        {
            { 0.09, 0.03, 0.02, 0.01, 0.02 }, { 0.03, 0.16, 0.05, 0.02, 0.03 }, { 0.02, 0.05, 0.04, 0.0, 0.01 },
            { 0.01, 0.02, 0.0, 0.05, 0.01 }, { 0.02, 0.03, 0.01, 0.01, 0.07 },
        };
        string reference = Fingerprint(CorrelatedBestArm.Estimate(mu, sigma, 6.0));
        var saved = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            var fingerprints = new string[4];
            Parallel.For(0, 4, new ParallelOptions { MaxDegreeOfParallelism = 4 }, i =>
            {
                CultureInfo.CurrentCulture = new CultureInfo(i % 2 == 0 ? "de-DE" : "fr-FR");
                fingerprints[i] = Fingerprint(CorrelatedBestArm.Estimate(mu, sigma, 6.0));
            });
            Assert.All(fingerprints, f => Assert.Equal(reference, f));
            Assert.Equal(reference, Fingerprint(CorrelatedBestArm.Estimate(mu, sigma, 6.0)));
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }
    }

    // The reported bound is a statistical estimate (3 standard errors over the shifts); against the exact answer
    // for independent arms it must hold for nearly every seed of the shifts: at most 2 misses in 20.
    [Fact]
    public void ErrorBoundCoversTheTrueErrorAcrossSeeds()
    {
        var (mu, sigma) = Independent(5);
        var exact = ProbabilityOfBest.Compute(Marginals(5));
        int misses = 0;
        for (ulong seed = 1; seed <= 20; seed++)
        {
            var result = CorrelatedBestArm.Estimate(mu, sigma, Inf, LatticeSettings.Default with { Seed = seed, Accuracy = 1e-3 }).Result;
            double worst = 0;
            for (int i = 0; i < 5; i++) worst = Math.Max(worst, Math.Abs(result.Probabilities[i] - exact.Probabilities[i]));
            if (worst > result.ErrorBound) misses++;
        }
        Assert.True(misses <= 2, $"{misses} of 20 error bounds missed the true error");
    }

    [Fact]
    public void BadArgumentsAreRefused()
    {
        Assert.Throws<ArgumentException>(() => CorrelatedBestArm.Compute([], new double[0, 0], Inf));
        Assert.Throws<ArgumentException>(() => CorrelatedBestArm.Compute([1, 2], new double[,] { { 1 } }, Inf));
        Assert.Throws<ArgumentException>(() => CorrelatedBestArm.Compute([1, double.NaN], new double[,] { { 1, 0 }, { 0, 1 } }, Inf));
        Assert.Throws<ArgumentException>(() => CorrelatedBestArm.Compute([1, 2], new double[,] { { 1, 2 }, { 2, 1 } }, Inf));
        Assert.Throws<ArgumentException>(() => CorrelatedBestArm.Compute([1, 2], new double[,] { { -1, 0 }, { 0, 1 } }, Inf));
        Assert.Throws<ArgumentOutOfRangeException>(() => CorrelatedBestArm.Compute([1, 2], new double[,] { { 1, 0 }, { 0, 1 } }, -3));
    }

    // TwoArmT.EMax(0.3, 0.1, [1, 0.4; 0.4, 0.5], nu 4), make_multivariate_references.py.
    private const double TwoArmTMaximum = 0.62724139694978718093;

    internal static (double[] Mu, double[,] Sigma) Independent(int k)
    {
        var mu = Means[..k];
        var sigma = new double[k, k];
        for (int i = 0; i < k; i++) sigma[i, i] = Sds[i] * Sds[i];
        return (mu, sigma);
    }

    private static IMarginal[] Marginals(int k) => [.. Enumerable.Range(0, k).Select(i => (IMarginal)new NormalMarginal(Means[i], Sds[i]))];

    private static (double[] Location, double[,] Sigma) Centred(double[] mu, double[,] d)
    {
        int k = mu.Length;
        var p = new double[k, k];
        for (int i = 0; i < k; i++)
        {
            for (int j = 0; j < k; j++) p[i, j] = (i == j ? 1.0 : 0.0) - 1.0 / k;
        }
        var location = new double[k];
        var sigma = new double[k, k];
        for (int i = 0; i < k; i++)
        {
            for (int j = 0; j < k; j++)
            {
                location[i] += p[i, j] * mu[j];
                double sum = 0;
                for (int l = 0; l < k; l++) sum += p[i, l] * d[l, l] * p[j, l];
                sigma[i, j] = sum;
            }
        }
        return (location, sigma);
    }

    // Each probability within the stated bound; E[max] and every loss within the stated E[max] error. offset is
    // what E[max] of this problem adds to the reference's.
    private static void AssertAgrees(BestArmResult exact, CorrelatedBestArmEstimate estimate, double offset)
    {
        var result = estimate.Result;
        for (int i = 0; i < exact.Probabilities.Length; i++)
            NumericAssert.Absolute(exact.Probabilities[i], result.Probabilities[i], result.ErrorBound, $"P(arm {i} best)");
        Assert.True(estimate.ReachedAccuracy && result.ErrorBound <= LatticeSettings.DefaultAccuracy, result.ToString());
        NumericAssert.Absolute(exact.ExpectedMaximum + offset, result.ExpectedMaximum, estimate.ExpectedMaximumError, "E[max]");
    }

    private static string Fingerprint(CorrelatedBestArmEstimate estimate)
    {
        var r = estimate.Result;
        var bits = r.Probabilities.Concat(r.ExpectedLoss).Append(r.ExpectedMaximum).Append(r.ErrorBound).Append(estimate.ExpectedMaximumError)
            .Select(x => BitConverter.DoubleToInt64Bits(x).ToString("X16", CultureInfo.InvariantCulture));
        return string.Join(",", bits) + ";" + estimate.PointsPerShift.ToString(CultureInfo.InvariantCulture);
    }
}
