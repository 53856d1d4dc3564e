using DesignCompiler.Binding;
using DesignCompiler.Numerics;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Planning;

/// <summary>
/// What is believed about every arm once the recorded plots are in: the posterior of each arm's
/// mean outcome θ, and of its value (scale·θ − cost, the units arms are ranked in). The planner,
/// the simulator's final selection and <c>status</c> all take it from <see cref="For"/>, so the
/// three can never disagree about which arm leads.
/// </summary>
public sealed class TrialBelief
{
    private TrialBelief(IMarginal[] posteriors, IMarginal[] values)
    {
        Posteriors = posteriors;
        Values = values;
    }

    /// <summary>Posterior of θ per arm, design order.</summary>
    public IMarginal[] Posteriors { get; }

    /// <summary>Posterior of the value per arm, design order.</summary>
    public IMarginal[] Values { get; }

    public static TrialBelief For(CheckedDesign design, IOutcomeModel model, TrialState state)
    {
        var arms = design.Arms.Count;
        var posteriors = new IMarginal[arms];
        var values = new IMarginal[arms];
        for (var i = 0; i < arms; i++)
        {
            posteriors[i] = model.Posterior(design.Arms[i].Prior, state.Statistics[i]);
            values[i] = new AffineMarginal(posteriors[i], design.Valuation.Scale, -design.Arms[i].Cost);
        }
        return new TrialBelief(posteriors, values);
    }

    /// <summary>Probability of being best and expected loss among <paramref name="subset"/>.</summary>
    public BestArmSummary Summarize(IReadOnlyList<int> subset) => BestArmSummary.Of(Values, subset);
}
