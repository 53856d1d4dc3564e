namespace DesignCompiler.Numerics;

/// <summary>The regularized incomplete beta function I_x(a,b), its complement and its inverse.</summary>
public static partial class IncompleteBeta
{
    /// <summary>I_x(a,b) for a, b &gt; 0; 0 for x ≤ 0 and 1 for x ≥ 1.</summary>
    public static double Regularized(double a, double b, double x)
    {
        if (!ValidParameters(a, b) || double.IsNaN(x)) return double.NaN;
        if (x <= 0) return 0;
        if (x >= 1) return 1;
        new BetaKernel(a, b).Tails(x, 1.0 - x, out double lower, out _);
        return lower;
    }

    /// <summary>1 − I_x(a,b), computed directly where it is small.</summary>
    public static double Complement(double a, double b, double x)
    {
        if (!ValidParameters(a, b) || double.IsNaN(x)) return double.NaN;
        if (x <= 0) return 1;
        if (x >= 1) return 0;
        new BetaKernel(a, b).Tails(x, 1.0 - x, out _, out double upper);
        return upper;
    }

    internal static bool ValidParameters(double a, double b) =>
        a > 0 && b > 0 && !double.IsPositiveInfinity(a) && !double.IsPositiveInfinity(b);
}
