using System.Globalization;

namespace DesignCompiler.Numerics;

/// <summary>Beta(a, b), the posterior of a success rate.</summary>
/// <remarks>
/// Immutable to everyone but a <see cref="Planning.PlanWorkspace"/>: the planner's workspace re-targets the
/// posteriors it made itself between rounds (<see cref="Retarget"/>), so that a simulated round allocates
/// none. Those objects never leave the workspace's round.
/// </remarks>
public sealed class BetaMarginal : IMarginal, IQuadratureProfile, IBoundedProfile, IEquatable<BetaMarginal>
{
    private BetaKernel kernel;

    public BetaMarginal(double a, double b) => Retarget(a, b);

    /// <summary>Makes this Beta(a, b), exactly as a new one would be.</summary>
    internal void Retarget(double a, double b)
    {
        if (!IncompleteBeta.ValidParameters(a, b)) throw new ArgumentOutOfRangeException(nameof(a), "Beta parameters must be positive and finite.");
        A = a;
        B = b;
        // No coefficient tables: a posterior lives for one round of a simulation, too short to repay them,
        // and the panel evaluation shares each coefficient between sixteen nodes anyway.
        kernel = new BetaKernel(a, b);
        double s = a + b;
        Mean = a / s;
        StdDev = Math.Sqrt(Mean * (b / s) / (s + 1.0));
    }

    public double A { get; private set; }

    public double B { get; private set; }

    public double Mean { get; private set; }

    public double StdDev { get; private set; }

    public double LowerBound => 0.0;

    public double UpperBound => 1.0;

    public double LogDensity(double x)
    {
        if (double.IsNaN(x)) return x;
        if (x < 0 || x > 1) return double.NegativeInfinity;
        if (x == 0) return EndpointLogDensity(A, B);
        if (x == 1) return EndpointLogDensity(B, A);
        return kernel.LogDensity(x, 1.0 - x);
    }

    public double Density(double x) => Math.Exp(LogDensity(x));

    public double Cdf(double x)
    {
        if (double.IsNaN(x)) return x;
        kernel.Tails(x, 1.0 - x, out double lower, out _);
        return lower;
    }

    public double UpperTail(double x)
    {
        if (double.IsNaN(x)) return x;
        kernel.Tails(x, 1.0 - x, out _, out double upper);
        return upper;
    }

    public double Quantile(double p)
    {
        if (double.IsNaN(p) || p < 0 || p > 1) return double.NaN;
        IncompleteBeta.Quantile(kernel, p, 1.0 - p, IncompleteBeta.FullPrecision, out double x, out _);
        return x;
    }

    double IQuadratureProfile.UpperQuantile(double q)
    {
        if (double.IsNaN(q) || q < 0 || q > 1) return double.NaN;
        IncompleteBeta.Quantile(kernel, 1.0 - q, q, IncompleteBeta.FullPrecision, out double x, out _);
        return x;
    }

    void IQuadratureProfile.Support(double tailMass, out double lo, out double hi, out double aboveLowerBound, out double belowUpperBound)
    {
        if (A >= BetaTailBound.SmallestShape && B >= BetaTailBound.SmallestShape)
        {
            // Log-concave: the density's tail bound, logarithms only. Kept inside the closed-form bounds that
            // the screen relies on (they hold 1e-4 of the mass, so they only bind if the bound were far off).
            ((IQuadratureProfile)this).WideSupport(tailMass, out double wideLo, out double wideHi);
            aboveLowerBound = Math.Max(Math.Max(BetaTailBound.Distance(kernel, upper: false, tailMass), wideLo), 1e-300);
            belowUpperBound = Math.Max(Math.Max(BetaTailBound.Distance(kernel, upper: true, tailMass), 1.0 - wideHi), 1e-300);
            lo = aboveLowerBound;
            hi = 1.0 - belowUpperBound;
            return;
        }
        const double coarse = 1e-3;
        IncompleteBeta.Quantile(kernel, tailMass, 1.0 - tailMass, coarse, out lo, out _);
        IncompleteBeta.Quantile(kernel, 1.0 - tailMass, tailMass, coarse, out hi, out belowUpperBound);
        // Panels graded towards a singular end need a positive start; below 1e-300 no mass is left that the
        // other arms could let count.
        lo = Math.Max(lo, 1e-300);
        aboveLowerBound = lo;
        belowUpperBound = Math.Max(belowUpperBound, 1e-300);
    }

    // Beta(a, b) is sub-Gaussian with variance proxy at most 1/(4(a + b + 1)) (O. Marchal and J. Arbel, "On the
    // sub-Gaussianity of the Beta and Dirichlet distributions", Electron. Commun. Probab. 22, 2017; from memory),
    // so each tail beyond mean ± t holds at most exp(−2(a + b + 1)t²). Asked for 1e-4 of the tail mass, the bounds
    // are wider than the support's search could ever return.
    bool IQuadratureProfile.WideSupport(double tailMass, out double lo, out double hi)
    {
        double t = Math.Sqrt(-Math.Log(1e-4 * tailMass) / (2.0 * (A + B + 1.0)));
        lo = Math.Max(0.0, Mean - t);
        hi = Math.Min(1.0, Mean + t);
        return true;
    }

    double IQuadratureProfile.PanelWidth(double x, bool forward) => PanelWidthAt(x, 1.0 - x, forward);

    void IQuadratureProfile.Evaluate(double x, out double density, out double cdf, out double upperTail) =>
        kernel.Evaluate(x, 1.0 - x, out density, out cdf, out upperTail);

    void IQuadratureProfile.EvaluateMany(ReadOnlySpan<double> x, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        Span<double> y = stackalloc double[x.Length];
        for (int j = 0; j < x.Length; j++) y[j] = 1.0 - x[j];
        kernel.EvaluateMany(x, y, density, cdf, upperTail);
    }

    /// <summary>Whether <see cref="EvaluatePanel"/> uses the logarithms it is given.</summary>
    internal bool UsesSharedLogs => kernel.UsesSharedLogs;

    /// <summary>
    /// The quadrature's panel evaluation: the points as (x, 1 − x) pairs, exactly as <see cref="IQuadratureProfile.EvaluateMany"/>
    /// (y = 1 − x) or <see cref="IBoundedProfile.EvaluateNearBoundMany"/> (one of them the distance) form them,
    /// with their logarithms from <see cref="BetaKernel.LogsMany"/>, which the panel's beta arms share.
    /// Bit for bit what those give.
    /// </summary>
    internal void EvaluatePanel(
        ReadOnlySpan<double> x, ReadOnlySpan<double> y, ReadOnlySpan<double> logX, ReadOnlySpan<double> logY,
        Span<double> density, Span<double> cdf, Span<double> upperTail) =>
        kernel.EvaluateMany(x, y, logX, logY, density, cdf, upperTail);

    void IBoundedProfile.EvaluateNearBoundMany(bool upper, ReadOnlySpan<double> distance, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        Span<double> complement = stackalloc double[distance.Length];
        for (int j = 0; j < distance.Length; j++) complement[j] = 1.0 - distance[j];
        if (upper) kernel.EvaluateMany(complement, distance, density, cdf, upperTail);
        else kernel.EvaluateMany(distance, complement, density, cdf, upperTail);
    }

    void IBoundedProfile.EvaluateNearBound(bool upper, double distance, out double density, out double cdf, out double upperTail)
    {
        if (upper) kernel.Evaluate(1.0 - distance, distance, out density, out cdf, out upperTail);
        else kernel.Evaluate(distance, 1.0 - distance, out density, out cdf, out upperTail);
    }

    double IBoundedProfile.PanelWidthNearBound(bool upper, double distance, bool awayFromBound) =>
        upper
            ? PanelWidthAt(1.0 - distance, distance, forward: !awayFromBound)
            : PanelWidthAt(distance, 1.0 - distance, forward: awayFromBound);

    // x^(a−1) has a branch point at 0 unless a is an integer, and (1−x)^(b−1) one at 1 unless b is.
    private double PanelWidthAt(double x, double y, bool forward)
    {
        double w = PanelRules.StdDevMultiple * StdDev;
        if (!PanelRules.IsInteger(A)) w = Math.Min(w, PanelRules.NearBranchPoint(x, awayFromIt: forward));
        if (!PanelRules.IsInteger(B)) w = Math.Min(w, PanelRules.NearBranchPoint(y, awayFromIt: !forward));
        return w;
    }

    public bool Equals(BetaMarginal? other) => other is not null && A.Equals(other.A) && B.Equals(other.B);

    public override bool Equals(object? obj) => Equals(obj as BetaMarginal);

    public override int GetHashCode() => HashCode.Combine(typeof(BetaMarginal), A, B);

    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"Beta({A:R}, {B:R})");

    // At x = 0 the density is x^(a−1)·(1/B(a,b)): infinite, finite or zero as a is below, at or above 1.
    private static double EndpointLogDensity(double near, double far) =>
        near < 1 ? double.PositiveInfinity : near == 1 ? Math.Log(far) : double.NegativeInfinity;
}
