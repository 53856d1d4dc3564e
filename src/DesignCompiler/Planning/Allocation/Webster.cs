namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// Webster's method (Sainte-Laguë, highest averages): seats are handed out one at a time, each
/// to the arm with the largest average p_i / (2 s_i + 1), where s_i is the arm's seats so far.
/// Equivalently, counts are quotas divided by a common divisor and rounded at one half.
/// </summary>
/// <remarks>
/// As a divisor method it is house-monotone, so it never shows the Alabama paradox, but it can
/// (rarely) leave an arm outside its quota (Balinski and Young, <i>Fair Representation</i>, 1982,
/// ch. 4 and 8).
/// <para>
/// Tie rule: quotas within <see cref="ApportionmentTolerance.For"/>(seats) of an integer are
/// snapped to it; the averages are compared as q_i / (s_i + ½) in seat units, and averages
/// within that tolerance of the largest count as tied, the lowest index among them winning the
/// seat. Because the rule is stated seat by seat, the allocation for h + 1 seats always contains
/// the allocation for h seats.
/// </para>
/// <para>
/// Handing out thousands of plots one by one would be slow, so the computation starts from the
/// seats that the one-by-one process provably gives first: all averages above a threshold T
/// that sits in a gap (no average within the tolerance of T) and has at most the requested
/// number of seats above it (found by bisection, so usually none or a few remain). While any
/// average above such a T remains, the largest remaining average exceeds T by more than the
/// tolerance, so every seat awarded before they are exhausted is one of them; the state after
/// those seats is therefore the same in whatever order they were given. Only the remaining
/// seats are then handed out one at a time.
/// </para>
/// </remarks>
public static class Webster
{
    private const int StackLimit = 128;

    public static int[] Apportion(ReadOnlySpan<double> populations, int seats)
    {
        var counts = new int[populations.Length];
        Apportion(populations, seats, counts);
        return counts;
    }

    /// <summary>Allocation-free form: writes one count per population into <paramref name="counts"/>.</summary>
    public static void Apportion(ReadOnlySpan<double> populations, int seats, Span<int> counts)
    {
        double scale = Quotas.Scale(populations, seats, counts, nameof(Webster));
        int n = populations.Length;
        double tolerance = ApportionmentTolerance.For(seats);
        Span<double> quotas = n <= StackLimit ? stackalloc double[n] : new double[n];
        for (int i = 0; i < n; i++)
        {
            quotas[i] = ApportionmentTolerance.Snap(populations[i] * scale, tolerance);
        }

        counts.Clear();
        if (seats == 0)
        {
            return;
        }

        long given = GiveSeatsAboveGap(quotas, seats, tolerance, counts);
        Span<double> averages = n <= StackLimit ? stackalloc double[n] : new double[n];
        for (int i = 0; i < n; i++)
        {
            averages[i] = Average(quotas[i], counts[i]);
        }

        for (long seat = given; seat < seats; seat++)
        {
            double largest = double.NegativeInfinity;
            for (int i = 0; i < n; i++)
            {
                largest = Math.Max(largest, averages[i]);
            }

            double tieZone = largest - tolerance;
            int winner = 0;
            while (averages[winner] < tieZone)
            {
                winner++;
            }

            counts[winner]++;
            averages[winner] = Average(quotas[winner], counts[winner]);
        }
    }

    /// <summary>The average at which an arm holding <paramref name="held"/> seats wins its next one.</summary>
    private static double Average(double quota, int held) => quota / (held + 0.5);

    /// <summary>
    /// Gives every arm the seats whose averages exceed a gap threshold T (see the type remarks)
    /// and returns how many were given; gives none when no safe T is found quickly.
    /// </summary>
    private static long GiveSeatsAboveGap(ReadOnlySpan<double> quotas, int seats, double tolerance, Span<int> counts)
    {
        int n = quotas.Length;
        if (seats <= n)
        {
            return 0;
        }

        // Σ_i #{averages of arm i above T} lies within Σ (q_i / T ± ½) = seats / T ± n/2, so it is
        // at least the number of seats at T = seats / (seats + n/2) and at most that number at
        // T = seats / (seats − n/2). Bisect between the two for a T with as few seats as possible
        // left to hand out one by one, then step upward until T sits in a gap.
        double low = seats / (seats + 0.5 * n);
        double high = seats / (seats - 0.5 * n);
        for (int iteration = 0; iteration < 64; iteration++)
        {
            double middle = 0.5 * (low + high);
            long above = CountAbove(quotas, middle);
            if (above > seats)
            {
                low = middle;
            }
            else
            {
                high = middle;
                if (above == seats)
                {
                    break;
                }
            }
        }

        double threshold = high;
        for (int attempt = 0; attempt <= n + 1; attempt++, threshold += 3.0 * tolerance)
        {
            if (IsGap(quotas, threshold, tolerance))
            {
                long given = 0;
                for (int i = 0; i < n; i++)
                {
                    counts[i] = SeatsAbove(quotas[i], threshold);
                    given += counts[i];
                }

                if (given <= seats)
                {
                    return given;
                }

                // Only reachable if rounding broke the counting bound: start from zero.
                counts.Clear();
                return 0;
            }
        }

        return 0;
    }

    private static long CountAbove(ReadOnlySpan<double> quotas, double threshold)
    {
        long count = 0;
        foreach (double quota in quotas)
        {
            count += SeatsAbove(quota, threshold);
        }

        return count;
    }

    private static bool IsGap(ReadOnlySpan<double> quotas, double threshold, double tolerance)
    {
        foreach (double quota in quotas)
        {
            if (quota <= 0.0)
            {
                continue;
            }

            // The averages of one arm fall as its seats rise, so only those next to T can be close;
            // a margin of one index either side absorbs rounding in the estimate.
            int near = (int)Math.Floor(quota / threshold - 0.5);
            for (int held = Math.Max(0, near - 1); held <= near + 2; held++)
            {
                if (Math.Abs(Average(quota, held) - threshold) <= tolerance)
                {
                    return false;
                }
            }
        }

        return true;
    }

    /// <summary>The number of the arm's averages (held = 0, 1, ...) strictly above the threshold.</summary>
    private static int SeatsAbove(double quota, double threshold)
    {
        int held = Math.Max(0, (int)Math.Floor(quota / threshold - 0.5) - 1);
        while (held > 0 && Average(quota, held - 1) <= threshold)
        {
            held--;
        }

        while (Average(quota, held) > threshold)
        {
            held++;
        }

        return held;
    }
}
