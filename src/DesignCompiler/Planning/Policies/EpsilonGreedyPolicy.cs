namespace DesignCompiler.Planning.Policies;

/// <summary>
/// Epsilon-greedy, batched: a share ε of the round is spread equally over the arms that may be
/// sown, the rest goes to the arm whose posterior mean value is highest (shared equally among
/// exact ties). With <c>decreasing</c> the exploration share in round r is ε/r, a common schedule
/// that lets exploration fade as evidence accumulates.
/// </summary>
public sealed class EpsilonGreedyPolicy(double epsilon, bool decreasing) : IAllocationPolicy
{
    public void TargetShares(PolicyContext context, Span<double> shares)
    {
        var epsilonNow = decreasing ? epsilon / context.Round : epsilon;
        var leaders = PolicyMath.HighestMeanValue(context);
        var available = PolicyMath.CountAvailable(context);
        for (var i = 0; i < shares.Length; i++)
        {
            if (!context.Available[i]) { shares[i] = 0; continue; }
            shares[i] = epsilonNow / available + (leaders.Contains(i) ? (1 - epsilonNow) / leaders.Count : 0);
        }
    }
}
