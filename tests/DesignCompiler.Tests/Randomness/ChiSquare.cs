namespace DesignCompiler.Tests.Randomness;

/// <summary>Pearson's chi-square goodness-of-fit test (common practice).</summary>
internal static class ChiSquare
{
    /// <summary>P(χ²_df ≥ statistic) = Q(df/2, statistic/2).</summary>
    public static double UpperTail(int degreesOfFreedom, double statistic) =>
        SpecialFunctions.UpperRegularizedGamma(0.5 * degreesOfFreedom, 0.5 * statistic);

    public static double Statistic(ReadOnlySpan<long> observed, ReadOnlySpan<double> expected)
    {
        double statistic = 0.0;
        for (int i = 0; i < observed.Length; i++)
        {
            double difference = observed[i] - expected[i];
            statistic += difference * difference / expected[i];
        }

        return statistic;
    }

    /// <summary>The p-value of equal-probability cells.</summary>
    public static double UniformPValue(ReadOnlySpan<long> observed)
    {
        long total = 0;
        foreach (long count in observed)
        {
            total += count;
        }

        var expected = new double[observed.Length];
        Array.Fill(expected, (double)total / observed.Length);
        return UpperTail(observed.Length - 1, Statistic(observed, expected));
    }

    /// <summary>
    /// Goodness of fit of integer samples to a probability mass function, pooling the tails
    /// and any run of cells until every pooled cell expects at least 5 (Cochran's rule, common
    /// practice). Returns the p-value and the degrees of freedom used.
    /// </summary>
    public static (double PValue, int DegreesOfFreedom) FitPValue(int[] samples, Func<int, double> mass, int low, int high)
    {
        int n = samples.Length;
        var observedByValue = new long[high - low + 1];
        long below = 0;
        long above = 0;
        foreach (int sample in samples)
        {
            if (sample < low)
            {
                below++;
            }
            else if (sample > high)
            {
                above++;
            }
            else
            {
                observedByValue[sample - low]++;
            }
        }

        var observed = new List<long>();
        var expected = new List<double>();
        double massInside = 0.0;
        long pendingObserved = below;
        double pendingExpected = 0.0;
        for (int k = low; k <= high; k++)
        {
            massInside += mass(k);
        }

        // Everything outside [low, high] goes to the first and last pooled cells.
        double tailMass = Math.Max(0.0, 1.0 - massInside);
        pendingExpected = tailMass / 2 * n;
        for (int k = low; k <= high; k++)
        {
            pendingObserved += observedByValue[k - low];
            pendingExpected += mass(k) * n;
            if (pendingExpected >= 5.0)
            {
                observed.Add(pendingObserved);
                expected.Add(pendingExpected);
                pendingObserved = 0;
                pendingExpected = 0.0;
            }
        }

        pendingObserved += above;
        pendingExpected += tailMass / 2 * n;
        observed[^1] += pendingObserved;
        expected[^1] += pendingExpected;
        int degreesOfFreedom = observed.Count - 1;
        double statistic = Statistic(observed.ToArray(), expected.ToArray());
        return (UpperTail(degreesOfFreedom, statistic), degreesOfFreedom);
    }
}
