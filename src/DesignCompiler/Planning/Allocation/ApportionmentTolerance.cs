namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// The tolerance below which two quotas, remainders or averages count as equal.
/// </summary>
/// <remarks>
/// Target shares usually come out of numerical integration, so two arms whose exact shares are
/// equal can differ in the 12th digit. Without a tolerance that noise, not the design, would
/// decide which arm gets a contested plot, and the plan could change between machines or
/// library versions. Values closer than <c>PerSeat · seats</c> are treated as tied, a quota
/// that close to an integer is snapped to it, and ties go to the lower arm index.
/// </remarks>
public static class ApportionmentTolerance
{
    /// <summary>Relative size of the tie zone, per seat (plot) being apportioned.</summary>
    public const double PerSeat = 1e-9;

    /// <summary>The absolute tie tolerance for apportioning <paramref name="seats"/> seats.</summary>
    public static double For(int seats) => PerSeat * Math.Max(seats, 1);

    /// <summary>The value, or the nearest integer when it lies within the tolerance of one.</summary>
    internal static double Snap(double value, double tolerance)
    {
        double nearest = Math.Round(value, MidpointRounding.ToEven);
        return Math.Abs(value - nearest) <= tolerance ? nearest : value;
    }
}
