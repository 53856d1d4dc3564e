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
        // ln(1+x) = 2 atanh(u) with u = x/(2+x); the linear part 2u − x equals −x·u exactly, and the rest is
        // 2u³ Σ_k u^(2k)/(2k+3), summed by Horner to a degree that suits |u| ≤ 1/3.
        double u = x / (2.0 + x), v = u * u;
        double series;
        if (v < 4e-4)
        {
            series = 1.0 / 3 + v * (1.0 / 5 + v * (1.0 / 7 + v * (1.0 / 9 + v * (1.0 / 11 + v * (1.0 / 13)))));
        }
        else if (v < 0.0121)
        {
            series = 1.0 / 3 + v * (1.0 / 5 + v * (1.0 / 7 + v * (1.0 / 9 + v * (1.0 / 11 + v * (1.0 / 13
                + v * (1.0 / 15 + v * (1.0 / 17 + v * (1.0 / 19 + v * (1.0 / 21 + v * (1.0 / 23))))))))));
        }
        else
        {
            series = 0.0;
            for (int k = 43; k >= 3; k -= 2) series = series * v + 1.0 / k;
        }
        return -x * u + 2.0 * u * v * series;
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
