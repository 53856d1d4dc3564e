using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

/// <summary>
/// The P(best) support of a log-concave beta comes from the density's tail bound f(x)/|ψ'(x)| instead of a
/// quantile search. The cut must hold no more than the tail mass asked (1e-16; 2 % over is the solver's
/// tolerance) and, the bound being loose by at most a factor 3 for shapes ≥ 1.5, no less than a quarter of it.
/// </summary>
public class BetaTailBoundTests
{
    // a, b, then the distances from 0 and from 1 at which each tail holds 1.02e-16 and 2.5e-17: bisection on
    // mpmath.betainc (regularized) at 40 digits.
    [Theory]
    [InlineData(30, 70, 0.046697442186736835, 0.3008915802895979, 0.044313514627370573, 0.29368747583244606)]
    [InlineData(2, 3, 4.1231056369509939e-9, 2.943384824321818e-6, 2.0412414550970929e-9, 1.8420165975768704e-6)]
    [InlineData(400, 700, 0.25154498787938587, 0.513463333099289, 0.249450899419133, 0.51092753911900931)]
    [InlineData(1.5, 40, 6.5575104552463229e-13, 0.38133176423392284, 2.568219956157882e-13, 0.36806600171884539)]
    [InlineData(5000, 20, 0.98389974148903834, 0.0002811694898067204, 0.98354226952415465, 0.00026081774804363999)]
    [InlineData(2, 10000, 1.4282142835785498e-12, 0.99595356977786251, 7.0707143016525105e-13, 0.99581015279873388)]
    [InlineData(11, 12, 0.01044079933879722, 0.015429459700712499, 0.0091772364835920801, 0.01370499424693474)]
    [InlineData(3, 3, 2.1687052368919091e-6, 2.1687052368919091e-6, 1.3572097293067029e-6, 1.3572097293067029e-6)]
    public void The_cut_holds_between_a_quarter_of_the_mass_and_the_mass(
        double a, double b, double innerLower, double innerUpper, double outerLower, double outerUpper)
    {
        IQuadratureProfile beta = new BetaMarginal(a, b);
        beta.Support(1e-16, out double lo, out double hi, out double above, out double below);
        Assert.InRange(above, outerLower, innerLower);
        Assert.InRange(below, outerUpper, innerUpper);
        Assert.Equal(above, lo);
        Assert.Equal(1.0 - below, hi);
    }

    [Theory]
    [InlineData(2.0, 5.0)]
    [InlineData(1e6, 3e6)]
    [InlineData(1e12, 1e12)]
    [InlineData(1.5, 1e9)]
    public void The_distances_are_positive_and_the_support_is_ordered(double a, double b)
    {
        IQuadratureProfile beta = new BetaMarginal(a, b);
        beta.Support(1e-16, out double lo, out double hi, out double above, out double below);
        Assert.True(above > 0 && below > 0, $"distances {above}, {below}");
        Assert.True(lo < hi, $"[{lo}, {hi}]");
        // Within the closed-form sub-Gaussian bounds the screen relies on.
        Assert.True(beta.WideSupport(1e-16, out double wideLo, out double wideHi));
        Assert.InRange(lo, wideLo, wideHi);
        Assert.InRange(hi, wideLo, wideHi);
    }
}
