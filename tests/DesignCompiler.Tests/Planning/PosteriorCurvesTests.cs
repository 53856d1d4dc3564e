using DesignCompiler.Planning;
using DesignCompiler.Planning.Families;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Planning;

/// <summary>The densities a round report draws, against closed forms and the definition of a density.</summary>
public sealed class PosteriorCurvesTests
{
    [Fact]
    public void Cover_crop_priors_give_the_beta_densities_on_a_grid_from_the_smallest_to_the_largest_tail_quantile()
    {
        var design = TestDesigns.Example("cover-crops.trial");
        var curves = PosteriorCurves.Of(design, OutcomeModels.For(design.Outcome), new TrialState(design.Arms.Count));
        Assert.Equal(PosteriorCurves.Points, curves.Grid.Count);
        // Beta(1, 1) is uniform: its 0.5 % and 99.5 % quantiles are 0.005 and 0.995 (closed form), wider than Beta(2, 2)'s.
        Assert.Equal(0.005, curves.Grid[0], 12);
        Assert.Equal(0.995, curves.Grid[^1], 12);

        var ov = curves.Arms[design.FindArm("OV")!.Index];
        var rc = curves.Arms[design.FindArm("RC")!.Index];
        for (var k = 0; k < curves.Grid.Count; k++)
        {
            var x = curves.Grid[k];
            // Beta(2, 2) has density x(1 − x)/B(2, 2) = 6x(1 − x); Beta(1, 1) has density 1 (closed forms, B(a, b) = Γ(a)Γ(b)/Γ(a + b)).
            Assert.Equal(6 * x * (1 - x), ov.Density[k], 1e-12);
            Assert.Equal(1.0, rc.Density[k], 1e-12);
        }
        Assert.Equal(0.5, ov.Mean, 14);
        // Beta(2, 2)'s 2.5 % quantile solves 3x² − 2x³ = 0.025: 0.0942993240502461 (mpmath findroot, 30 digits).
        Assert.Equal(0.0942993240502461, ov.Lower, 10);
        Assert.Equal(1 - 0.0942993240502461, ov.Upper, 10);
    }

    [Theory]
    [InlineData("nitrogen-rates.trial")]
    [InlineData("aphid-margins.trial")]
    [InlineData("germination.trial")]
    [InlineData("bed-rotation.trial")]
    public void Every_curve_holds_nearly_all_of_its_probability_on_the_grid(string example)
    {
        var design = TestDesigns.Example(example);
        var model = OutcomeModels.For(design.Outcome);
        var state = new TrialState(design.Arms.Count);
        var curves = PosteriorCurves.Of(design, model, state);
        var step = curves.Grid[1] - curves.Grid[0];
        foreach (var arm in curves.Arms)
        {
            // The integral of a density over [a, b] is F(b) − F(a) (fundamental theorem of calculus): the trapezoid rule on
            // the 161 grid points must agree with the posterior's CDF, a separate computation (incomplete beta or gamma, Student t).
            var marginal = model.Posterior(design.Arms[arm.Arm].Prior, state.Statistics[arm.Arm]);
            var expected = marginal.Cdf(curves.Grid[^1]) - marginal.Cdf(curves.Grid[0]);
            var mass = step * (arm.Density.Sum() - (arm.Density[0] + arm.Density[^1]) / 2);
            Assert.Equal(expected, mass, 2e-3);
            // The grid runs from the smallest 0.5 % quantile to the largest 99.5 % one, so it holds at least each arm's central 99 %.
            Assert.True(expected >= 0.99 - 1e-9, $"{expected}");
            Assert.True(arm.Lower < arm.Mean && arm.Mean < arm.Upper);
        }
    }
}
