namespace DesignCompiler.Planning.Policies;

/// <summary>
/// Batched Thompson sampling by probability matching: each arm's share of the round is its
/// posterior probability of being the best arm, computed exactly rather than sampled, so the
/// numbers on the sheet are the numbers that set the allocation.
/// </summary>
public sealed class ThompsonPolicy : IAllocationPolicy
{
    public void TargetShares(PolicyContext context, Span<double> shares)
    {
        for (var i = 0; i < shares.Length; i++)
            shares[i] = context.Available[i] ? context.ProbabilityBest[i] : 0;
    }
}
