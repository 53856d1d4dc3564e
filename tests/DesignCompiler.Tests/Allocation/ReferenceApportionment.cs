namespace DesignCompiler.Tests.Allocation;

/// <summary>
/// Slow, obviously correct versions of the documented rules, for the property tests to
/// compare the fast library code with.
/// </summary>
internal static class ReferenceApportionment
{
    /// <summary>
    /// Webster seat by seat from zero: each seat to the largest q_i/(s_i + ½); averages within
    /// 1e-9·seats of the largest are tied and the lowest index wins; quotas snapped to integers
    /// within the same tolerance (the library's documented rule).
    /// </summary>
    public static int[] WebsterSeatBySeat(double[] populations, int seats)
    {
        int n = populations.Length;
        double tolerance = 1e-9 * Math.Max(seats, 1);
        double scale = seats / populations.Sum();
        var quotas = new double[n];
        for (int i = 0; i < n; i++)
        {
            double quota = populations[i] * scale;
            double nearest = Math.Round(quota);
            quotas[i] = Math.Abs(quota - nearest) <= tolerance ? nearest : quota;
        }

        var counts = new int[n];
        for (int seat = 0; seat < seats; seat++)
        {
            double largest = Enumerable.Range(0, n).Max(i => quotas[i] / (counts[i] + 0.5));
            int winner = Enumerable.Range(0, n).First(i => quotas[i] / (counts[i] + 0.5) >= largest - tolerance);
            counts[winner]++;
        }

        return counts;
    }

    /// <summary>
    /// The real quotas of BoundedApportionment by bisection on the level, independent of the
    /// library's breakpoint walk: clip(λ·s_i, min_i, max_i), zero-share arms at their minimum,
    /// and if the positive-share arms saturate, the zero-share arms as equals clip(μ, min, max).
    /// </summary>
    public static double[] BoundedQuotas(BoundedInstance instance)
    {
        double[] s = instance.Shares;
        int n = s.Length;
        int[] min = instance.Minimum;
        int[] max = instance.Maximum;
        double total = instance.Total;

        double Fill(double level, double[] quotas)
        {
            double sum = 0;
            for (int i = 0; i < n; i++)
            {
                quotas[i] = s[i] > 0 ? Math.Clamp(level * s[i], min[i], max[i]) : min[i];
                sum += quotas[i];
            }

            return sum;
        }

        var result = new double[n];
        double saturated = 0;
        for (int i = 0; i < n; i++)
        {
            saturated += s[i] > 0 ? max[i] : min[i];
        }

        if (saturated >= total)
        {
            double low = 0;
            double high = 1;
            while (Fill(high, result) < total)
            {
                high *= 2;
            }

            for (int iteration = 0; iteration < 200; iteration++)
            {
                double middle = 0.5 * (low + high);
                if (Fill(middle, result) < total)
                {
                    low = middle;
                }
                else
                {
                    high = middle;
                }
            }

            Fill(high, result);
            return result;
        }

        double Spill(double level)
        {
            double sum = 0;
            for (int i = 0; i < n; i++)
            {
                result[i] = s[i] > 0 ? max[i] : Math.Clamp(level, min[i], max[i]);
                sum += result[i];
            }

            return sum;
        }

        double lowLevel = 0;
        double highLevel = max.Max() + 1.0;
        for (int iteration = 0; iteration < 200; iteration++)
        {
            double middle = 0.5 * (lowLevel + highLevel);
            if (Spill(middle) < total)
            {
                lowLevel = middle;
            }
            else
            {
                highLevel = middle;
            }
        }

        Spill(highLevel);
        return result;
    }
}
