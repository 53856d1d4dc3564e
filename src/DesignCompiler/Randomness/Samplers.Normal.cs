namespace DesignCompiler.Randomness;

public static partial class Samplers
{
    /// <summary>
    /// A standard normal variate by Marsaglia's polar method (Marsaglia and Bray 1964,
    /// SIAM Review 6(3)): exact, needs no tables. The second variate of each pair is discarded
    /// because the generator is a plain value with nowhere to keep it; use
    /// <see cref="StandardNormalPair"/> when both are wanted.
    /// </summary>
    public static double StandardNormal(ref Xoshiro256StarStar rng)
    {
        StandardNormalPair(ref rng, out double first, out _);
        return first;
    }

    /// <summary>Two independent standard normal variates from one accepted polar pair.</summary>
    public static void StandardNormalPair(ref Xoshiro256StarStar rng, out double first, out double second)
    {
        double u;
        double v;
        double s;
        do
        {
            u = 2.0 * rng.NextDouble() - 1.0;
            v = 2.0 * rng.NextDouble() - 1.0;
            s = u * u + v * v;
        }
        while (s >= 1.0 || s == 0.0);

        double factor = Math.Sqrt(-2.0 * Math.Log(s) / s);
        first = u * factor;
        second = v * factor;
    }

    /// <summary>A normal variate with the given mean and standard deviation (≥ 0).</summary>
    public static double Normal(ref Xoshiro256StarStar rng, double mean, double standardDeviation)
    {
        if (!(standardDeviation >= 0) || double.IsInfinity(standardDeviation) || !double.IsFinite(mean))
        {
            throw new ArgumentOutOfRangeException(nameof(standardDeviation), standardDeviation, "The mean must be finite and the standard deviation finite and non-negative.");
        }

        return mean + standardDeviation * StandardNormal(ref rng);
    }
}
