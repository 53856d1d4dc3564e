namespace DesignCompiler.Planning.Allocation;

/// <summary>Plots per arm and block, or why the table cannot be filled.</summary>
public sealed class ControlledRoundingResult
{
    public ControlledRoundingResult(ControlledRoundingStatus status, int[,] counts)
    {
        Status = status;
        Counts = status.IsFeasible ? counts : new int[0, 0];
    }

    public ControlledRoundingStatus Status { get; }

    public bool IsFeasible => Status.IsFeasible;

    /// <summary>Counts[arm, block] when feasible; a 0 × 0 table otherwise.</summary>
    public int[,] Counts { get; }

    public RoundingMethod Method => Status.Method;

    public ControlledRoundingFailure Failure => Status.Failure;
}
