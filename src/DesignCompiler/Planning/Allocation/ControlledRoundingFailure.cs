namespace DesignCompiler.Planning.Allocation;

/// <summary>Why an arms × blocks table cannot be filled.</summary>
public enum ControlledRoundingFailure
{
    /// <summary>The table is feasible.</summary>
    None = 0,

    /// <summary>An arm's total is negative (<c>ArmIndex</c>; <c>Required</c> is the total).</summary>
    NegativeRowTotal,

    /// <summary>A block's total is negative (<c>BlockIndex</c>; <c>Required</c> is the total).</summary>
    NegativeColumnTotal,

    /// <summary>Arm totals and block totals differ (<c>Required</c> = Σ arm totals, <c>Available</c> = Σ block totals).</summary>
    TotalsDisagree,

    /// <summary>A cell minimum is negative (<c>ArmIndex</c>, <c>BlockIndex</c>; <c>Required</c> is the minimum).</summary>
    NegativeCellMinimum,

    /// <summary>A cell minimum exceeds its maximum (<c>Required</c> = minimum, <c>Available</c> = maximum).</summary>
    CellMinimumExceedsMaximum,

    /// <summary>An arm's cell minimums need more than its total (<c>Required</c> = Σ minimums, <c>Available</c> = total).</summary>
    RowMinimumsExceedTotal,

    /// <summary>A block's cell minimums need more than its plots (<c>Required</c> = Σ minimums, <c>Available</c> = plots).</summary>
    ColumnMinimumsExceedTotal,

    /// <summary>An arm's cell maximums hold less than its total (<c>Required</c> = total, <c>Available</c> = Σ maximums).</summary>
    RowMaximumsBelowTotal,

    /// <summary>A block's cell maximums hold less than its plots (<c>Required</c> = plots, <c>Available</c> = Σ maximums).</summary>
    ColumnMaximumsBelowTotal,

    /// <summary>
    /// No single row or column is at fault, but a group is: the arms in <c>Arms</c> need
    /// <c>Required</c> plots (their totals) and can place at most <c>Available</c>: their cell
    /// maximums in the blocks outside <c>Blocks</c>, plus the plots of the blocks in
    /// <c>Blocks</c> not already claimed by the other arms' minimums there.
    /// </summary>
    FlowCut,
}
