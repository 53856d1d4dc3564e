namespace DesignCompiler.Planning.Policies;

/// <summary>
/// Top-two Thompson sampling for finding the best arm (D. Russo, "Simple Bayesian algorithms
/// for best arm identification", 2016). The sequential rule draws a leader I from the posterior;
/// with probability β it plays I, otherwise it redraws until a different arm J leads and plays J.
/// Batched, the share of arm i is that rule's selection probability, computed exactly from the
/// probabilities of being best P:
///   share_i = β·P_i + (1 − β)·Σ_{j≠i} P_j·P_i / Σ_{k≠j} P_k,
/// where P_i / Σ_{k≠j} P_k is the chance that the redraw's leader is i given it is not j.
/// When every other arm has probability 0 the redraw is taken as uniform over the other arms.
/// </summary>
public sealed class TopTwoThompsonPolicy(double beta) : IAllocationPolicy
{
    public double Beta { get; } = beta;

    public void TargetShares(PolicyContext context, Span<double> shares)
    {
        var n = shares.Length;
        var p = new double[n];
        var available = 0;
        for (var i = 0; i < n; i++)
        {
            p[i] = context.Available[i] ? context.ProbabilityBest[i] : 0;
            if (context.Available[i]) available++;
        }
        if (available == 1)
        {
            for (var i = 0; i < n; i++) shares[i] = context.Available[i] ? 1 : 0;
            return;
        }

        var total = p.Sum();
        for (var i = 0; i < n; i++) shares[i] = Beta * p[i];
        for (var j = 0; j < n; j++)
        {
            if (!context.Available[j] || p[j] == 0) continue;
            var others = total - p[j];
            for (var i = 0; i < n; i++)
            {
                if (i == j || !context.Available[i]) continue;
                var challenger = others > 1e-300 ? p[i] / others : 1.0 / (available - 1);
                shares[i] += (1 - Beta) * p[j] * challenger;
            }
        }
    }
}
