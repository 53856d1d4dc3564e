namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// Whole plots per arm from target shares, with a minimum and a maximum for every arm.
/// </summary>
/// <remarks>
/// The rule, in two steps:
/// <list type="number">
/// <item>Real quotas q_i = clip(λ·s_i, min_i, max_i), with the one level λ that makes
/// Σ q_i = total ("water-filling": the bounds hold arms back or lift them up, and the rest share
/// what is left in proportion to their shares). Arms with share 0 get their minimum; if every
/// arm with a positive share is at its maximum and plots are still left, those go to the
/// zero-share arms as if they had equal shares, q_i = clip(μ, min_i, max_i), again with Σ q_i =
/// total. If all shares are zero, that equal split covers every arm.</item>
/// <item>Largest remainder within the bounds: every arm gets ⌊q_i⌋ and the missing plots go one
/// each to the largest remainders q_i − ⌊q_i⌋ among arms below their maximum, with the
/// <see cref="ApportionmentTolerance"/> tie rule of <see cref="Hamilton"/> (snap to integers
/// within 1e-9·total; remainders that close count as tied; the lower index wins).</item>
/// </list>
/// With a uniform number, step 2 is <see cref="SystematicRemainder"/> instead (the design's
/// <c>rounding randomized</c>): the same quotas, rounded so that each arm's expected count equals
/// its quota.
/// <para>
/// Consequences: the counts sum to the total, every count is within its bounds and is the
/// floor or the ceiling of its (snapped) clipped quota, and with bounds that do not bind the
/// result is exactly <see cref="Hamilton"/>'s. Like Hamilton's method it is not
/// house-monotone (the Alabama paradox can occur).
/// </para>
/// <para>
/// Infeasible input (negative total or minimum, a bad share, a minimum above its maximum,
/// minimums that need more than the total, maximums that hold less) is reported in the
/// <see cref="ApportionmentStatus"/>, never thrown. Spans of different lengths are a caller bug
/// and throw.
/// </para>
/// </remarks>
public static class BoundedApportionment
{
    private const int StackLimit = 128;

    public static ApportionmentResult Apportion(
        ReadOnlySpan<double> targetShares,
        int total,
        ReadOnlySpan<int> minimum,
        ReadOnlySpan<int> maximum,
        double? uniform = null)
    {
        var counts = new int[targetShares.Length];
        ApportionmentStatus status = Apportion(targetShares, total, minimum, maximum, counts, uniform);
        return new ApportionmentResult(status, counts);
    }

    /// <summary>
    /// Allocation-free form for hot loops: writes the counts into <paramref name="counts"/>
    /// (left unspecified when infeasible) and returns the status.
    /// </summary>
    public static ApportionmentStatus Apportion(
        ReadOnlySpan<double> targetShares,
        int total,
        ReadOnlySpan<int> minimum,
        ReadOnlySpan<int> maximum,
        Span<int> counts,
        double? uniform = null)
    {
        int n = targetShares.Length;
        if (minimum.Length != n || maximum.Length != n || counts.Length != n)
        {
            throw new ArgumentException("Shares, minimums, maximums and counts must have one entry per arm.");
        }

        ApportionmentStatus status = Check(targetShares, total, minimum, maximum);
        if (!status.IsFeasible)
        {
            return status;
        }

        Span<double> quotas = n <= StackLimit ? stackalloc double[n] : new double[n];
        if (!WaterFilling.Solve(targetShares, total, minimum, maximum, quotas))
        {
            SpillOntoZeroShareArms(targetShares, total, minimum, maximum, quotas);
        }

        // Step 2: largest remainder, or (with a uniform number) randomized systematic rounding.
        if (uniform is { } u)
        {
            SystematicRemainder.Distribute(quotas, total, minimum, maximum, ApportionmentTolerance.For(total), u, counts);
        }
        else
        {
            LargestRemainder.Distribute(quotas, total, minimum, maximum, ApportionmentTolerance.For(total), counts);
        }

        return status;
    }

    private static ApportionmentStatus Check(
        ReadOnlySpan<double> shares,
        int total,
        ReadOnlySpan<int> minimum,
        ReadOnlySpan<int> maximum)
    {
        if (total < 0)
        {
            return new ApportionmentStatus(ApportionmentFailure.NegativeTotal, -1, total, 0);
        }

        long minimumSum = 0;
        long maximumSum = 0;
        for (int i = 0; i < shares.Length; i++)
        {
            if (!(shares[i] >= 0.0) || double.IsInfinity(shares[i]))
            {
                return new ApportionmentStatus(ApportionmentFailure.InvalidShare, i, 0, 0);
            }

            if (minimum[i] < 0)
            {
                return new ApportionmentStatus(ApportionmentFailure.NegativeMinimum, i, minimum[i], 0);
            }

            if (minimum[i] > maximum[i])
            {
                return new ApportionmentStatus(ApportionmentFailure.MinimumExceedsMaximum, i, minimum[i], maximum[i]);
            }

            minimumSum += minimum[i];
            maximumSum += maximum[i];
        }

        if (minimumSum > total)
        {
            return new ApportionmentStatus(ApportionmentFailure.MinimumsExceedTotal, -1, minimumSum, total);
        }

        if (maximumSum < total)
        {
            return new ApportionmentStatus(ApportionmentFailure.MaximumsBelowTotal, -1, total, maximumSum);
        }

        return ApportionmentStatus.Feasible;
    }

    /// <summary>
    /// Second water-fill when the positive-share arms are all at their maximum: those stay
    /// there (their minimum is raised to it) and the zero-share arms fill up as equals.
    /// </summary>
    private static void SpillOntoZeroShareArms(
        ReadOnlySpan<double> shares,
        int total,
        ReadOnlySpan<int> minimum,
        ReadOnlySpan<int> maximum,
        Span<double> quotas)
    {
        int n = shares.Length;
        Span<double> equalShares = n <= StackLimit ? stackalloc double[n] : new double[n];
        Span<int> floorBound = n <= StackLimit ? stackalloc int[n] : new int[n];
        for (int i = 0; i < n; i++)
        {
            bool positive = shares[i] > 0.0;
            equalShares[i] = positive ? 0.0 : 1.0;
            floorBound[i] = positive ? maximum[i] : minimum[i];
        }

        WaterFilling.Solve(equalShares, total, floorBound, maximum, quotas);
    }
}
