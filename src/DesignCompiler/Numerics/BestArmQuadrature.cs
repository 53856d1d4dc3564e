namespace DesignCompiler.Numerics;

/// <summary>
/// The P(best) integrator. One set of nodes serves all K integrals: at each node every live arm's density
/// and CDF are evaluated once, and the products over j ≠ i come from prefix and suffix products.
/// </summary>
/// <remarks>
/// <para>
/// The sum over arms of f_i ∏_{j≠i} F_j is the derivative of G = ∏_j F_j, so its integral over a panel
/// [x0, x1] is known exactly: G(x1) − G(x0). Every panel is checked against that and bisected while the
/// rule misses it; this catches integrands narrower than any single posterior (clusters of nearly equal
/// arms) and unresolved singular endpoints alike.
/// </para>
/// <para>
/// The lower half of the range is swept in the distance above the lower bound of the arm that starts it,
/// and the upper half in the distance below the upper bound of the arm that ends it, whenever those bounds
/// are finite. Mass crowding against a bound (a density like (1−x)^(−½) near 1, or one singular at a shifted
/// 0.2) is then resolved, although x itself cannot get closer to such a bound than its rounding allows.
/// </para>
/// </remarks>
internal ref partial struct BestArmQuadrature
{
    /// <summary>Each arm's support is cut where a tail holds this much.</summary>
    internal const double TailMass = 1e-16;

    private const double RoundingUnit = 1.1102230246251565e-16;
    private const int MaxDepth = 40;
    private const int MaxPanels = 100_000;

    // Where a sweep down from an interior bound starts when some arm's support reaches past the bound:
    // the arms bounded there hold no mass this close to it.
    private const double NextToTheBound = 1e-300;

    // A bound on bisections per call, so that no input can make the quadrature run away.
    private const int MaxSplits = 20_000;

    private const int PanelNodes = 20;

    // A panel's Gauss–Legendre nodes and its right end, evaluated together: the end's values are needed for
    // the derivative check and as the next panel's start, and lanes left over by the twenty nodes take it.
    private const int PanelPoints = PanelNodes + 1;

    // Each slot's values take three vector registers of eight: the points and padding.
    private const int PanelStride = 24;

    private enum Coordinate { Position, AboveLowerBound, BelowUpperBound }

    private readonly IReadOnlyList<IMarginal> arms;
    private readonly int k;
    private readonly QuadratureSettings settings;

    // Per group while groups are formed, then per slot: the surviving groups sorted by their upper support end.
    private readonly Span<double> lo, hi, above, below, breaks, suffix, panelSum, total, endPower, endCdf, endUpper;

    // One panel's nodes in the order they are summed (pairs left, right) followed by its right end, and every
    // live slot's density and CDF at them, slot by slot: each arm is evaluated for the whole panel in one call.
    private readonly Span<double> nodes, nodeDensity, nodeCdf, nodeUpper, panelEndUpper;

    // The panel's points and their logarithms for beta arms, per orientation (PrepareSharedPoints), and
    // which of them are ready for the current panel.
    private readonly Span<double> sharedPoints;
    private int sharedReady;
    private readonly Span<int> hashes, order, groupOf, representative, multiplicity, slotOfGroup, slotArm, slotMultiplicity;

    private int slots;       // surviving groups
    private int first;       // the live slots are [first, slots); the others sit at F = 1, f = 0
    private Coordinate coordinate;
    private double origin;   // the bound that the distance coordinates are measured from
    private double expectedMaximumSum;
    private double defectSum;
    private int splits;

    internal BestArmQuadrature(IReadOnlyList<IMarginal> arms, Span<double> doubles, Span<int> ints, QuadratureSettings settings)
    {
        this.arms = arms;
        this.settings = settings;
        k = arms.Count;
        int d = 0, i = 0;
        lo = doubles.Slice(d, k); d += k;
        hi = doubles.Slice(d, k); d += k;
        above = doubles.Slice(d, k); d += k;
        below = doubles.Slice(d, k); d += k;
        breaks = doubles.Slice(d, k); d += k;
        nodes = doubles.Slice(d, PanelPoints); d += PanelPoints;
        nodeUpper = doubles.Slice(d, PanelPoints); d += PanelPoints;
        nodeDensity = doubles.Slice(d, k * PanelStride); d += k * PanelStride;
        nodeCdf = doubles.Slice(d, k * PanelStride); d += k * PanelStride;
        panelEndUpper = doubles.Slice(d, k); d += k;
        sharedPoints = doubles.Slice(d, 12 * PanelPoints); d += 12 * PanelPoints;
        suffix = doubles.Slice(d, (k + 1) * Lanes); d += (k + 1) * Lanes;
        panelSum = doubles.Slice(d, k); d += k;
        total = doubles.Slice(d, k); d += k;
        endPower = doubles.Slice(d, k); d += k;
        endCdf = doubles.Slice(d, k); d += k;
        endUpper = doubles.Slice(d, k);
        hashes = ints.Slice(i, k); i += k;
        order = ints.Slice(i, k); i += k;
        groupOf = ints.Slice(i, k); i += k;
        representative = ints.Slice(i, k); i += k;
        multiplicity = ints.Slice(i, k); i += k;
        slotOfGroup = ints.Slice(i, k); i += k;
        slotArm = ints.Slice(i, k); i += k;
        slotMultiplicity = ints.Slice(i, k);
        slots = 0;
        first = 0;
        coordinate = Coordinate.Position;
        origin = 0;
        expectedMaximumSum = 0;
        defectSum = 0;
        splits = 0;
        sharedReady = 0;
    }

    internal static int DoublesNeeded(int k) => 11 * k + 14 * PanelPoints + 2 * PanelStride * k + (k + 1) * Lanes;

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
        else if (!(end > start))
        {
            // The survivors are points at one double (see ChooseSlots): a tie, shared equally.
            int tied = 0;
            for (int s = 0; s < slots; s++) tied += slotMultiplicity[s];
            for (int s = 0; s < slots; s++) total[s] = 1.0 / tied;
            expectedMaximum = end;
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
        // A cheap screen first: bounds that surely contain each support (closed forms, no quantile search)
        // already show which groups end below where another surely begins. Those cannot be best and would be
        // dropped below anyway; they are spared the exact search, the costly part for many peaked arms.
        double surelyBegins = double.NegativeInfinity;
        for (int g = 0; g < groups; g++)
        {
            if (!MarginalProfile.WideSupport(arms[representative[g]], TailMass, out lo[g], out hi[g])) (lo[g], hi[g]) = (double.NegativeInfinity, double.PositiveInfinity);
            surelyBegins = Math.Max(surelyBegins, lo[g]);
        }
        double start = double.NegativeInfinity;
        for (int g = 0; g < groups; g++)
        {
            if (hi[g] < surelyBegins)
            {
                lo[g] = hi[g] = double.NegativeInfinity;
                continue;
            }
            MarginalProfile.Support(arms[representative[g]], TailMass, out lo[g], out hi[g], out above[g], out below[g]);
            start = Math.Max(start, lo[g]);
        }
        // Survivors, sorted by upper support end; scratch: endPower holds keys, endCdf/endUpper/breaks the
        // group-indexed values read in sorted order before the slot-indexed arrays overwrite them.
        for (int g = 0; g < groups; g++)
        {
            slotOfGroup[g] = -1;
            if (hi[g] > start)
            {
                endPower[slots] = hi[g];
                order[slots] = g;
                slots++;
            }
        }
        if (slots == 0)
        {
            // Every support has collapsed onto at most one double (an sd below the spacing of doubles
            // at the mean, say 1e-9 at 1e9), so no arm ends above where the highest begins. Each arm is a
            // point to double precision; those ending highest are tied for best and are the survivors.
            double top = double.NegativeInfinity;
            for (int g = 0; g < groups; g++) top = Math.Max(top, hi[g]);
            for (int g = 0; g < groups; g++)
            {
                if (hi[g] != top) continue;
                endPower[slots] = hi[g];
                order[slots] = g;
                slots++;
            }
        }
        endPower[..slots].Sort(order[..slots]);
        for (int s = 0; s < slots; s++)
        {
            endCdf[s] = below[order[s]];
            endUpper[s] = above[order[s]];
            breaks[s] = lo[order[s]];
        }
        for (int s = 0; s < slots; s++)
        {
            int g = order[s];
            slotOfGroup[g] = s;
            slotArm[s] = representative[g];
            slotMultiplicity[s] = multiplicity[g];
            hi[s] = endPower[s];
            below[s] = endCdf[s];
            above[s] = endUpper[s];
            lo[s] = breaks[s];
            total[s] = 0;
        }
        OrderTiesByDistance();
        end = hi[slots - 1];
        return start;
    }

    /// <summary>Orders support ends that round onto the same double (next to a bound) by their exact distance below it.</summary>
    private readonly void OrderTiesByDistance()
    {
        for (int s = 1; s < slots; s++)
        {
            for (int t = s; t > 0 && hi[t] == hi[t - 1] && below[t] > below[t - 1]; t--)
            {
                SwapSlots(t, t - 1);
            }
        }
    }

    private readonly void SwapSlots(int a, int b)
    {
        (hi[a], hi[b]) = (hi[b], hi[a]);
        (lo[a], lo[b]) = (lo[b], lo[a]);
        (above[a], above[b]) = (above[b], above[a]);
        (below[a], below[b]) = (below[b], below[a]);
        (slotArm[a], slotArm[b]) = (slotArm[b], slotArm[a]);
        (slotMultiplicity[a], slotMultiplicity[b]) = (slotMultiplicity[b], slotMultiplicity[a]);
        slotOfGroup[groupOf[slotArm[a]]] = a;
        slotOfGroup[groupOf[slotArm[b]]] = b;
    }
}
