using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

/// <summary>
/// Posteriors narrower than the spacing of doubles at their mean (sd 1e-9 at 1e9, where doubles are
/// 1.2e-7 apart) are points to double precision. The quadrature found no arm ending above where the
/// highest began and indexed an empty list; a compile after recording such yields crashed. Now the
/// arms ending highest are tied for best and share it.
/// </summary>
public sealed class CollapsedSupportTests
{
    [Fact]
    public void Two_identical_points_share_being_best_equally()
    {
        var result = ProbabilityOfBest.Compute([new NormalMarginal(1e9, 1e-9), new NormalMarginal(1e9, 1e-9)]);
        // Identical arms: equal probabilities by symmetry (common practice), 1/2 each.
        Assert.Equal(0.5, result.Probabilities[0], 15);
        Assert.Equal(0.5, result.Probabilities[1], 15);
        Assert.Equal(1e9, result.ExpectedMaximum, 0);
    }

    [Fact]
    public void A_point_a_billion_sds_above_another_is_best_with_certainty()
    {
        var result = ProbabilityOfBest.Compute([new NormalMarginal(1e9, 1e-9), new NormalMarginal(1e9 + 1000, 1e-9), new NormalMarginal(1e9 - 1000, 1e-9)]);
        // Separated by 1e12 sds: P(best) is 1 to every digit a double has (the normal tail beyond 1e12 sds is below 1e-300).
        Assert.Equal([0.0, 1.0, 0.0], result.Probabilities.ToArray());
        Assert.Equal(0, result.ExpectedLoss[1]);
        Assert.Equal(1000, result.ExpectedLoss[0], 3);
    }

    [Fact]
    public void Points_tied_at_the_top_share_it_and_a_lower_point_gets_nothing()
    {
        var result = ProbabilityOfBest.Compute([new NormalMarginal(5e8, 1e-9), new NormalMarginal(1e9, 1e-9), new NormalMarginal(1e9, 1e-9)]);
        Assert.Equal(0, result.Probabilities[0]);
        Assert.Equal(0.5, result.Probabilities[1], 15);
        Assert.Equal(0.5, result.Probabilities[2], 15);
        Assert.Equal(1, result.Probabilities.Sum(), 15);
    }
}
