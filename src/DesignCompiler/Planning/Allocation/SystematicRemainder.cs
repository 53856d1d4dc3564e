namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// The rounding step of randomized rounding: floors of the quotas, then the missing seats by
/// systematic sampling of the remainders with one uniform number.
/// </summary>
/// <remarks>
/// Lay the remainders r_i = q_i − ⌊q_i⌋ end to end on a line, in arm order; they fill a length
/// m = total − Σ⌊q_i⌋ (a whole number). The points u, u + 1, …, u + m − 1 for one u uniform on
/// [0, 1) each fall in exactly one remainder's interval, and no interval (length below 1) holds
/// two, so arm i gets one extra seat with probability exactly r_i and the total is exact
/// (systematic sampling: W. G. Madow and L. H. Madow, 1944; as a rounding scheme for
/// allocations, common practice). Hence E[count_i] = q_i. Quotas within the tolerance of an
/// integer are snapped first, as in <see cref="LargestRemainder"/>, so quadrature noise does not
/// turn a whole quota into a coin flip. If floating-point sums leave the point count one short,
/// the fallback gives the seat to the largest unserved remainder below its maximum.
/// </remarks>
internal static class SystematicRemainder
{
    private const int StackLimit = 128;

    public static void Distribute(
        ReadOnlySpan<double> quotas,
        int total,
        ReadOnlySpan<int> minimum,
        ReadOnlySpan<int> maximum,
        double tolerance,
        double uniform,
        Span<int> counts)
    {
        int n = quotas.Length;
        Span<double> remainders = n <= StackLimit ? stackalloc double[n] : new double[n];
        long assigned = 0;
        for (int i = 0; i < n; i++)
        {
            double quota = ApportionmentTolerance.Snap(quotas[i], tolerance);
            int count = Math.Max((int)Math.Floor(quota), minimum[i]);
            counts[i] = count;
            remainders[i] = count >= maximum[i] ? 0.0 : Math.Max(0.0, quota - count);
            assigned += count;
        }

        long missing = total - assigned;
        double point = uniform;
        double end = 0.0;
        for (int i = 0; i < n && missing > 0; i++)
        {
            end += remainders[i];
            if (remainders[i] > 0.0 && point < end)
            {
                counts[i]++;
                remainders[i] = 0.0;
                point += 1.0;
                missing--;
            }
        }

        // Floating-point shortfall only: the remainders summed to a hair under m.
        while (missing > 0)
        {
            int pick = -1;
            for (int i = 0; i < n; i++)
            {
                if (counts[i] < maximum[i] && (pick < 0 || remainders[i] > remainders[pick])) pick = i;
            }

            if (pick < 0) break;
            counts[pick]++;
            remainders[pick] = 0.0;
            missing--;
        }
    }
}
