using System.Runtime.CompilerServices;

namespace DesignCompiler.Numerics;

/// <summary>One panel: the shared Gauss–Legendre nodes, the derivative check and its bisection.</summary>
internal ref partial struct BestArmQuadrature
{
    /// <summary>
    /// Integrates one panel, bisecting it while its derivative check fails, and returns G at its right end,
    /// which is evaluated with the nodes; <paramref name="keepEnd"/> keeps the values there for the next panel.
    /// </summary>
    // Kept out of tiered compilation: a simulation spends its first seconds here, and tiering would run that
    // time in unoptimised code and then compile it again; there is nothing for profile guidance to learn.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private double IntegratePanel(double t0, double g0, double t1, int depth, bool keepEnd, double parentDefect = double.PositiveInfinity)
    {
        double centre = 0.5 * (t0 + t1), half = 0.5 * (t1 - t0);
        for (int s = first; s < slots; s++) panelSum[s] = 0;
        var abscissas = GaussLegendre20.Abscissas.AsSpan();
        for (int n = 0; n < abscissas.Length; n++)
        {
            double offset = half * abscissas[n];
            nodes[2 * n] = centre - offset;
            nodes[2 * n + 1] = centre + offset;
        }
        nodes[PanelNodes] = t1;
        sharedReady = 0;
        for (int s = first; s < slots; s++)
        {
            EvaluateNodes(s);
            panelEndUpper[s] = nodeUpper[PanelNodes];
        }
        double g1 = PanelEndProduct(keepEnd);
        AccumulatePanel(half, out double derivativeSum, out double momentSum);
        // Below an upper bound G decreases with t, so the panel integral is G(t0) − G(t1) there.
        double expected = coordinate == Coordinate.BelowUpperBound ? g0 - g1 : g1 - g0;
        double defect = Math.Abs(derivativeSum - expected);
        // Each CDF carries a rounding error of an ulp or two, so G does too, K-fold; asking for more than
        // that would only bisect rounding noise.
        double noise = 16.0 * RoundingUnit * (slots - first) * Math.Max(g0, g1);
        bool resolved = defect <= Math.Max(settings.PanelTolerance, noise);
        // A quadrature error shrinks by orders of magnitude when the panel is halved; a defect that does not
        // is the arms' own rounding (a CDF a few ulps off its density), which bisection cannot remove.
        bool improving = defect < 0.25 * parentDefect;
        bool splittable = depth < MaxDepth && t0 < centre && centre < t1 && splits < MaxSplits;
        if (!resolved && improving && splittable)
        {
            splits++;
            double gm = IntegratePanel(t0, g0, centre, depth + 1, keepEnd: false, defect);
            IntegratePanel(centre, gm, t1, depth + 1, keepEnd: false, defect);
            return g1;
        }
        for (int s = first; s < slots; s++) total[s] += panelSum[s];
        expectedMaximumSum += momentSum;
        defectSum += defect;
        return g1;
    }

    /// <summary>G at the panel's right end from the values evaluated with its nodes, as <see cref="EvaluateProduct"/> forms it.</summary>
    private readonly double PanelEndProduct(bool keep)
    {
        double product = 1.0;
        for (int s = first; s < slots; s++)
        {
            double f = nodeCdf[s * PanelStride + PanelNodes];
            int m = slotMultiplicity[s];
            double p = m == 1 ? f : RepeatableMath.Power(f, m);
            product *= p;
            if (keep)
            {
                endPower[s] = p;
                endCdf[s] = f;
                endUpper[s] = panelEndUpper[s];
            }
        }
        return product;
    }

    /// <summary>One slot's density and CDF at all of the panel's nodes and its right end, as <see cref="EvaluateArm"/> gives them one by one.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    [SkipLocalsInit]
    private void EvaluateNodes(int slot)
    {
        IMarginal arm = arms[slotArm[slot]];
        var f = nodeDensity.Slice(slot * PanelStride, PanelPoints);
        var cdfValues = nodeCdf.Slice(slot * PanelStride, PanelPoints);
        if (PanelBeta(arm) is { } beta)
        {
            // Beta arms see the same (x, 1 − x) pairs and share their logarithms; see SharedPoints.
            int orientation = coordinate switch
            {
                Coordinate.AboveLowerBound when arm.LowerBound == origin => NearLower,
                Coordinate.BelowUpperBound when arm.UpperBound == origin => NearUpper,
                _ => AtPosition,
            };
            bool logs = beta.UsesSharedLogs;
            PrepareSharedPoints(orientation, logs);
            int at = orientation * 4 * PanelPoints;
            beta.EvaluatePanel(
                sharedPoints.Slice(at, PanelPoints), sharedPoints.Slice(at + PanelPoints, PanelPoints),
                logs ? sharedPoints.Slice(at + 2 * PanelPoints, PanelPoints) : default,
                logs ? sharedPoints.Slice(at + 3 * PanelPoints, PanelPoints) : default,
                f, cdfValues, nodeUpper);
            return;
        }
        switch (coordinate)
        {
            case Coordinate.AboveLowerBound when arm.LowerBound == origin:
                MarginalProfile.EvaluateNearBoundMany(arm, upper: false, nodes, f, cdfValues, nodeUpper);
                break;
            case Coordinate.BelowUpperBound when arm.UpperBound == origin:
                MarginalProfile.EvaluateNearBoundMany(arm, upper: true, nodes, f, cdfValues, nodeUpper);
                break;
            default:
                Span<double> x = stackalloc double[PanelPoints];
                for (int j = 0; j < PanelPoints; j++) x[j] = Position(nodes[j]);
                MarginalProfile.EvaluateMany(arm, x, f, cdfValues, nodeUpper);
                break;
        }
    }

    private const int AtPosition = 0, NearLower = 1, NearUpper = 2;

    // A beta marginal, or one valued as measured: those take the shared-point path.
    private static BetaMarginal? PanelBeta(IMarginal arm) =>
        arm as BetaMarginal ?? (arm is AffineMarginal { IsIdentity: true, Inner: BetaMarginal inner } ? inner : null);

    /// <summary>
    /// The panel's points as (x, y = 1 − x) for one orientation (at the position, or at the distance from a
    /// lower or upper bound), and once some arm needs them their logarithms: computed once per panel and
    /// orientation, where every beta arm would otherwise compute the same logarithms for itself.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void PrepareSharedPoints(int orientation, bool logs)
    {
        int at = orientation * 4 * PanelPoints;
        var x = sharedPoints.Slice(at, PanelPoints);
        var y = sharedPoints.Slice(at + PanelPoints, PanelPoints);
        if ((sharedReady & (1 << orientation)) == 0)
        {
            for (int j = 0; j < PanelPoints; j++)
            {
                double t = nodes[j];
                (x[j], y[j]) = orientation switch
                {
                    NearLower => (t, 1.0 - t),
                    NearUpper => (1.0 - t, t),
                    _ => (Position(t), 1.0 - Position(t)),
                };
            }
            sharedReady |= 1 << orientation;
        }
        if (logs && (sharedReady & (8 << orientation)) == 0)
        {
            BetaKernel.LogsMany(x, y, sharedPoints.Slice(at + 2 * PanelPoints, PanelPoints), sharedPoints.Slice(at + 3 * PanelPoints, PanelPoints));
            sharedReady |= 8 << orientation;
        }
    }

    /// <summary>G = ∏ F_s^(m_s) over the live slots at a node; optionally kept as the start of the next panel.</summary>
    private readonly double EvaluateProduct(double node, bool store)
    {
        double product = 1.0;
        for (int s = first; s < slots; s++)
        {
            EvaluateArm(s, node, out _, out double f, out double upper);
            int m = slotMultiplicity[s];
            double p = m == 1 ? f : RepeatableMath.Power(f, m);
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

    /// <summary>Keeps slots [from, to)'s values at a node as a panel start, exactly as <see cref="EvaluateProduct"/> would.</summary>
    private readonly void StoreValues(int from, int to, double node)
    {
        for (int s = from; s < to; s++)
        {
            EvaluateArm(s, node, out _, out double f, out double upper);
            int m = slotMultiplicity[s];
            endPower[s] = m == 1 ? f : RepeatableMath.Power(f, m);
            endCdf[s] = f;
            endUpper[s] = upper;
        }
    }

    // An arm whose own bound is the origin is evaluated at the exact distance; any other at its position.
    private readonly void EvaluateArm(int slot, double t, out double f, out double cdfValue, out double upper)
    {
        IMarginal arm = arms[slotArm[slot]];
        switch (coordinate)
        {
            case Coordinate.AboveLowerBound when arm.LowerBound == origin:
                MarginalProfile.EvaluateNearBound(arm, upper: false, t, out f, out cdfValue, out upper);
                break;
            case Coordinate.BelowUpperBound when arm.UpperBound == origin:
                MarginalProfile.EvaluateNearBound(arm, upper: true, t, out f, out cdfValue, out upper);
                break;
            default:
                MarginalProfile.Evaluate(arm, Position(t), out f, out cdfValue, out upper);
                break;
        }
    }

    private readonly double PanelWidth(int slot, double t)
    {
        IMarginal arm = arms[slotArm[slot]];
        return coordinate switch
        {
            Coordinate.AboveLowerBound when arm.LowerBound == origin =>
                MarginalProfile.PanelWidthNearBound(arm, upper: false, t, awayFromBound: true),
            Coordinate.BelowUpperBound when arm.UpperBound == origin =>
                MarginalProfile.PanelWidthNearBound(arm, upper: true, t, awayFromBound: true),
            Coordinate.BelowUpperBound => MarginalProfile.PanelWidth(arm, Position(t), forward: false),
            _ => MarginalProfile.PanelWidth(arm, Position(t), forward: true),
        };
    }
}
