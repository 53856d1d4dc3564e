namespace DesignCompiler.Planning.Allocation;

/// <summary>Validation and the seats-per-unit scaling shared by the unbounded methods.</summary>
internal static class Quotas
{
    /// <summary>
    /// Checks the populations and returns seats / Σ populations, the factor that turns a
    /// population into its quota. Summing in index order and scaling each population by this one
    /// factor is what makes <see cref="BoundedApportionment"/> reproduce <see cref="Hamilton"/>
    /// bit for bit when no bound binds.
    /// </summary>
    public static double Scale(ReadOnlySpan<double> populations, int seats, Span<int> counts, string methodName)
    {
        if (seats < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(seats), seats, "The number of seats must be non-negative.");
        }

        if (counts.Length != populations.Length)
        {
            throw new ArgumentException("The counts span must have one entry per population.", nameof(counts));
        }

        double sum = 0.0;
        for (int i = 0; i < populations.Length; i++)
        {
            double population = populations[i];
            if (!(population >= 0.0) || double.IsInfinity(population))
            {
                throw new ArgumentOutOfRangeException(nameof(populations), population, $"{methodName}: population {i} must be finite and non-negative.");
            }

            sum += population;
        }

        if (seats > 0 && !(sum > 0.0))
        {
            throw new ArgumentException($"{methodName}: seats cannot be apportioned when every population is zero.", nameof(populations));
        }

        return seats == 0 ? 0.0 : seats / sum;
    }
}
