using System.Numerics;

namespace DesignCompiler.Simulation.Accumulators;

/// <summary>Exact numbers of the form n·2^e, turned into doubles with one rounding.</summary>
internal static class ScaledInteger
{
    /// <summary>
    /// n·2^e rounded to the nearest double, ties to even (IEEE 754 round-to-nearest). Only the
    /// top 53 bits and whether anything below them is non-zero matter, so the integer can be
    /// thousands of bits long. Results in the subnormal range may round twice; no figure of a
    /// simulation is that small.
    /// </summary>
    public static double ToDouble(BigInteger n, int exponent)
    {
        if (n.IsZero) return 0;
        var negative = n.Sign < 0;
        var magnitude = BigInteger.Abs(n);
        var length = (long)magnitude.GetBitLength();
        double result;
        if (length <= 53)
        {
            result = Math.ScaleB((double)(ulong)magnitude, exponent);
        }
        else
        {
            var drop = (int)(length - 53);
            var kept = magnitude >> drop;
            var remainder = magnitude - (kept << drop);
            var half = BigInteger.One << (drop - 1);
            var comparison = remainder.CompareTo(half);
            if (comparison > 0 || (comparison == 0 && !kept.IsEven)) kept += 1;
            // kept may now be 2^53, which a double still holds exactly.
            result = Math.ScaleB((double)(ulong)kept, exponent + drop);
        }
        return negative ? -result : result;
    }
}
