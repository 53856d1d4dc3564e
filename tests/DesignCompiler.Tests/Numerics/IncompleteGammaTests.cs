using System.Globalization;
using DesignCompiler.Numerics;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Numerics;

public class IncompleteGammaTests
{
    [Fact]
    public void BayesRulesPosteriorTail()
    {
        // GP05: Gamma(21, rate 6) posterior of the Bayes Rules! ch. 5 example (Johnson, Ott & Dogucu 2022),
        // P(λ > 4 | y) = Q(21, 24) = 0.242638687336755661266817083355 (REFERENCES.md §4, mpmath at 50 digits).
        NumericAssert.Relative(0.242638687336755661266817083355, IncompleteGamma.UpperRegularized(21, 24), 1e-14, "Q(21,24)");
    }

    // Expected values: series / continued fraction in mpmath arithmetic at 40 digits
    // (reference/mp_functions.py gamma_tails, run by make_reference_values.py "gamma").
    [Theory]
    [InlineData(21, 24, 0.7573613126632443387331829, 0.2426386873367556612668171)]
    [InlineData(0.5, 0.001, 0.03567059172967988541711087, 0.9643294082703201145828891)]
    [InlineData(0.01, 1, 0.9977837653767720096568733, 0.002216234623227990343126684)]
    [InlineData(3, 0.1, 0.0001546530702646716786190727, 0.9998453469297353283213809)]
    [InlineData(100, 80, 0.01710831303513311416587731, 0.9828916869648668858341227)]
    [InlineData(100, 130, 0.9972495916326934737230137, 0.002750408367306526276986251)]
    [InlineData(1e4, 1e4, 0.5013298083399552003827423, 0.4986701916600447996172577)]
    [InlineData(1e5, 102000, 0.9999999998349393864063717, 1.650606135936283396293342e-10)]
    [InlineData(2.5, 30, 0.999999999987845430222817, 1.215456977718303894834853e-11)]
    public void BothTailsMatchMpmath(double a, double x, double lower, double upper)
    {
        NumericAssert.Relative(lower, IncompleteGamma.LowerRegularized(a, x), 1e-13, $"P({a},{x})");
        NumericAssert.Relative(upper, IncompleteGamma.UpperRegularized(a, x), 1e-13, $"Q({a},{x})");
    }

    // Expected values: mpmath findroot on the 40-digit P(a,x) above.
    [Theory]
    [InlineData(21, 0.025, 12.99933098407618686116084)]
    [InlineData(21, 0.975, 30.88837790267459661082701)]
    [InlineData(0.5, 1e-10, 7.853981633974483668473349e-21)]
    [InlineData(1e4, 0.5, 9999.666668642047423736966)]
    [InlineData(0.1, 0.9, 0.2661545537388378558725947)]
    public void InverseMatchesMpmath(double a, double p, double expected) =>
        NumericAssert.Relative(expected, IncompleteGamma.Inverse(a, p), 1e-14, $"P⁻¹({a},{p})");

    [Fact]
    public void ExponentialCaseIsClosedForm()
    {
        // Shape 1 is the exponential distribution: P(1,x) = 1 − e^(−x), Q(1,x) = e^(−x).
        foreach (double x in new[] { 1e-9, 0.2, 3.0, 40.0, 700.0 })
        {
            NumericAssert.Relative(-SpecialFunctions.Expm1(-x), IncompleteGamma.LowerRegularized(1, x), 1e-15, "P(1,x)");
            NumericAssert.Relative(Math.Exp(-x), IncompleteGamma.UpperRegularized(1, x), 1e-13, "Q(1,x)");
        }
    }

    // Shapes from 50 on take Temme's uniform expansion for |eta| <= 0.8 (GammaKernel.Uniform.cs) and the series or
    // the continued fraction beyond; eta = +-0.81 checks the other side of that edge. Expected values
    // (reference/temme_cases.csv, written by reference/temme_coefficients.py cases): mpmath at 40 digits at the
    // double x given, the 1F1 series for P below the mean and gammainc for Q above. The smaller tail is held to
    // 4e-15 + 8u|x - a| relative, u = 1.1e-16: far out, the tail's elasticity in x, x f(x) / Q(x), approaches
    // |x - a|, so a few roundings of quantities of the size of x (x - a, ln(x/a), eta) become errors of that size
    // whatever the method; the normal tail inside the expansion is good to about 1e-15.
    public static TheoryData<double, double, double, double> UniformCases()
    {
        var cases = new TheoryData<double, double, double, double>();
        var path = Path.Combine(RepoPaths.Root, "tests", "DesignCompiler.Tests", "Numerics", "reference", "temme_cases.csv");
        foreach (var line in File.ReadLines(path).Skip(1))
        {
            var v = line.Split(',').Take(4).Select(s => double.Parse(s, NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray();
            cases.Add(v[0], v[1], v[2], v[3]);
        }
        return cases;
    }

    [Theory]
    [MemberData(nameof(UniformCases))]
    public void UniformExpansionMatchesMpmath(double a, double x, double lower, double upper)
    {
        double tolerance = 4e-15 + 8 * 1.1e-16 * Math.Abs(x - a);
        if (lower < upper) NumericAssert.Relative(lower, IncompleteGamma.LowerRegularized(a, x), tolerance, $"P({a},{x})");
        else NumericAssert.Relative(upper, IncompleteGamma.UpperRegularized(a, x), tolerance, $"Q({a},{x})");
        // The larger tail is 1 minus the smaller one.
        NumericAssert.Relative(Math.Max(lower, upper), Math.Max(IncompleteGamma.LowerRegularized(a, x), IncompleteGamma.UpperRegularized(a, x)), 1e-15, "larger tail");
    }
}
