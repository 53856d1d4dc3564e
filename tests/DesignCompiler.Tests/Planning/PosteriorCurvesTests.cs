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
        // Beta(1, 1) is uniform: its 0.05 % and 99.95 % quantiles are 0.0005 and 0.9995 (closed form), wider than Beta(2, 2)'s.
        Assert.Equal(0.0005, curves.Grid[0], 12);
        Assert.Equal(0.9995, curves.Grid[^1], 12);

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
        var curves = PosteriorCurves.Of(design, OutcomeModels.For(design.Outcome), new TrialState(design.Arms.Count));
        var step = curves.Grid[1] - curves.Grid[0];
        foreach (var arm in curves.Arms)
        {
            // A density integrates to 1 (definition); the grid spans at least each arm's central 99.9 %, and the
            // trapezoid rule on 161 points is close for these smooth curves.
            var mass = step * (arm.Density.Sum() - (arm.Density[0] + arm.Density[^1]) / 2);
            Assert.InRange(mass, 0.995, 1.001);
            Assert.True(arm.Lower < arm.Mean && arm.Mean < arm.Upper);
        }
    }
}
