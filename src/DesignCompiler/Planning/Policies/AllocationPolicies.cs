using DesignCompiler.Binding;
using DesignCompiler.Syntax;

namespace DesignCompiler.Planning.Policies;

/// <summary>The policy object for each policy of the language; one place to add a policy.</summary>
public static class AllocationPolicies
{
    /// <summary>The policy, or null when the planner does not support it yet.</summary>
    public static IAllocationPolicy? For(PolicySpec policy) => policy.Kind switch
    {
        PolicyKind.Thompson => new ThompsonPolicy(),
        PolicyKind.Equal => new EqualPolicy(),
        _ => null,
    };
}
