using DesignCompiler.Binding;
using DesignCompiler.Numerics;

namespace DesignCompiler.Planning.Families;

/// <summary>
/// Bernoulli (N = 1) and binomial-of-N outcomes with a beta prior on the success probability:
/// each success adds one to a, each failure one to b (common practice; conjugacy of the beta).
/// </summary>
public sealed class BetaBinomialModel(int trialsPerPlot) : IOutcomeModel
{
    public int TrialsPerPlot { get; } = trialsPerPlot;

    public OutcomeFamily Family => TrialsPerPlot == 1 ? OutcomeFamily.Bernoulli : OutcomeFamily.Binomial;

    public IMarginal Posterior(PriorSpec prior, ArmStatistics data)
    {
        var (a, b) = PosteriorParameters(prior, data);
        return new BetaMarginal(a, b);
    }

    /// <summary>The posterior's (a, b); the planner's workspace re-targets its own posteriors with them.</summary>
    public (double A, double B) PosteriorParameters(PriorSpec prior, ArmStatistics data)
    {
        var beta = (BetaPriorSpec)prior;
        var successes = data.Sum;
        var failures = (double)TrialsPerPlot * data.Count - successes;
        return (beta.A + successes, beta.B + failures);
    }

    public (bool Ok, string Rule) Accepts(double value) =>
        (value >= 0 && value <= TrialsPerPlot && Math.Floor(value) == value,
            TrialsPerPlot == 1 ? "0 or 1" : FormattableString.Invariant($"a whole number from 0 to {TrialsPerPlot}"));
}
