using System.Runtime.Intrinsics;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// One probability (and optionally one moment) by the randomised Richtmyer rule, kept open so that more points
/// can be added: every shift keeps its running sums, and its estimate is its sum over the points so far.
/// </summary>
/// <remarks>
/// The error estimate is 3 × the standard error of the mean over the shifts, √(Σ_q (P_q − P̄)² / (Q(Q − 1))),
/// plus a floor for rounding (1e-14 for the special functions, and 2⁻⁵² per point for summing values ≤ 1), which
/// matters only where the spread vanishes: an integrand constant in the points, or an exact answer.
/// Points are summed in a fixed order (shift by shift, point by point), so the result is the same bits
/// whatever else runs beside it. Problems of rank 0 or 1 are exact and never take a point.
/// </remarks>
internal sealed class LatticeRun
{
    private const double Coverage = 3.0;

    internal const double RoundingFloor = 1e-14;

    private readonly SeparatedProblem problem;
    private readonly ChiScale? chi;
    private readonly RichtmyerPoints? points;
    private readonly double[] probabilitySums;
    private readonly double[] momentSums;
    private readonly double[] point;
    private readonly double[] y;

    /// <param name="chi">the chi variable for a t (ν finite), built once for all runs of a computation
    /// (<see cref="NeedsChi"/>); null for the normal.</param>
    public LatticeRun(SeparatedProblem problem, double degreesOfFreedom, ChiScale? chi, LatticeSettings settings)
    {
        this.problem = problem;
        bool isT = !double.IsPositiveInfinity(degreesOfFreedom);
        int q = settings.Shifts;
        probabilitySums = new double[q];
        momentSums = new double[q];
        y = new double[Math.Max(problem.Rank, 1)];
        if (problem.Infeasible || problem.Rank == 0)
        {
            Exact(problem.Infeasible ? 0.0 : 1.0, 0.0);
            point = [];
            return;
        }
        if (problem.Rank == 1)
        {
            double p = RankOneExact.Probability(problem, degreesOfFreedom, out double moment);
            Exact(p, moment);
            point = [];
            return;
        }
        if (isT) this.chi = chi ?? throw new ArgumentNullException(nameof(chi), "A t problem needs its chi variable.");
        int dimension = problem.Rank - 1 + (isT ? 1 : 0);
        points = new RichtmyerPoints(dimension, q, settings.Seed);
        point = new double[dimension];
    }

    /// <summary>Whether a problem with these degrees of freedom will integrate over the chi variable.</summary>
    public static bool NeedsChi(SeparatedProblem problem, double degreesOfFreedom) =>
        !double.IsPositiveInfinity(degreesOfFreedom) && !problem.Infeasible && problem.Rank >= 2;

    /// <summary>True when the answer is exact and more points would change nothing.</summary>
    public bool IsExact => points is null;

    /// <summary>Points per shift so far (0 for an exact problem).</summary>
    public long PointsPerShift { get; private set; }

    public int ShiftCount => probabilitySums.Length;

    /// <summary>The estimate from shift q alone.</summary>
    public double ShiftProbability(int q) => IsExact ? probabilitySums[q] : probabilitySums[q] / PointsPerShift;

    /// <summary>E[θ · 1{…}] from shift q alone, θ the free variable (divided by s in the t case).</summary>
    public double ShiftMoment(int q) => IsExact ? momentSums[q] : momentSums[q] / PointsPerShift;

    public double Probability => Mean(ShiftProbability);

    public double Moment => Mean(ShiftMoment);

    public double ProbabilityError => (IsExact ? 0.0 : Error(ShiftProbability)) + Rounding;

    private double Rounding => RoundingFloor + PointsPerShift * 2.220446049250313e-16;

    /// <summary>Continues every shift's sequence up to <paramref name="target"/> points.</summary>
    public void ExtendTo(long target) => ExtendTo(target, Vector512.IsHardwareAccelerated);

    /// <summary>
    /// As <see cref="ExtendTo(long)"/>; <paramref name="inLanes"/> evaluates the points eight at a time
    /// (<see cref="SeparatedProblem.EvaluateLanes"/>), which gives the same bits, and is there so tests can say so.
    /// </summary>
    internal void ExtendTo(long target, bool inLanes)
    {
        if (points is null || target <= PointsPerShift) return;
        Span<double> w = point;
        const int lanes = SeparatedProblem.Lanes;
        int coordinates = point.Length - (chi is null ? 0 : 1);
        Span<double> laneW = inLanes ? stackalloc double[coordinates * lanes] : [];
        Span<double> chiW = stackalloc double[lanes];
        Span<double> scales = stackalloc double[lanes];
        Span<double> weights = stackalloc double[lanes];
        Span<double> values = stackalloc double[lanes];
        Span<double> moments = stackalloc double[lanes];
        Span<Vector512<double>> laneY = inLanes ? stackalloc Vector512<double>[y.Length] : [];
        for (int q = 0; q < probabilitySums.Length; q++)
        {
            double probabilitySum = probabilitySums[q], momentSum = momentSums[q];
            long n = PointsPerShift;
            for (; inLanes && target - n >= lanes; n += lanes)
            {
                int first = chi is null ? 0 : 1;
                for (int i = 0; i < lanes; i++)
                {
                    points.Fill(q, n + i, w);
                    if (chi is not null) chiW[i] = w[0];
                    for (int c = 0; c < coordinates; c++) laneW[c * lanes + i] = w[first + c];
                }
                if (chi is not null)
                {
                    chi.MapLanes(chiW, scales, weights);
                }
                else
                {
                    scales.Fill(1.0);
                    weights.Fill(1.0);
                }
                problem.EvaluateLanes(laneW, laneY, Vector512.Create((ReadOnlySpan<double>)scales), out var p, out var moment);
                p.CopyTo(values);
                moment.CopyTo(moments);
                // Summed point by point, in the order the scalar loop sums them.
                for (int i = 0; i < lanes; i++)
                {
                    probabilitySum += weights[i] * values[i];
                    momentSum += weights[i] * moments[i] / scales[i];
                }
            }
            for (; n < target; n++)
            {
                points.Fill(q, n, w);
                double scale = 1.0, weight = 1.0;
                ReadOnlySpan<double> rest = w;
                if (chi is not null)
                {
                    chi.Map(w[0], out scale, out weight);
                    rest = w[1..];
                }
                double p = problem.Evaluate(rest, y, scale, out double moment);
                probabilitySum += weight * p;
                momentSum += weight * moment / scale;
            }
            probabilitySums[q] = probabilitySum;
            momentSums[q] = momentSum;
        }
        PointsPerShift = target;
    }

    /// <summary>Three standard errors over the shifts of any per-shift quantity.</summary>
    internal static double Error(Func<int, double> perShift, int shifts)
    {
        double mean = 0;
        for (int q = 0; q < shifts; q++) mean += perShift(q);
        mean /= shifts;
        double squares = 0;
        for (int q = 0; q < shifts; q++)
        {
            double d = perShift(q) - mean;
            squares += d * d;
        }
        return Coverage * Math.Sqrt(squares / (shifts * (shifts - 1.0)));
    }

    private double Error(Func<int, double> perShift) => Error(perShift, probabilitySums.Length);

    private double Mean(Func<int, double> perShift)
    {
        double sum = 0;
        for (int q = 0; q < probabilitySums.Length; q++) sum += perShift(q);
        return sum / probabilitySums.Length;
    }

    private void Exact(double probability, double moment)
    {
        Array.Fill(probabilitySums, probability);
        Array.Fill(momentSums, moment);
    }
}
