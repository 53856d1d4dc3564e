namespace DesignCompiler.Numerics;

/// <summary>
/// The x-independent parts of the standard Gamma(a) distribution and the prefactor x^a e^(−x) / Γ(a).
/// </summary>
/// <remarks>
/// For large a, ln prefactor = a·L((x−a)/a) + ½ ln(a/(2π)) − δ(a) with L(t) = ln(1+t) − t: the terms of size
/// a·ln a that the direct form would subtract cancel analytically.
/// </remarks>
internal readonly partial struct GammaKernel
{
    private readonly bool centred;
    private readonly double logConstant;

    // For shapes from UniformMinimumShape on (GammaKernel.Uniform.cs): 1/a, Γ*(a)/a and √a.
    private readonly bool uniform;
    private readonly double inverseShape, uniformScale, sqrtShape;

    public GammaKernel(double a)
    {
        A = a;
        centred = a >= SpecialFunctions.StirlingThreshold;
        logConstant = centred
            ? 0.5 * Math.Log(a) - SpecialFunctions.HalfLogTwoPi - StirlingSeries.Correction(a)
            : -SpecialFunctions.LogGamma(a);
        uniform = a >= UniformMinimumShape && !double.IsPositiveInfinity(a);
        inverseShape = 1.0 / a;
        uniformScale = uniform ? RepeatableMath.Exp(StirlingSeries.Correction(a)) / a : 0.0;
        sqrtShape = Math.Sqrt(a);
    }

    public double A { get; }

    // The logarithms are the repeatable ones, whose lane forms have the same bits (GammaKernel.Lanes.cs).
    public double LogPrefactor(double x)
    {
        if (centred) return A * CentredLog(x, (x - A) / A) + logConstant;
        return A * RepeatableMath.Log(x) - x + logConstant;
    }

    /// <summary>ln(x/a) − (x − a)/a, given t = (x − a)/a.</summary>
    private double CentredLog(double x, double t) =>
        Math.Abs(t) <= 0.5 ? SpecialFunctions.Log1pMinusX(t) : RepeatableMath.Log(x / A) - t;

    /// <summary>ln of the density x^(a−1) e^(−x) / Γ(a).</summary>
    public double LogDensity(double x) => LogPrefactor(x) - Math.Log(x);

    public void Tails(double x, out double lower, out double upper) =>
        Evaluate(x, out _, out lower, out upper);

    /// <summary>Density and both tails, each tail computed directly where it is the small one.</summary>
    public void Evaluate(double x, out double density, out double lower, out double upper)
    {
        if (!(x > 0)) { density = 0; lower = 0; upper = 1; return; }
        if (double.IsPositiveInfinity(x)) { density = 0; lower = 1; upper = 0; return; }
        double prefactor = RepeatableMath.Exp(LogPrefactor(x));
        density = prefactor / x;
        if (uniform && TryUniformTails(x, prefactor, out lower, out upper)) return;
        if (x < A + 1.0)
        {
            lower = Math.Min(1.0, prefactor * LowerSeries(A, x));
            upper = A < 1.0 && lower > 0.25 ? SmallShapeUpper(A, x) : 1.0 - lower;
        }
        else
        {
            upper = Math.Min(1.0, prefactor * UpperContinuedFraction(A, x));
            lower = 1.0 - upper;
        }
    }

    // P(a,x) = prefactor · Σ xⁿ / (a(a+1)…(a+n)) (DLMF 8.7.1; Numerical Recipes §6.2).
    private static double LowerSeries(double a, double x)
    {
        double ap = a, term = 1.0 / a, sum = term;
        int limit = IterationLimit(a);
        for (int n = 0; n < limit; n++)
        {
            ap += 1.0;
            term *= x / ap;
            sum += term;
            if (term <= sum * 1e-17) break;
        }
        return sum;
    }

    // For a < 1 and small x the lower tail is close to 1, and 1 − P would cancel. Splitting the series for
    // γ(a,x) (DLMF 8.7.1) after its first term gives Q = −expm1(a ln x − ln Γ(1+a)) − x^a/Γ(a)·Σ_{n≥1} (−x)ⁿ/(n!(a+n)),
    // whose two parts are of comparable size.
    private static double SmallShapeUpper(double a, double x)
    {
        double head = -SpecialFunctions.Expm1(a * Math.Log(x) - SpecialFunctions.LogGammaOnePlus(a));
        double term = 1.0, sum = 0.0;
        for (int n = 1; n < 200; n++)
        {
            term *= -x / n;
            double contribution = term / (a + n);
            sum += contribution;
            if (Math.Abs(contribution) <= 1e-17 * Math.Abs(sum)) break;
        }
        double tail = Math.Exp(a * Math.Log(x) - SpecialFunctions.LogGamma(a)) * sum;
        return Math.Clamp(head - tail, 0.0, 1.0);
    }

    // Q(a,x) = prefactor · (continued fraction) (DLMF 8.9.2; Numerical Recipes §6.2), modified Lentz.
    // The complementary error function uses it too, as erfc(x) = Q(½, x²).
    internal static double UpperContinuedFraction(double a, double x)
    {
        const double tiny = 1e-300;
        double b = x + 1.0 - a, c = 1.0 / tiny, d = 1.0 / b, h = d;
        int limit = IterationLimit(a);
        for (int i = 1; i <= limit; i++)
        {
            double an = -i * (i - a);
            b += 2.0;
            d = an * d + b;
            if (Math.Abs(d) < tiny) d = tiny;
            c = b + an / c;
            if (Math.Abs(c) < tiny) c = tiny;
            d = 1.0 / d;
            double delta = d * c;
            h *= delta;
            if (Math.Abs(delta - 1.0) <= 2.5e-16) break;
        }
        return h;
    }

    // Both expansions need O(√a) terms next to x = a.
    private static int IterationLimit(double a) => 200 + (int)Math.Min(1e6, 12.0 * Math.Sqrt(a));
}
