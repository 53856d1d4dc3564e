using System.Runtime.CompilerServices;

namespace DesignCompiler.Numerics;

/// <summary>The standard Student-t distribution with df degrees of freedom (df may be fractional).</summary>
public static class StudentT
{
    // Beyond this a Cornish–Fisher expansion in 1/df takes over from the incomplete beta function, whose
    // continued fraction loses about df·1e-16 relative to rounding there (its argument df/(df+t²) is
    // close to 1). The expansion's first omitted term is below 1e-20 relative for tails above 1e-15.
    internal const double LargeDf = 1e5;

    /// <summary>P(T ≤ t).</summary>
    public static double Cdf(double df, double t)
    {
        if (!ValidDf(df) || double.IsNaN(t)) return double.NaN;
        Tails(new BetaKernel(0.5 * df, 0.5), df, t, out double lower, out _);
        return lower;
    }

    /// <summary>P(T &gt; t), accurate far in the right tail.</summary>
    public static double UpperTail(double df, double t) => Cdf(df, -t);

    /// <summary>The t with P(T ≤ t) = p.</summary>
    public static double Quantile(double df, double p)
    {
        if (!ValidDf(df) || double.IsNaN(p) || p < 0 || p > 1) return double.NaN;
        if (p == 0.5) return 0.0;
        // 1 − p is exact for p > ½, so the right half is solved as the mirror of a lower tail.
        return p < 0.5
            ? -UpperHalfQuantile(df, p, IncompleteBeta.FullPrecision)
            : UpperHalfQuantile(df, 1.0 - p, IncompleteBeta.FullPrecision);
    }

    internal static bool ValidDf(double df) => df > 0 && !double.IsPositiveInfinity(df);

    /// <summary>
    /// Both tails at t. With x = df/(df+t²) and y = t²/(df+t²), each formed directly so that neither is a
    /// rounded complement, P(T &gt; |t|) = ½ I_x(df/2, ½) (DLMF 8.17 with A&amp;S 26.7.1).
    /// </summary>
    internal static void Tails(in BetaKernel kernel, double df, double t, out double lower, out double upper)
    {
        if (t == 0) { lower = 0.5; upper = 0.5; return; }
        double farTail;
        if (df > LargeDf) farTail = LargeDfTail(df, Math.Abs(t));
        else
        {
            BetaArguments(df, t, out double x, out double y);
            kernel.Tails(x, y, out double i, out _);
            farTail = 0.5 * i;
        }
        FromFarTail(t, farTail, out lower, out upper);
    }

    /// <summary>
    /// <see cref="Tails"/> at every t, each bit for bit its value: the incomplete betas of all the points go
    /// through the kernel's lanes together, as the P(best) quadrature asks for a whole panel at once.
    /// </summary>
    [SkipLocalsInit]
    internal static void TailsMany(in BetaKernel kernel, double df, ReadOnlySpan<double> t, Span<double> lower, Span<double> upper)
    {
        int n = t.Length;
        if (df > LargeDf)
        {
            for (int j = 0; j < n; j++) Tails(kernel, df, t[j], out lower[j], out upper[j]);
            return;
        }
        Span<double> x = stackalloc double[n], y = stackalloc double[n], density = stackalloc double[n], i = stackalloc double[n], complement = stackalloc double[n];
        for (int j = 0; j < n; j++) BetaArguments(df, t[j], out x[j], out y[j]);
        kernel.EvaluateMany(x, y, density, i, complement);
        for (int j = 0; j < n; j++)
        {
            if (t[j] == 0) { lower[j] = 0.5; upper[j] = 0.5; continue; }
            FromFarTail(t[j], 0.5 * i[j], out lower[j], out upper[j]);
        }
    }

    // x = df/(df+t²) and y = t²/(df+t²), each formed directly so that neither is a rounded complement.
    private static void BetaArguments(double df, double t, out double x, out double y)
    {
        double absT = Math.Abs(t);
        double t2 = t * t;
        if (double.IsInfinity(t2))
        {
            x = df / absT / absT;
            y = 1.0;
        }
        else
        {
            x = df / (df + t2);
            y = t2 / (df + t2);
        }
    }

    private static void FromFarTail(double t, double farTail, out double lower, out double upper)
    {
        double nearSide = 1.0 - farTail;
        if (t < 0) { lower = farTail; upper = nearSide; }
        else { lower = nearSide; upper = farTail; }
    }

    /// <summary>The t ≥ 0 with P(T &gt; t) = tail, for 0 &lt; tail ≤ ½.</summary>
    internal static double UpperHalfQuantile(double df, double tail, double relativeTolerance)
    {
        if (tail <= 0) return double.PositiveInfinity;
        if (df == 1.0) return 1.0 / Math.Tan(Math.PI * tail);
        if (df == 2.0) return (1.0 - 2.0 * tail) / Math.Sqrt(2.0 * tail * (1.0 - tail));
        if (df > LargeDf) return CornishFisher(df, -StandardNormal.Quantile(tail));
        // I_x(df/2, ½) = 2·tail with x = df/(df+t²); the solver returns x and 1 − x each to full relative precision.
        double r = 2.0 * tail;
        IncompleteBeta.Quantile(new BetaKernel(0.5 * df, 0.5), r, 1.0 - r, relativeTolerance, out double x, out double y);
        if (x <= 0) return double.PositiveInfinity;
        return Math.Sqrt(df) * (Math.Sqrt(y) / Math.Sqrt(x));
    }

    // A&S 26.7.5 (Fisher–Cornish): t = z + g1/ν + g2/ν² + g3/ν³ + g4/ν⁴ with z the normal deviate.
    private static double CornishFisher(double df, double z)
    {
        double z2 = z * z;
        double g1 = (z2 + 1.0) * z / 4.0;
        double g2 = ((5.0 * z2 + 16.0) * z2 + 3.0) * z / 96.0;
        double g3 = (((3.0 * z2 + 19.0) * z2 + 17.0) * z2 - 15.0) * z / 384.0;
        double g4 = ((((79.0 * z2 + 776.0) * z2 + 1482.0) * z2 - 1920.0) * z2 - 945.0) * z / 92160.0;
        return z + (g1 + (g2 + (g3 + g4 / df) / df) / df) / df;
    }

    // The t tail at t is the normal tail at the z that the expansion maps onto t; since dt/dz = 1 + O(1/df),
    // the fixed-point iteration for z gains about five digits a step at this df.
    private static double LargeDfTail(double df, double t)
    {
        // Beyond t = 50 the tail is below 1e-500 at this df, and the expansion is no longer valid.
        if (t > 50) return 0.0;
        double z = t;
        for (int i = 0; i < 8; i++)
        {
            double correction = CornishFisher(df, z) - t;
            z -= correction;
            if (Math.Abs(correction) <= 1e-17 * Math.Abs(z)) break;
        }
        return StandardNormal.UpperTail(z);
    }
}
