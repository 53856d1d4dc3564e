namespace DesignCompiler.Randomness;

public static partial class Samplers
{
    /// <summary>The largest mean accepted, so that every plausible draw fits in an int.</summary>
    public const double MaximumPoissonMean = 1e9;

    /// <summary>
    /// A Poisson(λ) variate, exact: sequential-search inversion for λ &lt; 10 (expected λ + 1
    /// steps), otherwise Hörmann's PTRS transformed rejection with squeeze (Hörmann 1993,
    /// "The transformed rejection method for generating Poisson random variables",
    /// Insurance: Mathematics and Economics 12:39–45), whose expected cost does not grow with λ.
    /// </summary>
    public static int Poisson(ref Xoshiro256StarStar rng, double lambda)
    {
        if (!(lambda >= 0.0 && lambda <= MaximumPoissonMean))
        {
            throw new ArgumentOutOfRangeException(nameof(lambda), lambda, "The mean must lie in [0, 1e9].");
        }

        if (lambda == 0.0)
        {
            return 0;
        }

        return lambda < 10.0
            ? PoissonByInversion(ref rng, lambda)
            : PoissonByTransformedRejection(ref rng, lambda);
    }

    /// <summary>
    /// Walks the cumulative distribution with f(k) = f(k−1)·λ/k. For λ &lt; 10 the mass beyond
    /// k = 200 is far below double resolution, so reaching it means rounding left the summed
    /// mass short of u, and the draw restarts.
    /// </summary>
    private static int PoissonByInversion(ref Xoshiro256StarStar rng, double lambda)
    {
        const int giveUpAt = 200;
        double massAtZero = Math.Exp(-lambda);
        while (true)
        {
            double u = rng.NextDouble();
            double mass = massAtZero;
            int k = 0;
            while (u > mass && k <= giveUpAt)
            {
                u -= mass;
                k++;
                mass *= lambda / k;
            }

            if (k <= giveUpAt)
            {
                return k;
            }
        }
    }

    /// <summary>PTRS for λ ≥ 10; constants as published by Hörmann (1993).</summary>
    private static int PoissonByTransformedRejection(ref Xoshiro256StarStar rng, double lambda)
    {
        double sqrtLambda = Math.Sqrt(lambda);
        double logLambda = Math.Log(lambda);
        double b = 0.931 + 2.53 * sqrtLambda;
        double a = -0.059 + 0.02483 * b;
        double logInverseAlpha = Math.Log(1.1239 + 1.1328 / (b - 3.4));
        double vr = 0.9277 - 3.6224 / (b - 2.0);

        while (true)
        {
            double u = rng.NextDouble() - 0.5;
            double v = rng.NextDouble();
            double us = 0.5 - Math.Abs(u);

            // Kept in double until range-checked: us = 0 gives an infinite candidate.
            double candidate = Math.Floor((2.0 * a / us + b) * u + lambda + 0.43);
            if (us >= 0.07 && v <= vr)
            {
                return (int)candidate;
            }

            // Beyond int.MaxValue the Poisson mass for λ ≤ 1e9 is zero in double precision.
            if (!(candidate >= 0.0 && candidate <= int.MaxValue) || (us < 0.013 && v > us))
            {
                continue;
            }

            int k = (int)candidate;
            double logHat = Math.Log(v) + logInverseAlpha - Math.Log(a / (us * us) + b);
            if (logHat <= -lambda + k * logLambda - LogFactorial.Of(k))
            {
                return k;
            }
        }
    }
}
