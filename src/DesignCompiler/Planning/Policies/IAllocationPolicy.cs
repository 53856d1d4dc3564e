namespace DesignCompiler.Planning.Policies;

/// <summary>
/// A rule that turns what is known before a round into target shares of the round's plots.
/// Shares are fractions over the available arms (unavailable arms get 0); the constrained
/// apportionment that follows makes every limit hold whatever the policy says, so a policy
/// never deals with limits. The simulator and the compiler call the same instances.
/// </summary>
public interface IAllocationPolicy
{
    void TargetShares(PolicyContext context, Span<double> shares);
}
