using DesignCompiler.Binding;
using DesignCompiler.Numerics;

namespace DesignCompiler.Planning.Families;

/// <summary>
/// Count outcomes (Poisson) with a gamma(shape, rate) prior on the mean count:
/// the posterior is gamma(shape + Σy, rate + n) (A. A. Johnson, M. Q. Ott and M. Dogucu,
/// Bayes Rules!, 2022, ch. 5); the predictive count is negative binomial.
/// </summary>
public sealed class GammaPoissonModel : IOutcomeModel
{
    public OutcomeFamily Family => OutcomeFamily.Count;

    public IMarginal Posterior(PriorSpec prior, ArmStatistics data)
    {
        var gamma = (GammaPriorSpec)prior;
        return new GammaMarginal(gamma.Shape + data.Sum, gamma.Rate + data.Count);
    }

    public (bool Ok, string Rule) Accepts(double value) =>
        (value is >= 0 and <= DesignLimits.MaxCount && Math.Floor(value) == value, $"a whole count from 0 to {DesignLimits.Text(DesignLimits.MaxCount)}");
}
