using DesignCompiler.Binding;
using DesignCompiler.Syntax;

namespace DesignCompiler.Planning.Policies;

/// <summary>The policy object for each policy of the language; one place to add a policy.</summary>
public static class AllocationPolicies
{
    public static IAllocationPolicy For(PolicySpec policy) => policy.Kind switch
    {
        PolicyKind.Thompson => new ThompsonPolicy(),
        PolicyKind.TopTwoThompson => new TopTwoThompsonPolicy(policy.Parameter),
        PolicyKind.Ucb1 => new Ucb1Policy(),
        PolicyKind.KlUcb => new KlUcbPolicy(policy.Parameter),
        PolicyKind.EpsilonGreedy => new EpsilonGreedyPolicy(policy.Parameter, policy.Decreasing),
        PolicyKind.ExploreThenCommit => new ExploreThenCommitPolicy((int)policy.Parameter),
        _ => new EqualPolicy(),
    };
}
