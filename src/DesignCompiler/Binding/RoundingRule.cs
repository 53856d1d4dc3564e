namespace DesignCompiler.Binding;

/// <summary>How the policy's target shares become whole plots per arm.</summary>
public enum RoundingRule
{
    /// <summary>
    /// Largest remainder within each arm's bounds: the same plots every time. An arm whose share
    /// of the round is below half a plot or so gets none, so a small probability of being best
    /// can shut an arm out for good.
    /// </summary>
    LargestRemainder,

    /// <summary>
    /// Randomized systematic rounding: the floors, then one plot more for arm i with probability
    /// equal to its fractional part, from one uniform number per round; the expected plots per
    /// arm equal the policy's quotas exactly and the total is exact.
    /// </summary>
    Randomized,
}
