using DesignCompiler.Binding;

namespace DesignCompiler.Planning.Policies;

/// <summary>
/// UCB1 (Auer, Cesa-Bianchi and Fischer 2002) for outcomes in [0, 1] — bernoulli, and binomial
/// read as a success rate per trial — and UCB1-NORMAL from the same paper for normal and count
/// outcomes, whose index uses the sample variance and first plays every arm ⌈8 ln n⌉ times.
/// </summary>
public sealed class Ucb1Policy : IndexPolicy
{
    private static bool UsesNormalIndex(OutcomeSpec outcome) => outcome.Family is OutcomeFamily.Normal or OutcomeFamily.Count;

    protected override bool MustPlay(CheckedDesign design, ArmStatistics stats, double count, double total) =>
        stats.Count == 0 || (UsesNormalIndex(design.Outcome) && (stats.Count < 2 || ConfidenceBounds.Ucb1NormalNeedsPlays(count, total)));

    protected override double Bound(CheckedDesign design, ArmStatistics stats, double count, double total, bool upper)
    {
        var mean = MeanPerObservation(design.Outcome, stats);
        if (!UsesNormalIndex(design.Outcome)) return ConfidenceBounds.Ucb1(mean, count, total, upper);
        var variance = stats.SumOfSquares / (stats.Count - 1);
        return ConfidenceBounds.Ucb1Normal(mean, variance, count, total, upper);
    }
}
