namespace DesignCompiler.Numerics;

/// <summary>The sweeps across the integration range, in position or in distance from a bound.</summary>
internal ref partial struct BestArmQuadrature
{
    /// <summary>
    /// Integrates over [start, end] in segments that end at every arm's finite upper bound inside the range,
    /// where a density may jump to 0 or be singular. Each segment's lower half is swept upwards in x (in the
    /// distance above the lower bound of the arm that starts the range, for the first one) and its upper
    /// half downwards in the distance below the bound that ends it, if that bound is finite. The last
    /// segment is swept upwards to its end in one go when no arm's support comes near that bound
    /// (<see cref="CrowdsBound"/>): then positions keep every digit the distances would, and one sweep needs
    /// fewer panels than two halves that each end at the middle.
    /// </summary>
    private double Integrate(double start, double end, out double error)
    {
        int panels = 0;
        bool truncated = false;
        int boundCount = 0;
        for (int s = 0; s < slots; s++)
        {
            double u = arms[slotArm[s]].UpperBound;
            if (u > start && u < end) breaks[boundCount++] = u;
        }
        breaks[..boundCount].Sort();

        int starter = 0;
        for (int s = 1; s < slots; s++) if (lo[s] > lo[starter]) starter = s;
        double lowerBound = arms[slotArm[starter]].LowerBound;
        double t0;
        if (double.IsFinite(lowerBound))
        {
            SetCoordinate(Coordinate.AboveLowerBound, lowerBound);
            t0 = double.NegativeInfinity;
            for (int s = 0; s < slots; s++)
            {
                t0 = Math.Max(t0, arms[slotArm[s]].LowerBound == lowerBound ? above[s] : lo[s] - lowerBound);
            }
        }
        else
        {
            SetCoordinate(Coordinate.Position, 0.0);
            t0 = start;
        }
        double bottom = Position(t0);
        double lowerEndMass = StartIncreasingSweep(t0);

        double segmentStart = start, top = end, topProduct = 1.0;
        for (int j = 0; j <= boundCount; j++)
        {
            if (j > 0 && breaks[j] == breaks[j - 1] && j < boundCount) continue;
            bool last = j == boundCount;
            double bound = last ? arms[slotArm[slots - 1]].UpperBound : breaks[j];
            double segmentEnd = last ? end : bound;
            double middle = segmentStart + 0.5 * (segmentEnd - segmentStart);
            if (j > 0)
            {
                SetCoordinate(Coordinate.Position, 0.0);
                StartIncreasingSweep(segmentStart);
                t0 = segmentStart;
            }
            double tMiddle = ToCoordinate(middle);
            bool boundSweep = double.IsFinite(bound) && (!last || CrowdsBound(bound));
            double t = IncreasingSweep(t0, boundSweep ? tMiddle : ToCoordinate(segmentEnd), ref panels, ref truncated);
            if (boundSweep)
            {
                SetCoordinate(Coordinate.BelowUpperBound, bound);
                double tTop = DecreasingSweep(bound - middle, last, ref panels, ref truncated, out double product);
                if (last)
                {
                    top = Position(tTop);
                    topProduct = product;
                }
            }
            else
            {
                top = Position(t);
                topProduct = AddMassBeyondTop();
            }
            segmentStart = segmentEnd;
        }

        // E[max] of the maximum clamped to [bottom, top]; the clamped-off tails hold O(1e-16).
        double expectedMaximum = expectedMaximumSum + bottom * lowerEndMass + top * (1.0 - topProduct);

        double sum = 0;
        for (int s = 0; s < slots; s++) sum += slotMultiplicity[s] * total[s];
        if (!(sum > 0) || !double.IsFinite(sum) || !double.IsFinite(expectedMaximum))
        {
            throw new InvalidOperationException("A marginal returned a non-finite density or probability.");
        }
        for (int s = 0; s < slots; s++) total[s] /= sum;
        error = defectSum + Math.Abs(sum - 1.0) + 2.0 * k * TailMass + (truncated ? 1.0 - topProduct : 0.0);
        return expectedMaximum;
    }

    // An arm bounded at the top of the range crowds it when its support ends within this share of the
    // bound's magnitude (or of its own sd, for bounds near 0), where x = bound − t starts to lose t's digits.
    private const double NearBoundShare = 0.05;

    /// <summary>Whether some arm bounded at <paramref name="bound"/> has its support end too close to it for positions.</summary>
    private readonly bool CrowdsBound(double bound)
    {
        for (int s = 0; s < slots; s++)
        {
            IMarginal arm = arms[slotArm[s]];
            if (arm.UpperBound == bound && !(below[s] >= NearBoundShare * Math.Max(Math.Abs(bound), arm.StdDev))) return true;
        }
        return false;
    }

    private void SetCoordinate(Coordinate c, double bound)
    {
        coordinate = c;
        origin = bound;
    }

    private readonly double Position(double t) => coordinate switch
    {
        Coordinate.AboveLowerBound => origin + t,
        Coordinate.BelowUpperBound => origin - t,
        _ => t,
    };

    private readonly double ToCoordinate(double x) => coordinate switch
    {
        Coordinate.AboveLowerBound => x - origin,
        Coordinate.BelowUpperBound => origin - x,
        _ => x,
    };

    /// <summary>Activates the slots still live at t0 and keeps their values there; returns G(t0).</summary>
    private double StartIncreasingSweep(double t0)
    {
        first = 0;
        double x0 = Position(t0);
        while (first < slots && hi[first] <= x0) first++;
        return first < slots ? EvaluateProduct(t0, store: true) : 1.0;
    }

    /// <summary>Panels in increasing x from t0 to tEnd, arms leaving as x passes their upper support end.</summary>
    private double IncreasingSweep(double t0, double tEnd, ref int panels, ref bool truncated)
    {
        while (t0 < tEnd)
        {
            double x = Position(t0);
            while (first < slots && hi[first] <= x) first++;
            if (first == slots) break;
            double g0 = 1.0;
            for (int s = first; s < slots; s++) g0 *= endPower[s];
            // Past this point the remaining integrand mass is below a rounding error of 1.
            if (1.0 - g0 <= 1e-17) break;
            if (++panels > MaxPanels)
            {
                truncated = true;
                break;
            }
            double width = double.PositiveInfinity;
            for (int s = first; s < slots; s++) width = Math.Min(width, PanelWidth(s, t0));
            // An arm whose support ends inside this panel stays in it; there it contributes F ≈ 1 and f ≈ 0,
            // which is cheaper than cutting the panel at every arm's end.
            double t1 = PanelEnd(t0, settings.WidthScale * width, tEnd);
            // The end values are kept for the next panel's start; g0 has already been taken from the old ones.
            IntegratePanel(t0, g0, t1, 0, keepEnd: true);
            t0 = t1;
        }
        return t0;
    }

    /// <summary>
    /// Panels in t = bound − x, from next to the bound down to x = bound − tEnd, arms joining as t passes
    /// the distance of their upper support end below it. Returns the t where it started.
    /// </summary>
    /// <param name="isTop">whether this bound ends the whole range, so that the mass above it is added.</param>
    private double DecreasingSweep(double tEnd, bool isTop, ref int panels, ref bool truncated, out double topProduct)
    {
        // Slots are in ascending order of their upper ends, so join distances descend along them. Arms whose
        // support reaches past an interior bound are live right next to it.
        first = slots;
        double t0 = double.PositiveInfinity;
        for (int s = 0; s < slots; s++)
        {
            if (arms[slotArm[s]].UpperBound == origin) t0 = Math.Min(t0, below[s]);
            else if (hi[s] > origin) t0 = Math.Min(t0, NextToTheBound);
        }
        while (first > 0 && JoinDistance(first - 1) <= t0) first--;
        topProduct = 1.0;
        if (first == slots) return t0;
        EvaluateProduct(t0, store: true);
        if (isTop) topProduct = AddMassBeyondTop();
        double start = t0;
        bool joined = false;
        while (t0 < tEnd)
        {
            // The slots live in the last panel hold their values at t0 from its end.
            int evaluated = first;
            while (first > 0 && JoinDistance(first - 1) <= t0)
            {
                first--;
                joined = true;
            }
            if (++panels > MaxPanels)
            {
                truncated = true;
                break;
            }
            double width = double.PositiveInfinity;
            for (int s = first; s < slots; s++) width = Math.Min(width, PanelWidth(s, t0));
            double t1 = PanelEnd(t0, settings.WidthScale * width, tEnd);
            // Arms whose support ends (seen from the bound) inside this panel join it from its start, unless
            // they need narrower panels from where they begin (a singular density): then the panel stops there.
            while (first > 0 && JoinDistance(first - 1) < t1)
            {
                double join = JoinDistance(first - 1);
                double joinWidth = PanelWidth(first - 1, Math.Max(join, t0));
                if (join > t0 && settings.WidthScale * joinWidth < t1 - t0)
                {
                    t1 = join;
                    break;
                }
                first--;
                joined = true;
                width = Math.Min(width, joinWidth);
                t1 = PanelEnd(t0, settings.WidthScale * width, tEnd);
            }
            if (joined)
            {
                // Only the arms that joined need their values at t0; one at a time they cost a full
                // evaluation each, where a panel shares its work between twenty-one points.
                StoreValues(first, evaluated, t0);
                joined = false;
            }
            double g0 = 1.0;
            for (int s = first; s < slots; s++) g0 *= endPower[s];
            IntegratePanel(t0, g0, t1, 0, keepEnd: true);
            t0 = t1;
        }
        return start;
    }

    // How far below the current bound a slot's support ends: exactly, for arms bounded there; negative for
    // arms whose support reaches past it (they are live from the start).
    private readonly double JoinDistance(int slot) =>
        arms[slotArm[slot]].UpperBound == origin ? below[slot] : origin - hi[slot];

    /// <summary>
    /// Mass above the top of the range, to first order: one arm above it while every other arm is below.
    /// Uses the values kept at the top; returns G there.
    /// </summary>
    private readonly double AddMassBeyondTop()
    {
        double product = 1.0;
        for (int s = first; s < slots; s++) product *= endPower[s];
        for (int s = first; s < slots; s++)
        {
            if (endUpper[s] == 0) continue;
            double others = 1.0;
            for (int t = first; t < slots; t++)
            {
                if (t != s) others *= endPower[t];
            }
            int m = slotMultiplicity[s];
            total[s] += endUpper[s] * (m == 1 ? 1.0 : RepeatableMath.Power(endCdf[s], m - 1)) * others;
        }
        return product;
    }

    // No sliver panel just before a breakpoint: stretch to it instead.
    private static double PanelEnd(double t0, double width, double stop)
    {
        double t1 = t0 + width;
        if (!(t1 < stop - 0.25 * width)) t1 = stop;
        if (!(t1 > t0)) t1 = Math.BitIncrement(t0);
        return t1;
    }
}
