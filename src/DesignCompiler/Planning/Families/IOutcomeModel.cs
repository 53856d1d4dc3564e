using DesignCompiler.Binding;
using DesignCompiler.Numerics;

namespace DesignCompiler.Planning.Families;

/// <summary>
/// One outcome family with its conjugate prior: how recorded plots update an arm's belief
/// about its mean outcome θ. Each family lives in its own file; adding a family means adding
/// one implementation and naming it in <see cref="OutcomeModels"/>.
/// </summary>
public interface IOutcomeModel
{
    OutcomeFamily Family { get; }

    /// <summary>The posterior of the arm's mean outcome θ (per plot; for binomial, the success probability).</summary>
    IMarginal Posterior(PriorSpec prior, ArmStatistics data);

    /// <summary>Whether a recorded value is one the family can produce, with the rule in words when it is not.</summary>
    (bool Ok, string Rule) Accepts(double value);
}
