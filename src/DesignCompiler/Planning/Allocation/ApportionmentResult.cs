namespace DesignCompiler.Planning.Allocation;

/// <summary>Whole plots per arm from a bounded apportionment, or why there are none.</summary>
public sealed class ApportionmentResult
{
    public ApportionmentResult(ApportionmentStatus status, int[] counts)
    {
        Status = status;
        Counts = status.IsFeasible ? counts : [];
    }

    public ApportionmentStatus Status { get; }

    public bool IsFeasible => Status.IsFeasible;

    /// <summary>One count per arm when feasible; empty otherwise.</summary>
    public int[] Counts { get; }

    public ApportionmentFailure Failure => Status.Failure;

    /// <summary>The arm concerned for per-arm failures, otherwise −1.</summary>
    public int ArmIndex => Status.ArmIndex;

    public long Required => Status.Required;

    public long Available => Status.Available;
}
