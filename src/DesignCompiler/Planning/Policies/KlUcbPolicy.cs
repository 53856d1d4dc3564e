using DesignCompiler.Binding;

namespace DesignCompiler.Planning.Policies;

/// <summary>
/// KL-UCB (Garivier and Cappé 2011) with the divergence of the outcome family: bernoulli (per
/// trial for binomial), Poisson for counts, and Gaussian for normal outcomes — with the known
/// noise sd, or the sample sd when the noise is unknown (an arm is then played until it has two plots).
/// </summary>
public sealed class KlUcbPolicy(double c) : IndexPolicy
{
    public double C { get; } = c;

    protected override bool MustPlay(CheckedDesign design, ArmStatistics stats, double count, double total) =>
        stats.Count == 0 || (design.Outcome.HasUnknownNoise && stats.Count < 2);

    protected override double Bound(CheckedDesign design, ArmStatistics stats, double count, double total, bool upper)
    {
        var mean = MeanPerObservation(design.Outcome, stats);
        var level = ConfidenceBounds.KlLevel(total, C);
        return design.Outcome.Family switch
        {
            OutcomeFamily.Bernoulli or OutcomeFamily.Binomial => ConfidenceBounds.KlBernoulli(mean, count, level, upper),
            OutcomeFamily.Count => ConfidenceBounds.KlPoisson(mean, count, level, upper),
            _ => ConfidenceBounds.KlNormal(mean, design.Outcome.NoiseSd ?? Math.Sqrt(stats.SumOfSquares / (stats.Count - 1)), count, level, upper),
        };
    }
}
