namespace DesignCompiler.Planning.Allocation;

/// <summary>Which rule produced a controlled rounding.</summary>
public enum RoundingMethod
{
    /// <summary>No table was produced.</summary>
    None = 0,

    /// <summary>Every cell is the floor or the ceiling of its proportional value.</summary>
    NearestIntegers,

    /// <summary>
    /// The bounds ruled out floor/ceiling rounding; the table minimises Σ (x − p)² within them.
    /// </summary>
    LeastSquares,
}
