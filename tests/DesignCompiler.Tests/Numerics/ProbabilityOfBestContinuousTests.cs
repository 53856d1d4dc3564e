using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

public class ProbabilityOfBestContinuousTests
{
    // Two normal arms: X − Y ~ N(μx − μy, σx² + σy²), so P(X > Y) = Φ((μx − μy)/√(σx² + σy²)) (common
    // textbook result); E[max(X,Y)] = μ1Φ(d) + μ2Φ(−d) + θφ(d) with θ = √(σ1² + σ2²), d = (μ1 − μ2)/θ
    // (C. E. Clark 1961, "The greatest of a finite set of random variables", Operations Research 9:145 —
    // citation details from memory).
    [Theory]
    [InlineData(0.0, 1.0, 0.5, 0.8)]
    [InlineData(0.31, 0.004, 0.30, 0.003)]
    [InlineData(-3.0, 0.01, 4.0, 5.0)]
    [InlineData(1.0, 1e-4, 1.00001, 2e-4)]
    [InlineData(10.0, 1.0, 0.0, 1.0)]
    public void TwoNormalsMatchTheClosedForms(double mu1, double sd1, double mu2, double sd2)
    {
        var result = ProbabilityOfBest.Compute([new NormalMarginal(mu1, sd1), new NormalMarginal(mu2, sd2)]);
        double theta = Math.Sqrt(sd1 * sd1 + sd2 * sd2), d = (mu1 - mu2) / theta;
        NumericAssert.Absolute(StandardNormal.Cdf(d), result.Probabilities[0], 1e-12, "P(X > Y)");
        NumericAssert.Absolute(StandardNormal.UpperTail(d), result.Probabilities[1], 1e-12, "P(Y > X)");
        double clark = mu1 * StandardNormal.Cdf(d) + mu2 * StandardNormal.UpperTail(d) + theta * StandardNormal.Pdf(d);
        NumericAssert.Absolute(clark, result.ExpectedMaximum, 1e-12 * Math.Max(1, Math.Abs(clark)), "E[max]");
        NumericAssert.Absolute(clark - mu1, result.ExpectedLoss[0], 1e-12 * Math.Max(1, Math.Abs(clark)), "loss of arm 0");
    }

    [Fact]
    public void ExtremelyPeakedNormalsAreLimitedByTheResolutionOfX()
    {
        // sd 1e-6 at location 1: a double near 1 resolves only 2e-10 sd, so the quadrature nodes themselves
        // carry that much jitter; the closed form (above) is met to that resolution, not to 1e-12.
        var result = ProbabilityOfBest.Compute([new NormalMarginal(1.0, 1e-6), new NormalMarginal(1.0000001, 2e-6)]);
        double d = (1.0 - 1.0000001) / Math.Sqrt(1e-12 + 4e-12);
        NumericAssert.Absolute(StandardNormal.Cdf(d), result.Probabilities[0], 1e-10, "P(X > Y)");
    }

    [Fact]
    public void TwoCauchyArmsMatchTheClosedForm()
    {
        // Cauchy is stable: X − Y ~ Cauchy(l1 − l2, s1 + s2), so P(X > Y) = ½ + atan((l1 − l2)/(s1 + s2))/π.
        var result = ProbabilityOfBest.Compute([new StudentTMarginal(1, 0.3, 2), new StudentTMarginal(1, -1, 0.5)]);
        NumericAssert.Absolute(0.5 + Math.Atan(1.3 / 2.5) / Math.PI, result.Probabilities[0], 1e-12, "Cauchy");
    }

    [Theory]
    [InlineData(21, 6, 15, 4, 0.4272459373117008264910252)]
    [InlineData(0.5, 1, 2, 3, 0.3125)]
    // Shapes from 50 on take the uniform expansion near the centre (GammaKernel.Uniform.cs). Expected: the same
    // expression in mpmath at 40 digits, with I_x(a,b) = x^a (1-x)^b 2F1(a+b, 1; a+1; x) / (a B(a,b)) (DLMF 8.17.8),
    // which agreed to 25 digits with mpmath.quad of the beta density.
    [InlineData(60, 2, 55, 2.1, 0.7670083132999014826365179)]
    [InlineData(240, 12, 260, 13, 0.499523709970745391022523)]
    [InlineData(2500, 40, 2480, 39.5, 0.4362919371851592834611059)]
    [InlineData(15000, 5000, 15100, 5020, 0.4090041086799765817884872)]
    public void TwoGammaArmsMatchTheBetaIdentity(double a, double r1, double b, double r2, double expected)
    {
        // For X ~ Gamma(a, r1), Y ~ Gamma(b, r2): r1X/(r1X + r2Y) ~ Beta(a,b), so P(X > Y) = 1 − I_{r1/(r1+r2)}(a,b).
        // Expected: that expression in mpmath at 40 digits (make_reference_values.py "closed").
        var result = ProbabilityOfBest.Compute([new GammaMarginal(a, r1), new GammaMarginal(b, r2)]);
        NumericAssert.Absolute(expected, result.Probabilities[0], 1e-12, "P(X > Y)");
    }

    // Reference: mpmath.quad at 25 digits (make_reference_values.py, section "best"; ReferenceValues).
    [Theory]
    [InlineData("N1")]
    [InlineData("N2")]
    [InlineData("N3")]
    [InlineData("T1")]
    [InlineData("T2")]
    [InlineData("T3")]
    [InlineData("G1")]
    [InlineData("G2")]
    [InlineData("G3")]
    [InlineData("M1")]
    public void MatchesMpmathQuadrature(string id)
    {
        var (arms, probabilities, expectedMaximum) = ReferenceValues.Cases[id];
        var result = ProbabilityOfBest.Compute(arms);
        for (int i = 0; i < arms.Length; i++) NumericAssert.Absolute(probabilities[i], result.Probabilities[i], 1e-12, $"{id} arm {i}");
        NumericAssert.Absolute(1.0, result.Probabilities.Sum(), 1e-12, $"{id} sum");
        if (expectedMaximum is double e) NumericAssert.Absolute(e, result.ExpectedMaximum, 1e-11 * Math.Max(1, Math.Abs(e)), $"{id} E[max]");
        Assert.True(result.ErrorBound < 1e-9, $"{id} error bound {result.ErrorBound}");
    }

    [Fact]
    public void HeavyTailsNeverGiveNaN()
    {
        // Cauchy arms have no mean: E[max] is then that of the maximum clamped to where all but 1e-16 of the
        // mass lies, a finite number; the probabilities are unaffected.
        var result = ProbabilityOfBest.Compute([new StudentTMarginal(1, 0, 1), new StudentTMarginal(1, 0, 1e-3), new StudentTMarginal(1.5, 1, 10)]);
        Assert.True(double.IsFinite(result.ExpectedMaximum));
        Assert.All(result.ExpectedLoss, l => Assert.True(double.IsFinite(l) && l >= 0));
        NumericAssert.Absolute(1.0, result.Probabilities.Sum(), 1e-12, "sum");
        Assert.True(result.ErrorBound < 1e-9, $"error bound {result.ErrorBound}");
    }
}
