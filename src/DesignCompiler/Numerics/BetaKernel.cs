using System.Runtime.CompilerServices;

namespace DesignCompiler.Numerics;

/// <summary>
/// Everything about Beta(a,b) that does not depend on x, computed once, plus the accurate prefactor
/// x^a y^b / B(a,b) (y = 1 − x) that both the density and the incomplete beta function need.
/// </summary>
/// <remarks>
/// For large a and b the logarithm of the prefactor is a difference of numbers of size (a+b)·ln 2 whose
/// result is O(1). It is formed around the mean p = a/(a+b) instead: with d = x − p,
/// ln prefactor = a·L(d/p) + b·L(−d/q) + d·(a/p − b/q) + ½ ln(ab/(2π(a+b))) + δ(a+b) − δ(a) − δ(b),
/// where L(t) = ln(1+t) − t and δ is the Stirling remainder. The linear terms vanish for the exact mean;
/// they are kept, computed with fused multiply-adds, because p and q = b/(a+b) are rounded.
/// </remarks>
internal readonly partial struct BetaKernel
{
    // How ln prefactor is formed: from ln x and ln y (Plain, FromMean), which every beta arm evaluated at the
    // same point can share, or from the series around the mean (Centred), which cannot be shared.
    private enum Form : byte { Plain, FromMean, Centred }

    // Up to here a·ln(x/p) + b·ln(y/q) from the shared logarithms keeps ln prefactor within about
    // (a + b)·1e-16, some 4e-14; beyond, the centred series is worth its per-arm cost.
    private const double SharedLogReach = 400;

    private readonly Form form;
    private readonly double mean, meanComplement, roundingGap, linearSlope, logConstant, switchPoint;
    private readonly double logOfMean, logOfMeanComplement, logAtMean;
    private readonly double[]? lowerTable, upperTable;

    /// <param name="tabulate">precompute the continued-fraction coefficients, worth it when the kernel is evaluated many times.</param>
    public BetaKernel(double a, double b, bool tabulate = false)
    {
        if (tabulate)
        {
            lowerTable = BetaContinuedFraction.Tabulate(a, b);
            upperTable = BetaContinuedFraction.Tabulate(b, a);
        }
        A = a;
        B = b;
        switchPoint = (a + 1.0) / (a + b + 2.0);
        form = Math.Min(a, b) >= SpecialFunctions.StirlingThreshold ? Form.Centred : Form.Plain;
        if (form == Form.Centred)
        {
            double s = a + b;
            mean = a / s;
            meanComplement = b / s;
            roundingGap = mean >= 0.5 ? (1.0 - mean) - meanComplement : (1.0 - meanComplement) - mean;
            double bp = b * mean, bpError = Math.FusedMultiplyAdd(b, mean, -bp);
            double aqMinusBp = Math.FusedMultiplyAdd(a, meanComplement, -bp) - bpError;
            linearSlope = aqMinusBp / (mean * meanComplement);
            logConstant = 0.5 * Math.Log(b * mean) - SpecialFunctions.HalfLogTwoPi
                + StirlingSeries.Correction(s) - StirlingSeries.Correction(a) - StirlingSeries.Correction(b);
            if (s <= SharedLogReach)
            {
                // ln prefactor at the rounded mean by the centred form, then relative to it.
                logAtMean = LogPrefactor(mean, meanComplement);
                logOfMean = LogOf(mean, meanComplement);
                logOfMeanComplement = LogOf(meanComplement, mean);
                form = Form.FromMean;
            }
        }
        else
        {
            logConstant = -SpecialFunctions.LogBeta(a, b);
        }
    }

    public double A { get; }

    public double B { get; }

    public BetaKernel Swapped => new(B, A);

    /// <summary>
    /// ln(x^a y^b / B(a,b)) for 0 &lt; x &lt; 1 with y = 1 − x. Both are passed so that whichever is below ½
    /// is used as given; the other is only its complement.
    /// </summary>
    public double LogPrefactor(double x, double y)
    {
        if (form == Form.Centred)
        {
            double d = x <= 0.5 ? x - mean : (meanComplement - y) + roundingGap;
            double tx = d / mean, ty = (roundingGap - d) / meanComplement;
            double lx = CentredTerm(tx, x, mean), ly = CentredTerm(ty, y, meanComplement);
            return A * lx + B * ly + d * linearSlope + logConstant;
        }
        return LogPrefactorFromLogs(LogOf(x, y), LogOf(y, x));
    }

    /// <summary>Whether <see cref="LogPrefactor"/> comes from ln x and ln y alone, so that arms can share them.</summary>
    internal bool UsesSharedLogs => form != Form.Centred;

    // The Plain and FromMean forms, from lx = ln x and ly = ln y as LogOf gives them.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double LogPrefactorFromLogs(double lx, double ly) =>
        form == Form.FromMean
            ? A * (lx - logOfMean) + B * (ly - logOfMeanComplement) + logAtMean
            : A * lx + B * ly + logConstant;

    /// <summary>ln of the density x^(a−1) y^(b−1) / B(a,b).</summary>
    public double LogDensity(double x, double y)
    {
        // The logarithms of x and y serve both the prefactor (unless it is centred) and the division by xy.
        double lx = LogOf(x, y), ly = LogOf(y, x);
        double logPrefactor = form == Form.Centred ? LogPrefactor(x, y) : LogPrefactorFromLogs(lx, ly);
        return logPrefactor - lx - ly;
    }

    /// <summary>Both tails, each computed directly where it is the small one, so neither cancels.</summary>
    public void Tails(double x, double y, out double lower, out double upper)
    {
        if (!(x > 0)) { lower = 0; upper = 1; return; }
        if (!(y > 0)) { lower = 1; upper = 0; return; }
        TailsFromPrefactor(x, y, RepeatableMath.Exp(LogPrefactor(x, y)), out lower, out upper);
    }

    /// <summary>Density and both tails at one point; they share the prefactor, the costly part.</summary>
    public void Evaluate(double x, double y, out double density, out double lower, out double upper)
    {
        if (!(x > 0) || !(y > 0))
        {
            density = 0;
            lower = x > 0 ? 1 : 0;
            upper = 1 - lower;
            return;
        }
        double prefactor = RepeatableMath.Exp(LogPrefactor(x, y));
        density = prefactor / (x * y);
        TailsFromPrefactor(x, y, prefactor, out lower, out upper);
    }

    /// <summary>
    /// <see cref="Evaluate"/> at many points (x[j], y[j]) at once, each result bit for bit the one it gives;
    /// the continued fractions run side by side in vector lanes.
    /// </summary>
    internal void EvaluateMany(ReadOnlySpan<double> x, ReadOnlySpan<double> y, Span<double> density, Span<double> lower, Span<double> upper) =>
        EvaluateMany(x, y, default, default, density, lower, upper);

    /// <summary>
    /// <see cref="EvaluateMany(ReadOnlySpan{double}, ReadOnlySpan{double}, Span{double}, Span{double}, Span{double})"/>
    /// with ln x and ln y at the points already known (<see cref="LogsMany"/>; empty spans when not), as the
    /// P(best) quadrature shares them between the beta arms of a panel.
    /// </summary>
    // Kept out of tiered compilation: a simulation spends its first seconds here, and tiering would run that
    // time in unoptimised code and then compile it again; there is nothing for profile guidance to learn.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    [SkipLocalsInit]
    internal void EvaluateMany(
        ReadOnlySpan<double> x, ReadOnlySpan<double> y, ReadOnlySpan<double> logX, ReadOnlySpan<double> logY,
        Span<double> density, Span<double> lower, Span<double> upper)
    {
        int n = x.Length;
        Span<double> prefactor = stackalloc double[n], lowerArguments = stackalloc double[n], upperArguments = stackalloc double[n];
        Span<double> fraction = stackalloc double[n];
        Span<int> lowerAt = stackalloc int[n], upperAt = stackalloc int[n];
        int lowerCount = 0, upperCount = 0;
        PrefactorMany(x, y, logX, logY, prefactor, density);
        for (int j = 0; j < n; j++)
        {
            if (!(x[j] > 0) || !(y[j] > 0))
            {
                density[j] = 0;
                lower[j] = x[j] > 0 ? 1 : 0;
                upper[j] = 1 - lower[j];
                continue;
            }
            if (UseLowerFraction(x[j], y[j]))
            {
                lowerAt[lowerCount] = j;
                lowerArguments[lowerCount++] = x[j];
            }
            else
            {
                upperAt[upperCount] = j;
                upperArguments[upperCount++] = y[j];
            }
        }
        BetaContinuedFraction.EvaluateMany(A, B, lowerArguments[..lowerCount], lowerTable, fraction);
        for (int i = 0; i < lowerCount; i++)
        {
            int j = lowerAt[i];
            lower[j] = Math.Min(1.0, prefactor[j] * fraction[i] / A);
            upper[j] = 1.0 - lower[j];
        }
        BetaContinuedFraction.EvaluateMany(B, A, upperArguments[..upperCount], upperTable, fraction);
        for (int i = 0; i < upperCount; i++)
        {
            int j = upperAt[i];
            upper[j] = Math.Min(1.0, prefactor[j] * fraction[i] / B);
            lower[j] = 1.0 - upper[j];
        }
    }

    private void TailsFromPrefactor(double x, double y, double prefactor, out double lower, out double upper)
    {
        if (UseLowerFraction(x, y))
        {
            lower = Math.Min(1.0, prefactor * BetaContinuedFraction.Evaluate(A, B, x, lowerTable) / A);
            upper = 1.0 - lower;
        }
        else
        {
            upper = Math.Min(1.0, prefactor * BetaContinuedFraction.Evaluate(B, A, y, upperTable) / B);
            lower = 1.0 - upper;
        }
    }

    // The fraction in x converges for x below the switch point, the one in y above it. With an argument
    // close to 1 a fraction loses about max(a,b)·1e-16 to rounding (this happens when one parameter is
    // huge and the other small), so if the other fraction's argument is tiny and it is only just past its
    // own switch point (where it still converges reliably, within about 1/(2√(p+1)) of it in ratio),
    // that one is used instead.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private bool UseLowerFraction(double x, double y)
    {
        const double nearOne = 0.01;
        if (x < switchPoint)
        {
            if (y >= nearOne) return true;
            double otherSwitch = 1.0 - switchPoint;
            return !(y <= otherSwitch * (1.0 + 0.5 / Math.Sqrt(B + 1.0)));
        }
        if (x >= nearOne) return false;
        return x <= switchPoint * (1.0 + 0.5 / Math.Sqrt(A + 1.0));
    }

    // ln(1+t) − t, with 1 + t = u/centre: by the series near 0 (its short and middle branches), then from t
    // itself while it is in the logarithm's series range, and beyond that from u/centre, where the prefactor
    // is at most e^(−0.04·a) anyway and one rounding of the ratio costs nothing that shows.
    private static double CentredTerm(double t, double u, double centre)
    {
        double size = Math.Abs(t);
        if (size <= CentredSeriesReach) return SpecialFunctions.Log1pMinusX(t);
        if (size <= LogOfSeriesReach) return RepeatableMath.Log1pSmall(t) - t;
        return RepeatableMath.Log(u / centre) - t;
    }

    // Within it Log1pMinusX never needs its long series, the costly one in lanes.
    private const double CentredSeriesReach = 0.19;

    // ln u where u + v = 1 and the smaller of the two is exact: ln(1 − v) comes from v itself while
    // 1 − v is within the series' range, since forming 1 − v would round v's digits away.
    private static double LogOf(double u, double v) =>
        u > 0.5 && v <= LogOfSeriesReach ? RepeatableMath.Log1pSmall(-v) : RepeatableMath.Log(u);

    // 1 − √½, slightly rounded down: RepeatableMath.Log1pSmall's range.
    private const double LogOfSeriesReach = 0.2928932188134524;
}
