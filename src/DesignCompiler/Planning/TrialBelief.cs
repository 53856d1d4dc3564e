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
    private TrialBelief(IMarginal[] posteriors, IMarginal[] values, Joint? joint)
    {
        Posteriors = posteriors;
        Values = values;
        JointValues = joint;
    }

    /// <summary>Posterior of θ per arm, design order.</summary>
    public IMarginal[] Posteriors { get; }

    /// <summary>Posterior of the value per arm, design order.</summary>
    public IMarginal[] Values { get; }

    /// <summary>With an adjusted model, the arms' values jointly (they are correlated through the shared effects); else null.</summary>
    public Joint? JointValues { get; }

    public static TrialBelief For(CheckedDesign design, IOutcomeModel model, TrialState state)
    {
        var arms = design.Arms.Count;
        IMarginal[] posteriors;
        Joint? joint = null;
        if (design.Model.IsAdjusted) (posteriors, joint) = AdjustedBelief.Fit(design, state);
        else
        {
            posteriors = new IMarginal[arms];
            for (var i = 0; i < arms; i++) posteriors[i] = model.Posterior(design.Arms[i].Prior, state.Statistics[i]);
        }
        var values = new IMarginal[arms];
        for (var i = 0; i < arms; i++) values[i] = new AffineMarginal(posteriors[i], design.Valuation.Scale, -design.Arms[i].Cost);
        return new TrialBelief(posteriors, values, joint);
    }

    private int[]? _lastSubset;
    private BestArmSummary? _lastSummary;

    /// <summary>
    /// Probability of being best and expected loss among <paramref name="subset"/>. The planner asks
    /// for the same subset more than once in a round (before and after drop rules, for the arms that
    /// can be sown); the last answer is kept, since the correlated case integrates numerically.
    /// </summary>
    public BestArmSummary Summarize(IReadOnlyList<int> subset)
    {
        if (_lastSummary is not null && _lastSubset!.AsSpan().SequenceEqual(subset.ToArray())) return _lastSummary;
        var summary = JointValues is { } joint ? BestArmSummary.OfJoint(joint, Values, subset) : BestArmSummary.Of(Values, subset);
        (_lastSubset, _lastSummary) = (subset.ToArray(), summary);
        return summary;
    }
}
