namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// The rounding step shared by <see cref="Hamilton"/> and <see cref="BoundedApportionment"/>:
/// floors of the quotas, then one more seat each for the largest remainders.
/// </summary>
internal static class LargestRemainder
{
    private const int StackLimit = 128;

    /// <summary>
    /// Rounds <paramref name="quotas"/> (which should sum to <paramref name="total"/>) to
    /// integers that sum to it exactly.
    /// </summary>
    /// <remarks>
    /// Each quota within <paramref name="tolerance"/> of an integer is first snapped to it. Every
    /// arm then gets the floor of its quota, and the seats still missing go one at a time to the
    /// arm with the largest remainder among those still below their maximum and not yet served;
    /// arms whose remainder is within the tolerance of that largest remainder count as tied and
    /// the lowest index among them wins. Quotas must already lie in [minimum, maximum]; both
    /// bound spans may be empty, meaning 0 and unbounded.
    /// <para>
    /// In exact arithmetic at most one extra seat per arm is ever needed. The fallback loops at
    /// the end only run when rounding in the caller's quotas made their sum miss the total by a
    /// whole seat; they keep the sum and the bounds exact even then.
    /// </para>
    /// </remarks>
    public static void Distribute(
        ReadOnlySpan<double> quotas,
        int total,
        ReadOnlySpan<int> minimum,
        ReadOnlySpan<int> maximum,
        double tolerance,
        Span<int> counts)
    {
        int n = quotas.Length;
        Span<double> remainders = n <= StackLimit ? stackalloc double[n] : new double[n];
        long assigned = 0;
        for (int i = 0; i < n; i++)
        {
            double quota = ApportionmentTolerance.Snap(quotas[i], tolerance);
            double floor = Math.Floor(quota);
            int count = (int)floor;
            if (minimum.Length > 0 && count < minimum[i])
            {
                count = minimum[i];
            }

            counts[i] = count;
            remainders[i] = Math.Max(0.0, quota - count);
            assigned += count;
        }

        long missing = total - assigned;
        if (missing > 0)
        {
            missing = AwardLargestRemainders(remainders, maximum, tolerance, counts, missing);
        }

        // Rounding pathologies only: see remarks.
        for (int i = 0; missing > 0 && i < n; i++)
        {
            int room = (maximum.Length > 0 ? maximum[i] : int.MaxValue) - counts[i];
            int extra = (int)Math.Min(room, missing);
            counts[i] += extra;
            missing -= extra;
        }

        for (int i = n - 1; missing < 0 && i >= 0; i--)
        {
            int slack = counts[i] - (minimum.Length > 0 ? minimum[i] : 0);
            int fewer = (int)Math.Min(slack, -missing);
            counts[i] -= fewer;
            missing += fewer;
        }
    }

    private static long AwardLargestRemainders(
        ReadOnlySpan<double> remainders,
        ReadOnlySpan<int> maximum,
        double tolerance,
        Span<int> counts,
        long missing)
    {
        int n = remainders.Length;
        Span<double> keys = n <= StackLimit ? stackalloc double[n] : new double[n];
        Span<int> arms = n <= StackLimit ? stackalloc int[n] : new int[n];
        int candidates = 0;
        for (int i = 0; i < n; i++)
        {
            if (maximum.Length == 0 || counts[i] < maximum[i])
            {
                // Negated so an ascending sort puts the largest remainder first.
                keys[candidates] = -remainders[i];
                arms[candidates] = i;
                candidates++;
            }
        }

        keys = keys[..candidates];
        arms = arms[..candidates];
        keys.Sort(arms);

        // The sort's order among exactly equal keys is unspecified; it does not matter because
        // each award scans the whole tie zone and takes the lowest index in it.
        int first = 0;
        while (missing > 0 && first < candidates)
        {
            double zoneEnd = keys[first] + tolerance;
            int chosenPosition = first;
            for (int position = first + 1; position < candidates && keys[position] <= zoneEnd; position++)
            {
                if (arms[position] >= 0 && arms[position] < arms[chosenPosition])
                {
                    chosenPosition = position;
                }
            }

            counts[arms[chosenPosition]]++;
            arms[chosenPosition] = -1;
            missing--;
            while (first < candidates && arms[first] < 0)
            {
                first++;
            }
        }

        return missing;
    }
}
