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
    private readonly bool centred;
    private readonly double mean, meanComplement, roundingGap, linearSlope, logConstant, switchPoint;
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
        centred = Math.Min(a, b) >= SpecialFunctions.StirlingThreshold;
        if (centred)
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
        if (centred)
        {
            double d = x <= 0.5 ? x - mean : (meanComplement - y) + roundingGap;
            double tx = d / mean, ty = (roundingGap - d) / meanComplement;
            double lx = Math.Abs(tx) <= 0.5 ? SpecialFunctions.Log1pMinusX(tx) : Math.Log(x / mean) - tx;
            double ly = Math.Abs(ty) <= 0.5 ? SpecialFunctions.Log1pMinusX(ty) : Math.Log(y / meanComplement) - ty;
            return A * lx + B * ly + d * linearSlope + logConstant;
        }
        return A * LogOf(x, y) + B * LogOf(y, x) + logConstant;
    }

    /// <summary>ln of the density x^(a−1) y^(b−1) / B(a,b).</summary>
    public double LogDensity(double x, double y) => LogPrefactor(x, y) - LogOf(x, y) - LogOf(y, x);

    /// <summary>Both tails, each computed directly where it is the small one, so neither cancels.</summary>
    public void Tails(double x, double y, out double lower, out double upper)
    {
        if (!(x > 0)) { lower = 0; upper = 1; return; }
        if (!(y > 0)) { lower = 1; upper = 0; return; }
        TailsFromPrefactor(x, y, Math.Exp(LogPrefactor(x, y)), out lower, out upper);
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
        double prefactor = Math.Exp(LogPrefactor(x, y));
        density = prefactor / (x * y);
        TailsFromPrefactor(x, y, prefactor, out lower, out upper);
    }

    /// <summary>
    /// <see cref="Evaluate"/> at many points (x[j], y[j]) at once, each result bit for bit the one it gives;
    /// the continued fractions run side by side in vector lanes.
    /// </summary>
    internal void EvaluateMany(ReadOnlySpan<double> x, ReadOnlySpan<double> y, Span<double> density, Span<double> lower, Span<double> upper)
    {
        int n = x.Length;
        Span<double> prefactor = stackalloc double[n], lowerArguments = stackalloc double[n], upperArguments = stackalloc double[n];
        Span<double> fraction = stackalloc double[n];
        Span<int> lowerAt = stackalloc int[n], upperAt = stackalloc int[n];
        int lowerCount = 0, upperCount = 0;
        Span<double> logPrefactor = stackalloc double[n];
        LogPrefactorMany(x, y, logPrefactor);
        for (int j = 0; j < n; j++)
        {
            if (!(x[j] > 0) || !(y[j] > 0))
            {
                density[j] = 0;
                lower[j] = x[j] > 0 ? 1 : 0;
                upper[j] = 1 - lower[j];
                continue;
            }
            prefactor[j] = Math.Exp(logPrefactor[j]);
            density[j] = prefactor[j] / (x[j] * y[j]);
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

    // ln u where u + v = 1: the logarithm of whichever is smaller is taken directly, the other via log1p.
    private static double LogOf(double u, double v) => u <= 0.5 ? Math.Log(u) : SpecialFunctions.Log1p(-v);
}
