namespace DesignCompiler.Planning.Policies;

/// <summary>
/// Explore-then-commit: equal allocation for the first k rounds, then every plot the limits
/// allow on the arm whose posterior mean value is highest (the limits' minimums still give the
/// other arms their plots; exact ties share the commitment).
/// </summary>
public sealed class ExploreThenCommitPolicy(int exploreRounds) : IAllocationPolicy
{
    private readonly EqualPolicy _explore = new();

    public void TargetShares(PolicyContext context, Span<double> shares)
    {
        if (context.Round <= exploreRounds)
        {
            _explore.TargetShares(context, shares);
            return;
        }
        var leaders = PolicyMath.HighestMeanValue(context);
        for (var i = 0; i < shares.Length; i++) shares[i] = leaders.Contains(i) ? 1.0 / leaders.Count : 0;
    }
}
