using System.Collections.Immutable;
using System.Runtime.InteropServices;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// P(arm i is best), E[max_j θ_j] and the expected loss E[max_j θ_j − θ_i] when the arm values θ are jointly
/// multivariate normal N(μ, Σ) (ν = +∞) or multivariate t with location μ, scale Σ and ν degrees of freedom,
/// as the posterior of a model with shared block and round effects makes them. The independent-arm case is
/// <see cref="ProbabilityOfBest"/>, which is exact; this one integrates.
/// </summary>
/// <remarks>
/// <para>Each P(i best) is the (k−1)-dimensional orthant P(θ_i − θ_j &gt; 0 for all j ≠ i) of
/// <see cref="BestArmOrthant"/>, computed by <see cref="RectangleProbability"/>'s method (Genz 1992; Genz and
/// Bretz 2002, 2009). Two arms, or any problem of rank one, are exact through the normal or t CDF. Tied, dominated
/// and far-behind arms are settled first (<see cref="ArmComparisons"/>).</para>
/// <para>E[max] = Σ_i E[θ_i · 1{i best}], each term from the same points as P(i best): θ_i − μ_i given the
/// separated variables is linear in them, and its last term is integrated exactly (the truncated normal's mean),
/// so E[max] costs no extra points. It exists only for ν &gt; 1; below that E[max] and every loss are +∞. For
/// ν ≤ 2 the E[max] integrand has infinite variance, so its error is reported as +∞.</para>
/// <para>The probabilities are clamped into [0, 1] (for the normal, and for the t with the tabulated chi inverse,
/// every point's value already lies there) and normalised to sum to 1. The error of the normalised
/// q_i = P̄_i / S, S = Σ_j P̄_j, is estimated from the shifts directly, as three standard errors of the ratio:
/// 3 · sd_q(P_iq − q_i S_q) / (√Q S), with P_iq and S_q the estimates from shift q alone (every arm uses the same
/// shifts, so their correlation is kept). ErrorBound is the largest of these plus the screened arms' mass and a
/// rounding floor of 1e-14 (so two arms, which are exact, report 1e-14).</para>
/// <para>Every arm starts with the first pass of points; then, while ErrorBound is above the accuracy, every arm
/// doubles its points together (within the budget), except arms whose own raw error is already below
/// accuracy / (4 k), which together cannot move any probability by more than a quarter of it. Going together
/// matters: arms that share the shifts and the number of points have errors that rise and fall together, and
/// normalising cancels most of them (by a factor of about 4 in the cases measured).</para>
/// </remarks>
public static class CorrelatedBestArm
{
    public static BestArmResult Compute(
        IReadOnlyList<double> location, double[,] scale, double degreesOfFreedom, double accuracy = LatticeSettings.DefaultAccuracy) =>
        Estimate(location, scale, degreesOfFreedom, LatticeSettings.Default with { Accuracy = accuracy }).Result;

    public static CorrelatedBestArmEstimate Estimate(
        IReadOnlyList<double> location, double[,] scale, double degreesOfFreedom, LatticeSettings? settings = null)
    {
        ArgumentNullException.ThrowIfNull(location);
        settings ??= LatticeSettings.Default;
        settings.Validate();
        int k = location.Count;
        if (k == 0) throw new ArgumentException("At least one arm is needed.", nameof(location));
        for (int i = 0; i < k; i++)
        {
            if (!double.IsFinite(location[i])) throw new ArgumentException($"Location {i} is not finite.", nameof(location));
        }
        ScaleMatrix.Validate(scale, k, nameof(scale));
        ScaleMatrix.SemidefiniteFactor(scale, nameof(scale));
        DegreesOfFreedom.Validate(degreesOfFreedom, nameof(degreesOfFreedom));
        if (k == 1) return Single(location[0]);

        var comparisons = new ArmComparisons(location, scale, degreesOfFreedom);
        bool withMoments = degreesOfFreedom > 1;
        int[] active = comparisons.Active;
        var problems = new SeparatedProblem[active.Length];
        for (int a = 0; a < active.Length; a++)
        {
            int arm = active[a];
            var rivals = new List<int>(active.Length);
            foreach (int j in active)
            {
                if (j != arm && !comparisons.SurelyBeats[arm, j]) rivals.Add(j);
            }
            problems[a] = BestArmOrthant.Build(location, scale, arm, rivals, withMoments);
        }
        var chi = problems.Any(p => LatticeRun.NeedsChi(p, degreesOfFreedom)) ? ChiScale.For(degreesOfFreedom) : null;
        var runs = problems.Select(p => new LatticeRun(p, degreesOfFreedom, chi, settings)).ToArray();

        long n = settings.FirstPointsPerShift;
        foreach (var run in runs) run.ExtendTo(n);
        var normalised = new NormalisedProbabilities(runs);
        double negligible = settings.Accuracy / (4.0 * runs.Length);
        while (normalised.LargestError + comparisons.ScreenedMass > settings.Accuracy && n < settings.MaxPointsPerShift)
        {
            n = Math.Min(2 * n, settings.MaxPointsPerShift);
            bool extended = false;
            foreach (var run in runs)
            {
                if (run.IsExact || run.ProbabilityError <= negligible) continue;
                run.ExtendTo(n);
                extended = true;
            }
            if (!extended) break;
            normalised = new NormalisedProbabilities(runs);
        }

        var probabilities = new double[k];
        double errorBound = 0;
        for (int a = 0; a < active.Length; a++)
        {
            int arm = active[a], size = comparisons.GroupSize[arm];
            errorBound = Math.Max(errorBound, normalised.Error[a] / size);
            for (int i = 0; i < k; i++)
            {
                if (comparisons.Representative[i] == arm) probabilities[i] = normalised.Value[a] / size;
            }
        }
        errorBound += comparisons.ScreenedMass;

        var loss = new double[k];
        ExpectedMaximum(location, scale, degreesOfFreedom, comparisons, runs, loss, out double expectedMaximum, out double maximumError);

        long points = 0;
        foreach (var run in runs) points = Math.Max(points, run.PointsPerShift);
        int screened = 0;
        for (int i = 0; i < k; i++)
        {
            if (comparisons.Screened[comparisons.Representative[i]]) screened++;
        }
        var result = new BestArmResult(
            ImmutableCollectionsMarshal.AsImmutableArray(probabilities),
            ImmutableCollectionsMarshal.AsImmutableArray(loss),
            expectedMaximum,
            errorBound);
        return new CorrelatedBestArmEstimate(result, maximumError, points, screened, errorBound <= settings.Accuracy);
    }

    private static CorrelatedBestArmEstimate Single(double location) =>
        new(new BestArmResult([1.0], [0.0], location, 0.0), 0.0, 0, 0, true);

    /// <summary>
    /// E[max] = c + X with c = max_i μ_i and X = Σ_i ((μ_i − c) P(i best) + E[(θ_i − μ_i) 1{i best}]) over the
    /// integrated arms (centring at c keeps X translation-invariant and at the scale of the differences). X ≥ 0
    /// (E[max] ≥ every μ_i), so a negative estimate is raised to 0; every loss is X − (μ_i − c) ≥ 0 likewise.
    /// A screened arm j adds at most E[(θ_j − θ_p)⁺ 1{j best}] ≤ √(E[(θ_j − θ_p)²] · bound_j) (Cauchy–Schwarz,
    /// p the arm of its bound) to E[max]; those terms join the error.
    /// </summary>
    private static void ExpectedMaximum(
        IReadOnlyList<double> location, double[,] scale, double degreesOfFreedom, ArmComparisons comparisons,
        LatticeRun[] runs, Span<double> loss, out double expectedMaximum, out double error)
    {
        int k = location.Count;
        double c = double.NegativeInfinity;
        for (int i = 0; i < k; i++) c = Math.Max(c, location[i]);
        bool anyRandom = comparisons.Active.Length > 1 || comparisons.ScreenedMass > 0;
        if (degreesOfFreedom <= 1 && anyRandom)
        {
            expectedMaximum = double.PositiveInfinity;
            error = double.PositiveInfinity;
            loss.Fill(double.PositiveInfinity);
            return;
        }
        int[] active = comparisons.Active;
        int shifts = runs[0].ShiftCount;
        double PerShift(int q)
        {
            double sum = 0;
            for (int a = 0; a < runs.Length; a++)
                sum += (location[active[a]] - c) * runs[a].ShiftProbability(q) + runs[a].ShiftMoment(q);
            return sum;
        }
        double x = 0;
        for (int q = 0; q < shifts; q++) x += PerShift(q);
        x = Math.Max(x / shifts, 0.0);
        error = LatticeRun.Error(PerShift, shifts) + ScreenedContribution(location, scale, degreesOfFreedom, comparisons)
            + LatticeRun.RoundingFloor * (1.0 + Math.Abs(c) + x);
        if (degreesOfFreedom <= 2 && anyRandom) error = double.PositiveInfinity;
        expectedMaximum = c + x;
        for (int i = 0; i < k; i++) loss[i] = Math.Max(x - (location[i] - c), 0.0);
    }

    private static double ScreenedContribution(IReadOnlyList<double> location, double[,] scale, double degreesOfFreedom, ArmComparisons comparisons)
    {
        double total = 0;
        for (int j = 0; j < location.Count; j++)
        {
            if (comparisons.Representative[j] != j || !comparisons.Screened[j] || comparisons.Bound[j] == 0) continue;
            int p = comparisons.Partner[j];
            double delta = location[j] - location[p];
            double variance = ArmComparisons.DifferenceVariance(scale, j, p);
            if (!double.IsPositiveInfinity(degreesOfFreedom))
                variance = degreesOfFreedom > 2 ? variance * degreesOfFreedom / (degreesOfFreedom - 2) : double.PositiveInfinity;
            total += Math.Sqrt((delta * delta + variance) * comparisons.Bound[j]);
        }
        return total;
    }

    /// <summary>The normalised probabilities of the integrated arms and their ratio-estimator errors.</summary>
    private sealed class NormalisedProbabilities
    {
        public NormalisedProbabilities(LatticeRun[] runs)
        {
            int shifts = runs[0].ShiftCount;
            Value = new double[runs.Length];
            Error = new double[runs.Length];
            double total = 0;
            for (int a = 0; a < runs.Length; a++)
            {
                Value[a] = Math.Clamp(runs[a].Probability, 0.0, 1.0);
                total += Value[a];
            }
            if (!(total > 0)) throw new InvalidOperationException("No arm has a positive probability of being best.");
            double ShiftTotal(int q)
            {
                double s = 0;
                foreach (var run in runs) s += run.ShiftProbability(q);
                return s;
            }
            for (int a = 0; a < runs.Length; a++)
            {
                Value[a] /= total;
                var run = runs[a];
                double share = Value[a];
                Error[a] = LatticeRun.Error(q => run.ShiftProbability(q) - share * ShiftTotal(q), shifts) / total
                    + LatticeRun.RoundingFloor;
                LargestError = Math.Max(LargestError, Error[a]);
            }
        }

        public double[] Value { get; }

        public double[] Error { get; }

        public double LargestError { get; }
    }
}
