using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

public class IncompleteBetaTests
{
    // BI01–BI14: /work/shared/REFERENCES.md §1 and refvalues.json (`value_at_double_input`, the exact I_x(a,b) at
    // the double x), computed there with mpmath.betainc at 50 digits and checked by exact binomial sums,
    // the arcsine law and closed forms. Definition: NIST DLMF §8.17 (eq. 8.17.2).
    [Theory]
    [InlineData("BI01", 0.5, 0.5, 0.5, 0.5, 1e-15)]
    [InlineData("BI02", 0.001, 0.5, 0.5, 0.020135041633377491181986679602, 1e-14)]
    [InlineData("BI03", 0.999, 0.5, 0.5, 0.97986495836662250008291810385, 1e-14)]
    [InlineData("BI04", 0.25, 500, 1500, 0.503433818406819141985503343366, 1e-12)]
    [InlineData("BI05", 0.23, 500, 1500, 0.0180511623161906103678652495339, 1e-12)]
    [InlineData("BI06", 0.2, 500, 1500, 0.0000000290443440527781576729950255886, 1e-12)]
    [InlineData("BI07", 0.3, 500, 1500, 0.999999671188155808761892458383, 1e-12)]
    [InlineData("BI08", 1e-10, 2, 3, 5.99999999920000043721636769854e-20, 1e-14)]
    [InlineData("BI09", 0.01, 1, 100, 0.633967658726770502765928159772, 1e-14)]
    [InlineData("BI10", 0.05, 0.1, 10, 0.940216735579085784168285642636, 1e-14)]
    [InlineData("BI11", 0.999999999, 5, 0.5, 0.999922178324411029693603610195, 1e-14)]
    [InlineData("BI12", 0.12, 1201, 8801, 0.49378057056486173771426793638, 1e-12)]
    [InlineData("BI13", 0.5, 30.5, 20.5, 0.0783076301115801097505635273989, 1e-14)]
    [InlineData("BI14", 0.9, 10, 2, 0.697356880200000094627092361854, 1e-14)]
    public void RegularizedMatchesReference(string id, double x, double a, double b, double expected, double tolerance) =>
        NumericAssert.Relative(expected, IncompleteBeta.Regularized(a, b, x), tolerance, id);

    // Complements of the same records (`complement_at_double_input` in refvalues.json): the small tails must
    // come out with full relative accuracy, which 1 − I could not give.
    [Theory]
    [InlineData("BI03", 0.999, 0.5, 0.5, 0.0201350416333774999170818961505, 1e-14)]
    [InlineData("BI06", 0.2, 500, 1500, 0.999999970955655947221842327005, 1e-14)]
    [InlineData("BI07", 0.3, 500, 1500, 0.000000328811844191238107541617380129, 1e-12)]
    [InlineData("BI10", 0.05, 0.1, 10, 0.0597832644209142158317143573637, 3e-14)] // a = 0.1: formed as 1 − 0.94
    [InlineData("BI11", 0.999999999, 5, 0.5, 0.0000778216755889703063963898053011, 1e-12)]
    [InlineData("BI12", 0.12, 1201, 8801, 0.50621942943513826228573206362, 1e-12)]
    public void ComplementMatchesReference(string id, double x, double a, double b, double expected, double tolerance) =>
        NumericAssert.Relative(expected, IncompleteBeta.Complement(a, b, x), tolerance, id);

    [Fact]
    public void ClosedFormsHold()
    {
        // I_x(1,b) = 1 − (1−x)^b and I_x(½,½) = (2/π) arcsin √x (REFERENCES.md §1, "closed forms").
        foreach (double x in new[] { 1e-12, 0.003, 0.3, 0.77, 0.999 })
        {
            NumericAssert.Relative(-SpecialFunctions.Expm1(7 * SpecialFunctions.Log1p(-x)), IncompleteBeta.Regularized(1, 7, x), 1e-14, "I(1,7)");
            NumericAssert.Relative(2 / Math.PI * Math.Asin(Math.Sqrt(x)), IncompleteBeta.Regularized(0.5, 0.5, x), 1e-14, "arcsine");
        }
    }

    [Fact]
    public void SymmetryHolds()
    {
        // I_x(a,b) = 1 − I_{1−x}(b,a) (DLMF 8.17.4): the complement of one is the other, to rounding.
        foreach (var (a, b, x) in new[] { (2.5, 7.0, 0.3), (300.0, 40.0, 0.875), (0.2, 0.9, 0.25), (5000.0, 5000.0, 0.5078125) })
        {
            NumericAssert.Relative(IncompleteBeta.Complement(a, b, x), IncompleteBeta.Regularized(b, a, 1 - x), 1e-13, "symmetry");
        }
    }

    [Fact]
    public void EndsAndInvalidInput()
    {
        Assert.Equal(0.0, IncompleteBeta.Regularized(2, 3, 0));
        Assert.Equal(1.0, IncompleteBeta.Regularized(2, 3, 1));
        Assert.Equal(0.0, IncompleteBeta.Complement(2, 3, 1));
        Assert.True(double.IsNaN(IncompleteBeta.Regularized(-1, 3, 0.5)));
    }

    [Fact]
    public void ExtremeParametersStayInRange()
    {
        // Parameters from 0.01 to 1e7, beyond any posterior a season's plots give: values are probabilities
        // and the two tails add up.
        foreach (double a in new[] { 0.01, 1.0, 1e3, 1e7 })
        {
            foreach (double b in new[] { 0.01, 1.0, 1e3, 1e7 })
            {
                double mean = a / (a + b);
                foreach (double x in new[] { 0.5 * mean, mean, 0.5 + 0.5 * mean })
                {
                    double lower = IncompleteBeta.Regularized(a, b, x), upper = IncompleteBeta.Complement(a, b, x);
                    Assert.InRange(lower, 0.0, 1.0);
                    Assert.InRange(upper, 0.0, 1.0);
                    NumericAssert.Absolute(1.0, lower + upper, 1e-14, $"I+C at a={a}, b={b}, x={x}");
                }
            }
        }
    }
}
