using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

public class ProbabilityOfBestBetaTests
{
    // PB01–PB05: REFERENCES.md §2, "P(arm i best)" by 30-digit quadrature (exact rationals for PB01–PB03).
    public static TheoryData<string, double[][], double[]> References => new()
    {
        { "PB01", [[1, 1], [1, 1], [1, 1]], [1.0 / 3, 1.0 / 3, 1.0 / 3] },
        {
            "PB02", [[11, 91], [16, 86], [21, 81]],
            [0.01468189234344456821963831, 0.1748584341023412516433583, 0.8104596735542141801370034]
        },
        {
            "PB03", [[2, 3], [3, 2], [1, 1], [5, 5]],
            [1779.0 / 17017, 4003.0 / 9724, 1275.0 / 4004, 402.0 / 2431]
        },
        {
            "PB04", [[1201, 8801], [1151, 8851], [1251, 8751], [1221, 8781]],
            [0.09164690123633838283453704, 0.00410303638705420404385442, 0.6769158369751089165510071, 0.2273342254014984965706014]
        },
        {
            "PB05", [[1201, 8801], [1201, 8801], [1151, 8851]],
            [0.4747485229629579719836175, 0.4747485229629579719836175, 0.05050295407408405603276504]
        },
    };

    [Theory]
    [MemberData(nameof(References))]
    public void MatchesReference(string id, double[][] parameters, double[] expected)
    {
        var arms = parameters.Select(p => (IMarginal)new BetaMarginal(p[0], p[1])).ToArray();
        var result = ProbabilityOfBest.Compute(arms);
        for (int i = 0; i < arms.Length; i++) NumericAssert.Absolute(expected[i], result.Probabilities[i], 1e-12, $"{id} arm {i}");
        NumericAssert.Absolute(1.0, result.Probabilities.Sum(), 1e-12, $"{id} sum");
        Assert.True(result.ErrorBound < 1e-9, $"{id} error bound {result.ErrorBound}");
    }

    [Fact]
    public void IdenticalArmsGetIdenticalProbabilities()
    {
        // PB05 has two equal arms; equality must be exact, not just within the tolerance.
        var result = ProbabilityOfBest.Compute([new BetaMarginal(1201, 8801), new BetaMarginal(1151, 8851), new BetaMarginal(1201, 8801)]);
        Assert.Equal(result.Probabilities[0], result.Probabilities[2]);
        var uniform = ProbabilityOfBest.Compute([new BetaMarginal(1, 1), new BetaMarginal(1, 1), new BetaMarginal(1, 1), new BetaMarginal(1, 1)]);
        Assert.All(uniform.Probabilities, p => Assert.Equal(uniform.Probabilities[0], p));
        NumericAssert.Absolute(0.25, uniform.Probabilities[0], 1e-15, "four equal arms");
    }

    [Fact]
    public void OneArmIsCertainlyBest()
    {
        var result = ProbabilityOfBest.Compute([new BetaMarginal(3, 7)]);
        Assert.Equal(1.0, result.Probabilities[0]);
        Assert.Equal(0.0, result.ExpectedLoss[0]);
        Assert.Equal(0.3, result.ExpectedMaximum, 15);
    }

    [Fact]
    public void ArmsThatCannotBeBestGetExactlyZero()
    {
        // Beta(1200,8800) ends (upper tail 1e-16 at 0.147) below where Beta(3400,6600) begins (0.30), so its
        // P(best), at most P(Beta(1200,8800) > Beta(3400,6600)), is far below any double's resolution of 1.
        var result = ProbabilityOfBest.Compute([new BetaMarginal(30, 70), new BetaMarginal(1200, 8800), new BetaMarginal(3400, 6600)]);
        Assert.Equal(0.0, result.Probabilities[1]);
        NumericAssert.Absolute(1.0, result.Probabilities[0] + result.Probabilities[2], 1e-14, "rest");
    }

    [Fact]
    public void PeakedNextToFlat()
    {
        // Beta(5000,5000) (sd 0.005) beside two untried arms: given X, both uniforms fall below it with
        // probability X², so P(peaked best) = E[X²] = Var X + (E X)² exactly.
        var arms = new IMarginal[] { new BetaMarginal(1, 1), new BetaMarginal(5000, 5000), new BetaMarginal(1, 1) };
        var result = ProbabilityOfBest.Compute(arms);
        NumericAssert.Absolute(0.25 + 0.25 / 10001, result.Probabilities[1], 1e-12, "peaked arm");
        Assert.Equal(result.Probabilities[0], result.Probabilities[2]);
    }

    [Fact]
    public void HundredArms()
    {
        // K = 100 arms from a simulated trial state: probabilities are a distribution and arms with the same
        // counts get the same value.
        var rng = new Random(11);
        var arms = new IMarginal[100];
        for (int i = 0; i < arms.Length; i++)
        {
            int n = 50 + 10 * rng.Next(0, 30), s = (int)(n * (0.3 + 0.002 * rng.Next(0, 20)));
            arms[i] = new BetaMarginal(1 + s, 1 + n - s);
        }
        var result = ProbabilityOfBest.Compute(arms);
        Assert.All(result.Probabilities, p => Assert.InRange(p, 0.0, 1.0));
        NumericAssert.Absolute(1.0, result.Probabilities.Sum(), 1e-12, "sum");
        Assert.True(result.ErrorBound < 1e-9, $"error bound {result.ErrorBound}");
        for (int i = 0; i < arms.Length; i++)
        {
            for (int j = 0; j < i; j++)
            {
                if (arms[i].Equals(arms[j])) Assert.Equal(result.Probabilities[j], result.Probabilities[i]);
            }
        }
    }

    [Fact]
    public void SingularEndpointsNearOne()
    {
        // Jeffreys-prior arms with no failures yet have densities like (1−x)^(−½) at 1, whose mass in the last
        // representable interval below 1 is about 1e-8; the quadrature works in the distance from 1 there.
        // Reference: mpmath.quad at 25 digits (make_reference_values.py, case J1).
        var result = ProbabilityOfBest.Compute([new BetaMarginal(10.5, 0.5), new BetaMarginal(3.5, 0.5), new BetaMarginal(5.5, 2.5)]);
        NumericAssert.Absolute(ReferenceValues.J1[0], result.Probabilities[0], 1e-12, "J1 arm 0");
        NumericAssert.Absolute(ReferenceValues.J1[1], result.Probabilities[1], 1e-12, "J1 arm 1");
        NumericAssert.Absolute(ReferenceValues.J1[2], result.Probabilities[2], 1e-12, "J1 arm 2");
        Assert.True(result.ErrorBound < 1e-12, $"error bound {result.ErrorBound}");
    }
}
