using DesignCompiler.Binding;

namespace DesignCompiler.Planning.Policies;

/// <summary>
/// Index policies (UCB1, KL-UCB) batched: the round's plots are filled one at a time, each to
/// the arm with the highest index, counting the plots already given this round as pending —
/// their count grows, their mean does not change, since nothing is harvested until the round
/// ends. Indices are on the ranking scale: with a price or a minimising goal, the bound on θ that
/// is optimistic for the value (upper when value grows with θ, lower otherwise) is transformed
/// to value = scale·θ − cost. An arm that must be played first (no data, or the rule's forced
/// plays) is filled before any index is compared, fewest plays first.
/// </summary>
public abstract class IndexPolicy : IAllocationPolicy
{
    public void TargetShares(PolicyContext context, Span<double> shares)
    {
        var design = context.Design;
        var n = shares.Length;
        var perPlot = ObservationsPerPlot(design.Outcome);
        var pending = new int[n];
        double totalData = 0;
        for (var i = 0; i < n; i++) totalData += context.Statistics[i].Count * perPlot;
        var upper = design.Valuation.Scale > 0;

        for (var plot = 0; plot < context.PlotsThisRound; plot++)
        {
            var total = totalData + plot * perPlot;
            var chosen = -1;
            var chosenForced = false;
            var chosenKey = double.NegativeInfinity;
            for (var i = 0; i < n; i++)
            {
                if (!context.Available[i]) continue;
                var stats = context.Statistics[i];
                var count = (stats.Count + pending[i]) * perPlot;
                var forced = MustPlay(design, stats, count, total);
                // Forced arms go first, fewest plays first; the others by their value index.
                var key = forced ? -count : design.Valuation.Scale * Bound(design, stats, count, Math.Max(total, 1), upper) - design.Arms[i].Cost;
                if (chosen < 0 || (forced && !chosenForced) || (forced == chosenForced && key > chosenKey))
                {
                    chosen = i;
                    chosenForced = forced;
                    chosenKey = key;
                }
            }
            if (chosen < 0) break;
            pending[chosen]++;
        }

        for (var i = 0; i < n; i++) shares[i] = context.PlotsThisRound == 0 ? 0 : (double)pending[i] / context.PlotsThisRound;
    }

    /// <summary>Bernoulli trials per plot: N for a binomial outcome (each seed is a trial), else 1.</summary>
    protected static double ObservationsPerPlot(OutcomeSpec outcome) => outcome.Family == OutcomeFamily.Binomial ? outcome.Trials : 1;

    /// <summary>The mean per observation: the success rate per trial for a binomial outcome.</summary>
    protected static double MeanPerObservation(OutcomeSpec outcome, ArmStatistics stats) =>
        stats.Count == 0 ? 0 : stats.Sum / (stats.Count * ObservationsPerPlot(outcome));

    /// <summary>True when the rule plays this arm before comparing indices.</summary>
    protected virtual bool MustPlay(CheckedDesign design, ArmStatistics stats, double count, double total) => stats.Count == 0;

    /// <summary>The confidence bound on θ, upper or lower, with <paramref name="count"/> observations of the arm out of <paramref name="total"/>.</summary>
    protected abstract double Bound(CheckedDesign design, ArmStatistics stats, double count, double total, bool upper);
}
