namespace DesignCompiler.Numerics;

/// <summary>
/// The P(best) integrator. One set of nodes serves all K integrals: at each node every live arm's density
/// and CDF are evaluated once, and the products over j ≠ i come from prefix and suffix products.
/// </summary>
/// <remarks>
/// The sum over arms of f_i ∏_{j≠i} F_j is the derivative of G = ∏_j F_j, so its integral over a panel
/// [x0, x1] is known exactly: G(x1) − G(x0). Every panel is checked against that and bisected while the
/// rule misses it; this catches integrands narrower than any single posterior (clusters of nearly equal
/// arms) and unresolved singular endpoints alike.
/// </remarks>
internal ref struct BestArmQuadrature
{
    /// <summary>Each arm's support is cut where a tail holds this much.</summary>
    internal const double TailMass = 1e-16;

    private const int MaxDepth = 40;
    private const int MaxPanels = 100_000;

    private readonly IReadOnlyList<IMarginal> arms;
    private readonly int k;
    private readonly QuadratureSettings settings;

    // Per group, indexed by slot once the surviving groups are sorted by their upper support end.
    private readonly Span<double> lo, hi, density, cdf, power, suffix, panelSum, total, endPower, endCdf, endUpper;
    private readonly Span<int> hashes, order, groupOf, representative, multiplicity, slotOfGroup, slotArm, slotMultiplicity;

    private int slots;      // surviving groups
    private int first;      // slots below this have left the integration range (F = 1, f = 0 from here on)
    private double expectedMaximumSum;
    private double defectSum;

    internal BestArmQuadrature(IReadOnlyList<IMarginal> arms, Span<double> doubles, Span<int> ints, QuadratureSettings settings)
    {
        this.arms = arms;
        this.settings = settings;
        k = arms.Count;
        int d = 0, i = 0;
        lo = doubles.Slice(d, k); d += k;
        hi = doubles.Slice(d, k); d += k;
        density = doubles.Slice(d, k); d += k;
        cdf = doubles.Slice(d, k); d += k;
        power = doubles.Slice(d, k); d += k;
        suffix = doubles.Slice(d, k + 1); d += k + 1;
        panelSum = doubles.Slice(d, k); d += k;
        total = doubles.Slice(d, k); d += k;
        endPower = doubles.Slice(d, k); d += k;
        endCdf = doubles.Slice(d, k); d += k;
        endUpper = doubles.Slice(d, k); d += k;
        hashes = ints.Slice(i, k); i += k;
        order = ints.Slice(i, k); i += k;
        groupOf = ints.Slice(i, k); i += k;
        representative = ints.Slice(i, k); i += k;
        multiplicity = ints.Slice(i, k); i += k;
        slotOfGroup = ints.Slice(i, k); i += k;
        slotArm = ints.Slice(i, k); i += k;
        slotMultiplicity = ints.Slice(i, k); i += k;
        slots = 0;
        first = 0;
        expectedMaximumSum = 0;
        defectSum = 0;
    }

    internal static int DoublesNeeded(int k) => 11 * k + 1;

    internal static int IntsNeeded(int k) => 8 * k;

    internal double Run(Span<double> probabilities, Span<double> expectedLoss, out double expectedMaximum)
    {
        int groups = ArmGroups.Build(arms, hashes, order, groupOf, representative, multiplicity);
        double start = ChooseSlots(groups, out double end);
        double error;
        if (slots == 1 && slotMultiplicity[0] == 1)
        {
            // One arm is best with probability 1 − O(1e-16); the rest were dropped.
            total[0] = 1.0;
            expectedMaximum = arms[slotArm[0]].Mean;
            error = 2.0 * k * TailMass;
        }
        else
        {
            expectedMaximum = Integrate(start, end, out error);
        }
        for (int i = 0; i < k; i++)
        {
            int slot = slotOfGroup[groupOf[i]];
            probabilities[i] = slot < 0 ? 0.0 : Math.Clamp(total[slot], 0.0, 1.0);
            expectedLoss[i] = Math.Max(0.0, expectedMaximum - arms[i].Mean);
        }
        return error;
    }

    /// <summary>
    /// Finds each group's support, drops groups that end below where another begins (they cannot be best),
    /// and orders the rest by where they end. Returns the integration range [start, end].
    /// </summary>
    private double ChooseSlots(int groups, out double end)
    {
        double start = double.NegativeInfinity;
        end = double.NegativeInfinity;
        for (int g = 0; g < groups; g++)
        {
            MarginalProfile.Support(arms[representative[g]], TailMass, out lo[g], out hi[g]);
            start = Math.Max(start, lo[g]);
        }
        for (int g = 0; g < groups; g++)
        {
            if (hi[g] > start)
            {
                endPower[slots] = hi[g];   // sort keys, reused as scratch
                order[slots] = g;
                slots++;
            }
            slotOfGroup[g] = -1;
        }
        endPower[..slots].Sort(order[..slots]);
        for (int s = 0; s < slots; s++)
        {
            int g = order[s];
            slotOfGroup[g] = s;
            slotArm[s] = representative[g];
            slotMultiplicity[s] = multiplicity[g];
            hi[s] = endPower[s];
            total[s] = 0;
        }
        end = hi[slots - 1];
        return start;
    }

    private double Integrate(double start, double end, out double error)
    {
        double x0 = start;
        double g0 = EvaluateProduct(x0, store: true);
        double lowerEndMass = g0;
        int panels = 0;
        bool truncated = false;
        while (x0 < end)
        {
            while (first < slots && hi[first] <= x0) first++;
            if (first == slots) break;
            g0 = 1.0;
            for (int s = first; s < slots; s++) g0 *= endPower[s];
            // Past this point the remaining integrand mass is below a rounding error of 1.
            if (1.0 - g0 <= 1e-17) break;
            if (++panels > MaxPanels)
            {
                truncated = true;
                break;
            }
            double x1 = NextPanelEnd(x0);
            double g1 = EvaluateProduct(x1, store: false);
            IntegratePanel(x0, g0, x1, g1, 0);
            EvaluateProduct(x1, store: true);
            x0 = x1;
        }

        // Mass beyond the last point, to first order: arm s above x0 while every other arm is below it.
        double product = 1.0;
        for (int s = first; s < slots; s++) product *= endPower[s];
        for (int s = first; s < slots; s++)
        {
            if (endUpper[s] == 0) continue;
            double others = 1.0;
            for (int t = first; t < slots; t++) if (t != s) others *= endPower[t];
            int m = slotMultiplicity[s];
            total[s] += endUpper[s] * (m == 1 ? 1.0 : Math.Pow(endCdf[s], m - 1)) * others;
        }
        // E[max] of the maximum clamped to [start, x0]; the clamped-off tails are O(1e-16) for light tails.
        double expectedMaximum = expectedMaximumSum + start * lowerEndMass + x0 * (1.0 - product);

        double sum = 0;
        for (int s = 0; s < slots; s++) sum += slotMultiplicity[s] * total[s];
        if (!(sum > 0) || !double.IsFinite(sum) || !double.IsFinite(expectedMaximum))
        {
            throw new InvalidOperationException("A marginal returned a non-finite density or probability.");
        }
        for (int s = 0; s < slots; s++) total[s] /= sum;
        error = defectSum + Math.Abs(sum - 1.0) + 2.0 * k * TailMass + (truncated ? 1.0 - product : 0.0);
        return expectedMaximum;
    }

    // The panel follows the narrowest live arm at x0 and stops where an arm leaves the range.
    private readonly double NextPanelEnd(double x0)
    {
        double width = double.PositiveInfinity;
        for (int s = first; s < slots; s++)
        {
            width = Math.Min(width, MarginalProfile.PanelWidth(arms[slotArm[s]], x0, forward: true));
        }
        width *= settings.WidthScale;
        double x1 = x0 + width;
        double stop = hi[first];
        // No sliver panel just before a breakpoint: stretch to it instead.
        if (!(x1 < stop - 0.25 * width)) x1 = stop;
        if (!(x1 > x0)) x1 = Math.BitIncrement(x0);
        return x1;
    }

    private void IntegratePanel(double x0, double g0, double x1, double g1, int depth)
    {
        double centre = 0.5 * (x0 + x1), half = 0.5 * (x1 - x0);
        for (int s = first; s < slots; s++) panelSum[s] = 0;
        double derivativeSum = 0, momentSum = 0;
        var abscissas = GaussLegendre20.Abscissas;
        var weights = GaussLegendre20.Weights;
        for (int n = 0; n < abscissas.Length; n++)
        {
            double w = half * weights[n], offset = half * abscissas[n];
            double left = centre - offset, right = centre + offset;
            double atLeft = AccumulateNode(left, w), atRight = AccumulateNode(right, w);
            derivativeSum += w * (atLeft + atRight);
            momentSum += w * (left * atLeft + right * atRight);
        }
        double defect = Math.Abs(derivativeSum - (g1 - g0));
        bool resolved = defect <= settings.PanelTolerance;
        bool unsplittable = depth >= MaxDepth || !(x0 < centre && centre < x1);
        if (resolved || unsplittable)
        {
            for (int s = first; s < slots; s++) total[s] += panelSum[s];
            expectedMaximumSum += momentSum;
            defectSum += defect;
            return;
        }
        double gm = EvaluateProduct(centre, store: false);
        IntegratePanel(x0, g0, centre, gm, depth + 1);
        IntegratePanel(centre, gm, x1, g1, depth + 1);
    }

    /// <summary>
    /// Adds w · f_s F_s^(m−1) ∏_{t≠s} F_t^(m_t) to each live slot's panel sum and returns the node's
    /// Σ_s m_s f_s F_s^(m−1) ∏_{t≠s} F_t^(m_t) = G′(x).
    /// </summary>
    private readonly double AccumulateNode(double x, double w)
    {
        for (int s = first; s < slots; s++)
        {
            MarginalProfile.Evaluate(arms[slotArm[s]], x, out density[s], out cdf[s], out _);
            int m = slotMultiplicity[s];
            power[s] = m == 1 ? cdf[s] : Math.Pow(cdf[s], m);
        }
        suffix[slots] = 1.0;
        for (int s = slots - 1; s >= first; s--) suffix[s] = suffix[s + 1] * power[s];
        double prefix = 1.0, derivative = 0.0;
        for (int s = first; s < slots; s++)
        {
            int m = slotMultiplicity[s];
            double own = m == 1 ? 1.0 : Math.Pow(cdf[s], m - 1);
            double integrand = density[s] * own * prefix * suffix[s + 1];
            panelSum[s] += w * integrand;
            derivative += m * integrand;
            prefix *= power[s];
        }
        return derivative;
    }

    /// <summary>G(x) = ∏ F_s(x)^(m_s) over the live slots; optionally kept as the start of the next panel.</summary>
    private readonly double EvaluateProduct(double x, bool store)
    {
        double product = 1.0;
        for (int s = first; s < slots; s++)
        {
            MarginalProfile.Evaluate(arms[slotArm[s]], x, out _, out double f, out double upper);
            int m = slotMultiplicity[s];
            double p = m == 1 ? f : Math.Pow(f, m);
            product *= p;
            if (store)
            {
                endPower[s] = p;
                endCdf[s] = f;
                endUpper[s] = upper;
            }
        }
        return product;
    }
}
