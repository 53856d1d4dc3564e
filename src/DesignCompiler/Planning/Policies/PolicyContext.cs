using DesignCompiler.Binding;
using DesignCompiler.Numerics;

namespace DesignCompiler.Planning.Policies;

/// <summary>
/// What a policy may look at when it shares out a round: the design, the round, which arms
/// may be sown, each arm's posterior of its value (in ranking units: larger is better), its
/// probability of being best among the arms that may be sown, and the plots recorded so far.
/// A struct, so that asking a policy for shares allocates nothing.
/// </summary>
public readonly record struct PolicyContext(
    CheckedDesign Design,
    int Round,
    int PlotsThisRound,
    IReadOnlyList<bool> Available,
    IReadOnlyList<IMarginal> Values,
    IReadOnlyList<double> ProbabilityBest,
    IReadOnlyList<ArmStatistics> Statistics);
