using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

public class AffineMarginalTests
{
    [Fact]
    public void MinimisingIsMaximisingTheNegative()
    {
        // The arm with the smallest rate x is the one with the largest 1 − x, and 1 − X ~ Beta(b,a) for
        // X ~ Beta(a,b): the reflected arms are an independent way to get the same probabilities.
        var counts = new (double A, double B)[] { (12, 40), (9, 44), (15, 35), (2, 9) };
        var negated = counts.Select(c => (IMarginal)new AffineMarginal(new BetaMarginal(c.A, c.B), -1, 0)).ToArray();
        var reflected = counts.Select(c => (IMarginal)new BetaMarginal(c.B, c.A)).ToArray();
        var viaAffine = ProbabilityOfBest.Compute(negated);
        var viaReflection = ProbabilityOfBest.Compute(reflected);
        for (int i = 0; i < counts.Length; i++)
        {
            NumericAssert.Absolute(viaReflection.Probabilities[i], viaAffine.Probabilities[i], 1e-13, $"arm {i}");
        }
        // Expected loss is in the units of the ranked value; here −x against 1 − x differ by a shift only.
        for (int i = 0; i < counts.Length; i++)
        {
            NumericAssert.Absolute(viaReflection.ExpectedLoss[i], viaAffine.ExpectedLoss[i], 1e-13, $"loss {i}");
        }
    }

    [Fact]
    public void CommonPositiveAffineMapsLeaveProbabilitiesAlone()
    {
        // P(best) depends only on the order of the values, which a common u = s·x + c with s > 0 keeps;
        // s < 0 reverses it, which the comparison with −x covers.
        var arms = new IMarginal[] { new GammaMarginal(21, 6), new GammaMarginal(15, 4), new GammaMarginal(30, 9) };
        var plain = ProbabilityOfBest.Compute(arms);
        var scaled = ProbabilityOfBest.Compute(arms.Select(a => (IMarginal)new AffineMarginal(a, 120, -35)).ToArray());
        for (int i = 0; i < arms.Length; i++) NumericAssert.Absolute(plain.Probabilities[i], scaled.Probabilities[i], 1e-13, $"arm {i}");
        NumericAssert.Relative(120 * plain.ExpectedMaximum - 35, scaled.ExpectedMaximum, 1e-13, "E[max]");
    }

    [Fact]
    public void NetValueRanksByPriceTimesRateMinusCost()
    {
        // Two treatments: a cheaper one with a lower success rate and a dearer one with a higher rate.
        // Net value u = price·θ − cost; the ranking follows u, not θ. With normal posteriors for θ the
        // answer is the closed form Φ((μ₁−μ₂)/√(σ₁²+σ₂²)) on the mapped means and sds.
        var cheap = new AffineMarginal(new NormalMarginal(0.60, 0.03), 100, -10);   // u ~ N(50, 3)
        var dear = new AffineMarginal(new NormalMarginal(0.66, 0.02), 100, -14);    // u ~ N(52, 2)
        var result = ProbabilityOfBest.Compute([cheap, dear]);
        double expected = StandardNormal.Cdf((52.0 - 50.0) / Math.Sqrt(9 + 4));
        NumericAssert.Absolute(expected, result.Probabilities[1], 1e-13, "dear arm best");
    }
}
