using DesignCompiler.Binding;
using DesignCompiler.Numerics;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Planning;

/// <summary>
/// Every arm's posterior for its mean outcome, and P(best) and expected loss on value (net of
/// cost when the design has a price) among the arms not dropped, for one trial state. The pieces
/// the planner uses, put together once for status and the round report.
/// </summary>
public static class ArmAssessment
{
    public static (IMarginal[] Posteriors, BestArmSummary Summary) Of(CheckedDesign design, IOutcomeModel model, TrialState state)
    {
        var posteriors = new IMarginal[design.Arms.Count];
        var values = new IMarginal[design.Arms.Count];
        for (var i = 0; i < design.Arms.Count; i++)
        {
            posteriors[i] = model.Posterior(design.Arms[i].Prior, state.Statistics[i]);
            values[i] = new AffineMarginal(posteriors[i], design.Valuation.Scale, -design.Arms[i].Cost);
        }
        var inTrial = Enumerable.Range(0, design.Arms.Count).Where(i => !state.Dropped[i]).ToList();
        return (posteriors, BestArmSummary.Of(values, inTrial));
    }
}
