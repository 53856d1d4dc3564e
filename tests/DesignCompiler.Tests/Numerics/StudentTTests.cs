using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

public class StudentTTests
{
    // NIST/SEMATECH e-Handbook of Statistical Methods §1.3.6.7.2, table of t critical values (upper 0.025),
    // quoted to the table's three decimals in REFERENCES.md §3.
    [Theory]
    [InlineData(1, 12.706)]
    [InlineData(2, 4.303)]
    [InlineData(5, 2.571)]
    [InlineData(10, 2.228)]
    [InlineData(30, 2.042)]
    public void QuantileAgreesWithHandbookTable(double df, double table) =>
        NumericAssert.Absolute(table, StudentT.Quantile(df, 0.975), 0.0005, $"t(0.975; {df})");

    // TQ01–TQ30: REFERENCES.md §3 / refvalues.json `value_at_double_input` (mpmath at 50 digits; df = 1, 2 in
    // closed form tan(0.475π) and (2p−1)/√(2p(1−p))).
    [Theory]
    [InlineData("TQ01", 1, 12.706204736174693314101641219)]
    [InlineData("TQ02", 2, 4.30265272974946178942037599664)]
    [InlineData("TQ05", 5, 2.57058183563631478278854621083)]
    [InlineData("TQ09", 9, 2.26215716279820499920285271725)]
    [InlineData("TQ10", 10, 2.22813885198627422451986193107)]
    [InlineData("TQ30", 30, 2.04227245630123788783499873215)]
    public void QuantileMatchesReference(string id, double df, double expected) =>
        NumericAssert.Relative(expected, StudentT.Quantile(df, 0.975), 1e-14, id);

    // Expected values: mpmath, via I_x(df/2, ½) at 40 digits (make_reference_values.py "t").
    [Theory]
    [InlineData(1, -1e10, 3.183098861837906715367065e-11, 0.9999999999681690113816209)]
    [InlineData(1, -3, 0.1024163823495667258245989, 0.8975836176504332741754011)]
    [InlineData(1, 0.5, 0.6475836176504332741754011, 0.3524163823495667258245989)]
    [InlineData(2, 3, 0.9522670168666454339702181, 0.0477329831333545660297819)]
    [InlineData(3, -5, 0.007696219036651150493312588, 0.9923037809633488495066874)]
    [InlineData(4.5, 1.2, 0.8552614725790177819489304, 0.1447385274209822180510696)]
    [InlineData(30, 2.5, 0.9909421754659666529491087, 0.009057824534033347050891319)]
    [InlineData(1e4, -4, 0.00003189933441156981552982235, 0.9999681006655884301844702)]
    [InlineData(1e6, 3, 0.9986500687292891014706496, 0.001349931270710898529350441)]
    public void CdfAndUpperTailMatchMpmath(double df, double t, double cdf, double upper)
    {
        NumericAssert.Relative(cdf, StudentT.Cdf(df, t), 1e-13, $"F({df},{t})");
        NumericAssert.Relative(upper, StudentT.UpperTail(df, t), 1e-13, $"Q({df},{t})");
    }

    // Expected values: mpmath findroot on the CDF above.
    [Theory]
    [InlineData(3, 1e-10, -2225.769284683093192723202)]
    [InlineData(3, 0.975, 3.182446305283708435883998)]
    [InlineData(4.5, 0.6, 0.2687518355421751396358842)]
    [InlineData(1e4, 0.975, 1.960201239890625877799337)]
    [InlineData(1e4, 1e-10, -6.36794135148280286784489)]
    public void QuantileMatchesMpmath(double df, double p, double expected) =>
        NumericAssert.Relative(expected, StudentT.Quantile(df, p), 1e-13, $"t({df},{p})");

    [Fact]
    public void CauchyIsClosedForm()
    {
        // df = 1 is the Cauchy distribution: F(t) = ½ + atan(t)/π, written for t < 0 as atan(1/|t|)/π so
        // that the reference itself does not cancel.
        foreach (double t in new[] { -1e6, -2.0, 0.1, 30.0 })
        {
            double expected = t < 0 ? Math.Atan(-1 / t) / Math.PI : 0.5 + Math.Atan(t) / Math.PI;
            NumericAssert.Relative(expected, StudentT.Cdf(1, t), 1e-14, "Cauchy");
        }
    }

    [Fact]
    public void LargeDfApproachesTheNormal()
    {
        // Far beyond the switch to the Cornish–Fisher expansion (A&S 26.7.5) the t is the normal.
        NumericAssert.Relative(StandardNormal.Quantile(0.975), StudentT.Quantile(1e15, 0.975), 1e-14, "df → ∞");
        NumericAssert.Relative(StandardNormal.UpperTail(3), StudentT.UpperTail(1e15, 3), 1e-13, "df → ∞");
    }

    [Fact]
    public void BothLargeDfMethodsAgreeAtTheSwitch()
    {
        // Just below and just above df = 1e5 the incomplete beta function and the expansion take over from
        // each other; the true change over this df interval is below 1e-15 relative.
        foreach (double p in new[] { 1e-12, 0.01, 0.3 })
        {
            NumericAssert.Relative(StudentT.Quantile(99999.9999, p), StudentT.Quantile(100000.0001, p), 2e-12, $"quantile at {p}");
        }
        foreach (double t in new[] { -7.0, -2.0, 0.5 })
        {
            NumericAssert.Relative(StudentT.Cdf(99999.9999, t), StudentT.Cdf(100000.0001, t), 2e-11, $"cdf at {t}");
        }
    }
}
