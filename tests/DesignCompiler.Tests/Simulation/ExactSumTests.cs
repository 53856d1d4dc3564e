using System.Numerics;
using DesignCompiler.Randomness;
using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Partials;

namespace DesignCompiler.Tests.Simulation;

/// <summary>
/// The exact sums that make results independent of thread count and sharding. The reference
/// is exact rational arithmetic: every double is m·2^e, so BigInteger sums of m·2^(e+1074)
/// are the true sum (common practice).
/// </summary>
public sealed class ExactSumTests
{
    private static BigInteger Units(double x)
    {
        // x = x·2^1074 · 2^-1074, and x·2^1074 is an integer for every finite double.
        if (x == 0) return BigInteger.Zero;
        var bits = BitConverter.DoubleToInt64Bits(x);
        var exponent = (int)((bits >> 52) & 0x7FF);
        var mantissa = bits & 0xF_FFFF_FFFF_FFFFL;
        var m = exponent == 0 ? mantissa : mantissa | (1L << 52);
        var shift = exponent == 0 ? 0 : exponent - 1;
        var magnitude = new BigInteger(m) << shift;
        return x < 0 ? -magnitude : magnitude;
    }

    private static double[] Values(ulong seed, int count)
    {
        var rng = new Xoshiro256StarStar(seed);
        var values = new double[count];
        for (var i = 0; i < count; i++)
        {
            // Wildly different magnitudes and signs, where ordinary summation loses digits.
            var magnitude = Math.Pow(2, rng.NextInt(120) - 60);
            values[i] = (rng.NextDouble() - 0.5) * magnitude;
        }
        return values;
    }

    [Fact]
    public void The_sum_is_exact_and_the_same_in_any_order()
    {
        var values = Values(7, 5000);
        var forward = new ExactSum();
        foreach (var v in values) forward.Add(v);
        var backward = new ExactSum();
        for (var i = values.Length - 1; i >= 0; i--) backward.Add(values[i]);
        var halves = new ExactSum();
        var second = new ExactSum();
        for (var i = 0; i < values.Length; i++) (i % 3 == 0 ? second : halves).Add(values[i]);
        halves.Add(second);

        var expected = values.Aggregate(BigInteger.Zero, (s, v) => s + Units(v));
        Assert.Equal(expected, forward.Units);
        Assert.Equal(expected, backward.Units);
        Assert.Equal(expected, halves.Units);
        Assert.Equal(ExactText.Format(forward), ExactText.Format(halves));
    }

    [Fact]
    public void Rounding_once_gives_the_correctly_rounded_sum()
    {
        // 1 + 2^-53 + 2^-53: summed left to right in doubles it stays 1 (each 2^-53 ties to even);
        // exactly it is 1 + 2^-52, which a double holds.
        var sum = new ExactSum();
        sum.Add(1);
        sum.Add(Math.Pow(2, -53));
        sum.Add(Math.Pow(2, -53));
        Assert.Equal(1 + Math.Pow(2, -52), sum.Value);

        var cancel = new ExactSum();
        cancel.Add(1e300);
        cancel.Add(3.5);
        cancel.Add(-1e300);
        Assert.Equal(3.5, cancel.Value);
    }

    [Fact]
    public void Text_round_trips_exactly_including_negative_and_extreme_values()
    {
        foreach (var v in new[] { 0.0, -0.1, double.Epsilon, -double.MaxValue, 1.0 / 3, 123456789.125 })
        {
            var sum = new ExactSum();
            sum.Add(v);
            sum.Add(v);
            var back = new ExactSum();
            back.SetUnits(ExactText.Parse(ExactText.Format(sum)));
            Assert.Equal(sum.Units, back.Units);
        }
    }

    [Fact]
    public void A_constant_figure_has_standard_error_exactly_zero()
    {
        // Σx² − (Σx)²/n in doubles leaves rounding noise; formed exactly it is 0 (common practice: the variance of a constant).
        var moments = new Moments();
        for (var i = 0; i < 1000; i++) moments.Add(0.1);
        var estimate = moments.Estimate();
        Assert.Equal(0.0, estimate.StandardError);
        Assert.Equal(0.1, estimate.Mean, 15);
    }

    [Fact]
    public void Standard_error_matches_the_textbook_formula()
    {
        // s/√n with s² the sample variance (n − 1 divisor; common practice), values 1..10: s² = 55/6.
        var moments = new Moments();
        for (var i = 1; i <= 10; i++) moments.Add(i);
        var estimate = moments.Estimate();
        Assert.Equal(5.5, estimate.Mean, 14);
        Assert.Equal(Math.Sqrt(55.0 / 6 / 10), estimate.StandardError, 14);
    }

    [Fact]
    public void Histogram_quantiles_are_the_inverse_empirical_distribution()
    {
        // Type 1 of Hyndman and Fan (1996): the smallest x with F(x) ≥ p (common practice).
        var h = new Histogram(10);
        foreach (var x in new[] { 0, 1, 1, 2, 3, 3, 3, 4, 9, 10 }) h.Add(x);
        Assert.Equal(0, h.Quantile(5));
        Assert.Equal(3, h.Quantile(50));
        Assert.Equal(3, h.Quantile(70));
        Assert.Equal(9, h.Quantile(90));
        Assert.Equal(10, h.Quantile(95));
        Assert.Equal(3.6, h.Mean(), 14);
    }
}
