namespace DesignCompiler.Numerics;

public static partial class SpecialFunctions
{
    /// <summary>ln(1 + x), accurate for tiny x where forming 1 + x would discard the digits of x.</summary>
    public static double Log1p(double x)
    {
        if (double.IsNaN(x) || double.IsPositiveInfinity(x)) return x;
        double u = 1.0 + x;
        if (u == 1.0) return x;
        if (u <= 0.0) return u == 0.0 ? double.NegativeInfinity : double.NaN;
        // Goldberg's correction: the rounding committed in u is divided out again by (u − 1).
        return Math.Log(u) * (x / (u - 1.0));
    }

    /// <summary>e^x − 1, accurate for tiny x.</summary>
    public static double Expm1(double x)
    {
        if (double.IsNaN(x)) return x;
        double u = Math.Exp(x);
        if (u == 1.0) return x;
        double um1 = u - 1.0;
        if (um1 == -1.0) return -1.0;
        if (double.IsPositiveInfinity(u)) return u;
        // Kahan's correction, the mirror image of the one in Log1p.
        return um1 * (x / Math.Log(u));
    }

    /// <summary>ln(1 + x) − x, without the cancellation that subtracting x from Log1p(x) suffers near 0.</summary>
    public static double Log1pMinusX(double x)
    {
        if (double.IsNaN(x)) return x;
        if (x <= -1.0) return x == -1.0 ? double.NegativeInfinity : double.NaN;
        if (Math.Abs(x) > 0.5) return Log1p(x) - x;
        // ln(1+x) = 2 atanh(u) with u = x/(2+x); the linear part 2u − x equals −x·u exactly.
        double u = x / (2.0 + x), u2 = u * u;
        double power = u * u2, sum = 0.0;
        for (int k = 3; k < 200; k += 2)
        {
            double term = power / k;
            sum += term;
            if (Math.Abs(term) <= 1e-17 * Math.Abs(sum)) break;
            power *= u2;
        }
        return -x * u + 2.0 * sum;
    }

    /// <summary>e^(−z²/2) with z² carried in two parts, so the tail keeps relative accuracy out to z ≈ 38.</summary>
    internal static double ExpMinusHalfSquare(double z)
    {
        double hi = z * z;
        if (double.IsInfinity(hi)) return 0.0;
        double lo = Math.FusedMultiplyAdd(z, z, -hi);
        return Math.Exp(-0.5 * hi) * (1.0 - 0.5 * lo);
    }
}
