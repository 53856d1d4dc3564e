namespace DesignCompiler.Planning.Allocation;

/// <summary>Why a bounded apportionment has no solution.</summary>
public enum ApportionmentFailure
{
    /// <summary>The apportionment is feasible.</summary>
    None = 0,

    /// <summary>The total to apportion is negative.</summary>
    NegativeTotal,

    /// <summary>A target share is negative, NaN or infinite (<c>ArmIndex</c> names it).</summary>
    InvalidShare,

    /// <summary>An arm's minimum is negative (<c>ArmIndex</c>; <c>Required</c> is the minimum).</summary>
    NegativeMinimum,

    /// <summary>An arm's minimum exceeds its maximum (<c>Required</c> = minimum, <c>Available</c> = maximum).</summary>
    MinimumExceedsMaximum,

    /// <summary>The minimums together need more than the total (<c>Required</c> = Σ minimums, <c>Available</c> = total).</summary>
    MinimumsExceedTotal,

    /// <summary>The maximums together hold less than the total (<c>Required</c> = total, <c>Available</c> = Σ maximums).</summary>
    MaximumsBelowTotal,
}
