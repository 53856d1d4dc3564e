namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// Hamilton's method (largest remainder; also Hare–Niemeyer): every arm gets the floor of its
/// quota seats·p_i/Σp, and the seats left over go to the largest fractional remainders.
/// </summary>
/// <remarks>
/// Hamilton's method always stays within quota (each count is the floor or the ceiling of its
/// quota), but it is not house-monotone: adding a seat can take one away from an arm (the
/// Alabama paradox; Balinski and Young, <i>Fair Representation</i>, 1982, ch. 5).
/// <para>
/// Tie rule: a quota within <see cref="ApportionmentTolerance.For"/>(seats) of an integer is
/// snapped to it; remainders within that tolerance of the largest remaining remainder count as
/// tied, and the lowest index among them wins each leftover seat.
/// </para>
/// Invalid input (negative, NaN or infinite populations; all populations zero with seats to
/// give) is a caller bug and throws.
/// </remarks>
public static class Hamilton
{
    public static int[] Apportion(ReadOnlySpan<double> populations, int seats)
    {
        var counts = new int[populations.Length];
        Apportion(populations, seats, counts);
        return counts;
    }

    /// <summary>Allocation-free form: writes one count per population into <paramref name="counts"/>.</summary>
    public static void Apportion(ReadOnlySpan<double> populations, int seats, Span<int> counts)
    {
        double scale = Quotas.Scale(populations, seats, counts, nameof(Hamilton));
        int n = populations.Length;
        Span<double> quotas = n <= 128 ? stackalloc double[n] : new double[n];
        for (int i = 0; i < n; i++)
        {
            quotas[i] = populations[i] * scale;
        }

        LargestRemainder.Distribute(quotas, seats, [], [], ApportionmentTolerance.For(seats), counts);
    }
}
