namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// Builds a <see cref="SeparatedProblem"/>: standardises the variables, then factors the correlation matrix
/// column by column, each time taking next the remaining variable whose interval, given the expected values of
/// the variables already taken, has the least probability (Genz and Bretz 2009, ch. 4, the prioritisation of
/// Gibson, Glasbey and Elston 1994 — citation details from memory). The tightest constraints come first,
/// where the lattice's first coordinates are best, and the integrand varies least in the later ones.
/// </summary>
internal static class PrioritisedCholesky
{
    /// <summary>
    /// A conditional variance at or below this (the variable's own is 1 after standardising) counts as zero:
    /// the variable is then taken as an exact linear function of those before it, neglecting a spread of at most
    /// 1e-6 of its own standard deviation. Rounding in a factor of a genuinely singular matrix is far below it.
    /// </summary>
    internal const double SingularVariance = 1e-12;

    /// <summary>Coefficients below this on a singular row are rounding noise, not a dependence.</summary>
    private const double NegligibleCoefficient = 1e-9;

    /// <summary>A conditional variance below −this means the matrix is not positive semidefinite.</summary>
    private const double IndefiniteVariance = 1e-8;

    /// <summary>
    /// Variables with variance at most this fraction of the largest are constants (0, since X is centred):
    /// their constraint holds or fails outright.
    /// </summary>
    internal const double ConstantVariance = 1e-28;

    /// <param name="covariance">m × m, symmetric positive semidefinite (checked as it is factored).</param>
    /// <param name="lower">limits of the centred variables; −∞ allowed.</param>
    /// <param name="upper">limits; +∞ allowed.</param>
    /// <param name="momentCovariance">Cov(θ, X_j) for the free variable θ, or empty for none.</param>
    public static SeparatedProblem Factor(double[,] covariance, ReadOnlySpan<double> lower, ReadOnlySpan<double> upper, ReadOnlySpan<double> momentCovariance)
    {
        int m = lower.Length;
        bool withMoment = !momentCovariance.IsEmpty;
        double largest = 0;
        for (int j = 0; j < m; j++) largest = Math.Max(largest, covariance[j, j]);

        // Constants decide feasibility at once; the rest are standardised.
        var kept = new List<int>(m);
        bool feasible = true;
        for (int j = 0; j < m; j++)
        {
            if (covariance[j, j] > ConstantVariance * largest) kept.Add(j);
            else if (!(lower[j] <= 0 && 0 <= upper[j])) feasible = false;
        }
        if (!feasible) return SeparatedProblem.Certain(false);
        int n = kept.Count;
        if (n == 0) return SeparatedProblem.Certain(true);

        var sd = new double[n];
        var lo = new double[n];
        var hi = new double[n];
        var thetaCov = new double[n];
        for (int i = 0; i < n; i++)
        {
            int j = kept[i];
            sd[i] = Math.Sqrt(covariance[j, j]);
            lo[i] = lower[j] / sd[i];
            hi[i] = upper[j] / sd[i];
            if (withMoment) thetaCov[i] = momentCovariance[j] / sd[i];
        }
        var r = new double[n, n];
        for (int i = 0; i < n; i++)
        {
            for (int l = 0; l < n; l++) r[i, l] = i == l ? 1.0 : covariance[kept[i], kept[l]] / (sd[i] * sd[l]);
        }

        var factor = new double[n, n];
        var column = new int[n];
        Array.Fill(column, -1);
        var own = new int[n];
        var expected = new double[n];
        int rank = 0;
        for (; rank < n; rank++)
        {
            int best = -1;
            double bestMass = double.PositiveInfinity, bestVariance = 0;
            for (int i = 0; i < n; i++)
            {
                if (column[i] >= 0) continue;
                double variance = 1.0, shift = 0;
                for (int l = 0; l < rank; l++)
                {
                    variance -= factor[i, l] * factor[i, l];
                    shift += factor[i, l] * expected[l];
                }
                if (variance < -IndefiniteVariance) throw new ArgumentException("The scale matrix is not positive semidefinite.");
                if (variance <= SingularVariance) continue;
                double root = Math.Sqrt(variance);
                double mass = NormalTail.Between((lo[i] - shift) / root, (hi[i] - shift) / root);
                if (best < 0 || mass < bestMass)
                {
                    best = i;
                    bestMass = mass;
                    bestVariance = variance;
                }
            }
            if (best < 0) break;

            double pivot = Math.Sqrt(bestVariance);
            factor[best, rank] = pivot;
            column[best] = rank;
            own[rank] = best;
            for (int i = 0; i < n; i++)
            {
                if (column[i] >= 0) continue;
                double sum = r[i, best];
                for (int l = 0; l < rank; l++) sum -= factor[i, l] * factor[best, l];
                factor[i, rank] = sum / pivot;
            }
            double centre = 0;
            for (int l = 0; l < rank; l++) centre += factor[best, l] * expected[l];
            expected[rank] = TruncatedNormal.Mean((lo[best] - centre) / pivot, (hi[best] - centre) / pivot);
        }

        // Each singular row bounds the last column it depends on.
        var attached = new List<int>[rank];
        for (int c = 0; c < rank; c++) attached[c] = [own[c]];
        for (int i = 0; i < n; i++)
        {
            if (column[i] >= 0) continue;
            int last = -1;
            for (int l = 0; l < rank; l++)
            {
                if (Math.Abs(factor[i, l]) > NegligibleCoefficient) last = l;
            }
            // Standardised rows have unit variance, so a singular one always loads on some column.
            if (last < 0) throw new InvalidOperationException("A singular row has no column to attach to.");
            attached[last].Add(i);
        }

        var start = new int[rank + 1];
        var coefficients = new double[n][];
        var rowLower = new double[n];
        var rowUpper = new double[n];
        int next = 0;
        for (int c = 0; c < rank; c++)
        {
            start[c] = next;
            foreach (int i in attached[c])
            {
                var row = new double[c + 1];
                for (int l = 0; l <= c; l++) row[l] = factor[i, l];
                coefficients[next] = row;
                rowLower[next] = lo[i];
                rowUpper[next] = hi[i];
                next++;
            }
        }
        start[rank] = next;

        double[]? moment = null;
        if (withMoment)
        {
            moment = new double[rank];
            for (int c = 0; c < rank; c++)
            {
                int i = own[c];
                double sum = thetaCov[i];
                for (int l = 0; l < c; l++) sum -= moment[l] * factor[i, l];
                moment[c] = sum / factor[i, c];
            }
        }
        return new SeparatedProblem(rank, start, coefficients, rowLower, rowUpper, moment);
    }
}
