using DesignCompiler.Numerics;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DesignCompiler.Tests.Numerics;

public class BetaQuantileTests
{
    // BQ01–BQ12: /work/shared/REFERENCES.md §1 "Beta quantiles" and refvalues.json (`value_at_double_input`):
    // bisection on mpmath.betainc at 50 digits with Newton polishing, residual below 1.2e-50.
    [Theory]
    [InlineData("BQ01", 0.025, 0.5, 0.5, 0.0015413331334360120721476758611, 1e-14)]
    [InlineData("BQ02", 0.975, 0.5, 0.5, 0.998458666866563985362336620657, 1e-14)]
    [InlineData("BQ03", 0.025, 500, 1500, 0.231267362993033906192231770726, 1e-12)]
    [InlineData("BQ04", 0.5, 500, 1500, 0.249916653301248560532996436521, 1e-12)]
    [InlineData("BQ05", 0.975, 500, 1500, 0.269206204537100885212414951361, 1e-12)]
    [InlineData("BQ06", 0.025, 1201, 8801, 0.113778461729904072101811351097, 1e-12)]
    [InlineData("BQ07", 0.975, 1201, 8801, 0.126517412741076019043857585712, 1e-12)]
    [InlineData("BQ08", 0.5, 1, 100, 0.00690750456296409846678978311193, 1e-14)]
    [InlineData("BQ09", 0.1, 3, 1, 0.464158883361277897829672291625, 1e-14)]
    [InlineData("BQ10", 0.5, 2, 3, 0.385727568132389548275502751157, 1e-14)]
    [InlineData("BQ11", 0.5, 0.1, 10, 0.0000621052070309170473914294176929, 1e-13)]
    [InlineData("BQ12", 1e-6, 1201, 8801, 0.105177639467437939618118380641, 1e-12)]
    public void InverseMatchesReference(string id, double p, double a, double b, double expected, double tolerance) =>
        NumericAssert.Relative(expected, IncompleteBeta.Inverse(a, b, p), tolerance, id);

    [Fact]
    public void ClosedFormQuantiles()
    {
        // Beta(1,b): q = 1 − (1−p)^(1/b); Beta(a,1): q = p^(1/a) (REFERENCES.md §1, closed forms).
        foreach (double p in new[] { 1e-9, 0.01, 0.5, 0.9 })
        {
            NumericAssert.Relative(-SpecialFunctions.Expm1(SpecialFunctions.Log1p(-p) / 40), IncompleteBeta.Inverse(1, 40, p), 1e-13, "Beta(1,40)");
            NumericAssert.Relative(Math.Pow(p, 1.0 / 3), IncompleteBeta.Inverse(3, 1, p), 1e-14, "Beta(3,1)");
        }
    }

    // Round trip: the quantile's CDF gives back p (for the smaller tail, to its own relative precision).
    [Property(MaxTest = 200)]
    public Property QuantileInvertsTheCdf() => Prop.ForAll(
        Gen.Choose(0, 1_000_000).Three().Select(t => (
            A: Math.Pow(10, -1 + 6e-6 * t.Item1),
            B: Math.Pow(10, -1 + 6e-6 * t.Item2),
            P: Math.Pow(10, -12 + 1.2e-5 * t.Item3) * 0.5)).ToArbitrary(),
        c =>
        {
            double x = IncompleteBeta.Inverse(c.A, c.B, c.P);
            double back = IncompleteBeta.Regularized(c.A, c.B, x);
            // One ulp of x moves the CDF by density·ulp; allow a few of those on top of 1e-13.
            double density = new BetaMarginal(c.A, c.B).Density(x);
            double slack = 8 * density * Math.Max(x, 1e-300) * 1.2e-16 / c.P;
            return Math.Abs(back - c.P) / c.P <= 1e-13 + slack;
        });
}
