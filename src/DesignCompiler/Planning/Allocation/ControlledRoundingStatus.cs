namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// The outcome of a controlled rounding without the table: the method used, or the reason it
/// is infeasible with the numbers and the rows and columns a diagnostic should point at.
/// </summary>
public readonly struct ControlledRoundingStatus
{
    public ControlledRoundingStatus(
        ControlledRoundingFailure failure,
        RoundingMethod method,
        int armIndex,
        int blockIndex,
        long required,
        long available,
        int[]? arms = null,
        int[]? blocks = null)
    {
        Failure = failure;
        Method = method;
        ArmIndex = armIndex;
        BlockIndex = blockIndex;
        Required = required;
        Available = available;
        Arms = arms ?? [];
        Blocks = blocks ?? [];
    }

    public ControlledRoundingFailure Failure { get; }

    public bool IsFeasible => Failure == ControlledRoundingFailure.None;

    public RoundingMethod Method { get; }

    /// <summary>The arm (row) concerned, otherwise −1.</summary>
    public int ArmIndex { get; }

    /// <summary>The block (column) concerned, otherwise −1.</summary>
    public int BlockIndex { get; }

    /// <summary>What the constraints demand (see each <see cref="ControlledRoundingFailure"/> member).</summary>
    public long Required { get; }

    /// <summary>What is available to meet it.</summary>
    public long Available { get; }

    /// <summary>The arms in a <see cref="ControlledRoundingFailure.FlowCut"/>, ascending; otherwise empty.</summary>
    public int[] Arms { get; }

    /// <summary>The blocks in a <see cref="ControlledRoundingFailure.FlowCut"/>, ascending; otherwise empty.</summary>
    public int[] Blocks { get; }

    internal static ControlledRoundingStatus Solved(RoundingMethod method) =>
        new(ControlledRoundingFailure.None, method, -1, -1, 0, 0);

    internal static ControlledRoundingStatus ForArm(ControlledRoundingFailure failure, int arm, long required, long available) =>
        new(failure, RoundingMethod.None, arm, -1, required, available);

    internal static ControlledRoundingStatus ForBlock(ControlledRoundingFailure failure, int block, long required, long available) =>
        new(failure, RoundingMethod.None, -1, block, required, available);
}
