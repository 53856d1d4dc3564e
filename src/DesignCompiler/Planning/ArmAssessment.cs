using DesignCompiler.Binding;
using DesignCompiler.Numerics;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Planning;

/// <summary>
/// Every arm's posterior for its mean outcome, and P(best) and expected loss on value (net of
/// cost when the design has a price) among the arms not dropped, for one trial state. The pieces
/// the planner uses (<see cref="TrialBelief"/>), for status and the round report.
/// </summary>
public static class ArmAssessment
{
    public static (IMarginal[] Posteriors, BestArmSummary Summary) Of(CheckedDesign design, IOutcomeModel model, TrialState state)
    {
        var belief = TrialBelief.For(design, model, state);
        var inTrial = Enumerable.Range(0, design.Arms.Count).Where(i => !state.Dropped[i]).ToList();
        return (belief.Posteriors, belief.Summarize(inTrial));
    }
}
