namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// Finds real quotas q_i = clip(λ·s_i, min_i, max_i) whose sum is a given total: raise one
/// common level λ until the arms, each held between its bounds, add up.
/// </summary>
internal static class WaterFilling
{
    private const int StackLimit = 256;

    /// <summary>
    /// Writes the clipped quotas of the arms with positive share and puts arms with zero share at
    /// their minimum. Returns false when even every positive-share arm at its maximum falls
    /// short of <paramref name="total"/> (the quotas are then those maximums, and the caller
    /// spills the rest onto the zero-share arms). The answer comes from the breakpoint walk,
    /// not from comparing a rounded floating-point sum with the total.
    /// </summary>
    /// <remarks>
    /// Σ clip(λ·s_i, min_i, max_i) is continuous, non-decreasing and piecewise linear in λ, with
    /// breakpoints min_i/s_i (the arm starts to grow) and max_i/s_i (it stops). Sorting the
    /// breakpoints and walking them finds the segment that reaches the total in O(n log n).
    /// The level is then recomputed from the arms found to be strictly between their bounds,
    /// summing in index order, so that with no binding bound it is exactly total / Σ s_i, the
    /// same factor <see cref="Hamilton"/> uses.
    /// </remarks>
    public static bool Solve(
        ReadOnlySpan<double> shares,
        double total,
        ReadOnlySpan<int> minimum,
        ReadOnlySpan<int> maximum,
        Span<double> quotas)
    {
        int n = shares.Length;
        double atMinimums = 0.0;
        for (int i = 0; i < n; i++)
        {
            quotas[i] = minimum[i];
            atMinimums += minimum[i];
        }

        if (atMinimums >= total)
        {
            return true;
        }

        Span<double> breakpoints = 2 * n <= StackLimit ? stackalloc double[2 * n] : new double[2 * n];
        Span<int> events = 2 * n <= StackLimit ? stackalloc int[2 * n] : new int[2 * n];
        int eventCount = 0;
        for (int i = 0; i < n; i++)
        {
            if (shares[i] > 0.0 && maximum[i] > minimum[i])
            {
                breakpoints[eventCount] = minimum[i] / shares[i];
                events[eventCount++] = i;
                breakpoints[eventCount] = maximum[i] / shares[i];
                events[eventCount++] = ~i;
            }
        }

        breakpoints = breakpoints[..eventCount];
        events = events[..eventCount];
        breakpoints.Sort(events);

        double level = 0.0;
        double value = atMinimums;
        double slope = 0.0;
        double solution = double.NaN;
        for (int e = 0; e < eventCount; e++)
        {
            double valueAtEvent = value + slope * (breakpoints[e] - level);
            if (valueAtEvent >= total)
            {
                solution = level + (total - value) / slope;
                break;
            }

            value = valueAtEvent;
            level = breakpoints[e];
            int arm = events[e];
            slope += arm >= 0 ? shares[arm] : -shares[~arm];
        }

        if (double.IsNaN(solution))
        {
            // Every positive-share arm can reach its maximum and the total is still not met.
            for (int i = 0; i < n; i++)
            {
                quotas[i] = shares[i] > 0.0 ? maximum[i] : minimum[i];
            }

            return false;
        }

        Fill(shares, total, solution, minimum, maximum, quotas);
        return true;
    }

    /// <summary>Recomputes the level from the free arms in index order and writes the quotas.</summary>
    private static void Fill(
        ReadOnlySpan<double> shares,
        double total,
        double estimate,
        ReadOnlySpan<int> minimum,
        ReadOnlySpan<int> maximum,
        Span<double> quotas)
    {
        int n = shares.Length;
        double fixedSum = 0.0;
        double freeShares = 0.0;
        for (int i = 0; i < n; i++)
        {
            double share = shares[i];
            double raw = estimate * share;
            if (share <= 0.0 || raw <= minimum[i])
            {
                fixedSum += minimum[i];
            }
            else if (raw >= maximum[i])
            {
                fixedSum += maximum[i];
            }
            else
            {
                freeShares += share;
            }
        }

        double level = freeShares > 0.0 ? (total - fixedSum) / freeShares : estimate;
        for (int i = 0; i < n; i++)
        {
            quotas[i] = shares[i] > 0.0 ? Math.Clamp(level * shares[i], minimum[i], maximum[i]) : minimum[i];
        }
    }
}
