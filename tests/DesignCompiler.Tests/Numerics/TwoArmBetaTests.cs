using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

public class TwoArmBetaTests
{
    // PG01–PG08: REFERENCES.md §2 (Cook 2005 recurrence = Miller 2015 sum = exact rationals, 50 digits).
    public static TheoryData<string, int, int, int, int, double> References => new()
    {
        { "PG01", 1, 1, 1, 1, 0.5 },
        { "PG02", 2, 1, 1, 1, 0.666666666666666666666666666667 },
        { "PG03", 6, 6, 4, 8, 0.806501547987616099071207430341 },
        { "PG04", 21, 81, 11, 91, 0.975173033152874612787916170553 },
        { "PG05", 1201, 8801, 1151, 8851, 0.863840268965663092846421003279 },
        { "PG06", 1201, 8801, 1201, 8801, 0.5 },
        { "PG07", 121, 881, 1201, 8801, 0.516856125116876560273459052172 },
        { "PG08", 2, 50, 20, 40, 7.84399190252015679474948022699e-6 },
    };

    [Theory]
    [MemberData(nameof(References))]
    public void ExactSumReproducesTheReference(string id, int a, int b, int c, int d, double expected) =>
        NumericAssert.Absolute(expected, BetaInequality.ProbabilityGreater(a, b, c, d), 1e-11, id);

    [Theory]
    [MemberData(nameof(References))]
    public void QuadratureMatchesTheReference(string id, int a, int b, int c, int d, double expected)
    {
        var result = ProbabilityOfBest.Compute([new BetaMarginal(a, b), new BetaMarginal(c, d)]);
        NumericAssert.Absolute(expected, result.Probabilities[0], 1e-12, id);
        NumericAssert.Absolute(1 - expected, result.Probabilities[1], 1e-12, id);
    }

    [Fact]
    public void NonIntegerParametersMatchTheReference()
    {
        // PG09: Beta(0.5,0.5) against Beta(1.5,2.5), 0.5900632743487446857278929 by 30-digit quadrature
        // (REFERENCES.md §2; three routes agree to 1e-41).
        var result = ProbabilityOfBest.Compute([new BetaMarginal(0.5, 0.5), new BetaMarginal(1.5, 2.5)]);
        NumericAssert.Absolute(0.5900632743487446857278929, result.Probabilities[0], 1e-12, "PG09");
    }

    // More integer cases, from a handful of plots to ten thousand per arm, against the exact sum.
    [Theory]
    [InlineData(1, 1, 3, 1)]
    [InlineData(3, 9, 2, 2)]
    [InlineData(7, 1, 1, 7)]
    [InlineData(40, 60, 45, 55)]
    [InlineData(1, 200, 2, 300)]
    [InlineData(301, 701, 280, 720)]
    [InlineData(5001, 4999, 4950, 5050)]
    [InlineData(3001, 7001, 2999, 7003)]
    [InlineData(121, 881, 1101, 8901)]
    public void QuadratureMatchesTheExactSum(int a, int b, int c, int d)
    {
        double exact = BetaInequality.ProbabilityGreater(a, b, c, d);
        var result = ProbabilityOfBest.Compute([new BetaMarginal(a, b), new BetaMarginal(c, d)]);
        NumericAssert.Absolute(exact, result.Probabilities[0], 1e-11, "P(X > Y)");
        NumericAssert.Absolute(1 - exact, result.Probabilities[1], 1e-11, "P(Y > X)");
    }

    [Fact]
    public void UniformAgainstAnythingIsOneMinusItsMean()
    {
        // P(U > X) = E[1 − X] for U uniform, so a Beta(1,1) arm beats Beta(a,b) with probability b/(a+b),
        // however peaked Beta(a,b) is: here 5000 successes in 9998 plots next to an untried arm.
        var result = ProbabilityOfBest.Compute([new BetaMarginal(5000, 5000), new BetaMarginal(1, 1)]);
        NumericAssert.Absolute(0.5, result.Probabilities[1], 1e-12, "uniform vs Beta(5000,5000)");
        var skewed = ProbabilityOfBest.Compute([new BetaMarginal(1, 1), new BetaMarginal(30, 9970)]);
        NumericAssert.Absolute(9970.0 / 10000.0, skewed.Probabilities[0], 1e-12, "uniform vs Beta(30,9970)");
    }
}
