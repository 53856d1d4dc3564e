using DesignCompiler.Binding;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Language;

/// <summary>The <c>rounding</c> and <c>model</c> statements and a scenario's field effects reach the checked design as written.</summary>
public sealed class ModelAndEffectsBindingTests
{
    private const string Head = """
        trial "Field pea sowing rates" {
          seed 8
          rounds 3
          outcome yield "t/ha": normal noise unknown
          default prior normal(mean 3.5, sd 1, noise 0.5)
          arm R60 "60 seeds per m2"
          arm R90 "90 seeds per m2"
          block north plots 4
          block south plots 4
        """;

    [Fact]
    public void Defaults_are_largest_remainder_and_independent_arms()
    {
        var design = TestDesigns.FromText(Head + "\n}\n");
        Assert.Equal(RoundingRule.LargestRemainder, design.Rounding);
        Assert.False(design.Model.IsAdjusted);
    }

    [Fact]
    public void Rounding_and_model_statements_are_bound()
    {
        var design = TestDesigns.FromText(Head + "\n  rounding randomized\n  model adjusts for block and round\n}\n");
        Assert.Equal(RoundingRule.Randomized, design.Rounding);
        Assert.True(design.Model.AdjustsForBlock);
        Assert.True(design.Model.AdjustsForRound);
        Assert.Equal("adjusts for block and round", design.Model.Describe());

        var roundOnly = TestDesigns.FromText(Head + "\n  model adjusts for round\n}\n");
        Assert.False(roundOnly.Model.AdjustsForBlock);
        Assert.True(roundOnly.Model.AdjustsForRound);
    }

    [Fact]
    public void Field_effects_are_bound_with_per_arm_missing_shares()
    {
        var design = TestDesigns.FromText(Head + "\n" + """
              scenario "wet seasons" { R60 3.4 R90 3.8 season sd 0.4 interaction sd 0.1 block sd 0.2 missing 5% missing R90 20% }
              scenario "drawn" { from prior season sd 0.3 }
              scenario "plain" { every arm 3.5 }
            }

            """);
        var wet = design.Scenarios[0].Effects;
        Assert.Equal(0.4, wet.SeasonSd);
        Assert.Equal(0.1, wet.InteractionSd);
        Assert.Equal(0.2, wet.BlockSd);
        Assert.Equal(0.05, wet.MissingFor(0), 12);
        Assert.Equal(0.20, wet.MissingFor(1), 12);
        Assert.True(wet.Any);
        Assert.Equal(0.3, design.Scenarios[1].Effects.SeasonSd);
        Assert.True(design.Scenarios[1].FromPrior);
        Assert.False(design.Scenarios[2].Effects.Any);
    }
}
