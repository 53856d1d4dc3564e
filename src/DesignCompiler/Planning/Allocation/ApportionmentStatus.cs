namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// The outcome of a bounded apportionment without the counts: feasible, or the reason and the
/// numbers a diagnostic needs ("minimums need 18 plots, the round has 16").
/// </summary>
/// <param name="Failure">Why there is no solution, or <see cref="ApportionmentFailure.None"/>.</param>
/// <param name="ArmIndex">The arm concerned for per-arm failures, otherwise −1.</param>
/// <param name="Required">What the constraints demand (see each <see cref="ApportionmentFailure"/> member).</param>
/// <param name="Available">What is available to meet it.</param>
public readonly record struct ApportionmentStatus(ApportionmentFailure Failure, int ArmIndex, long Required, long Available)
{
    public static ApportionmentStatus Feasible => new(ApportionmentFailure.None, -1, 0, 0);

    public bool IsFeasible => Failure == ApportionmentFailure.None;
}
