namespace DesignCompiler.Randomness;

public static partial class Samplers
{
    /// <summary>
    /// A Binomial(n, p) variate, exact. With p' = min(p, 1 − p) (the answer is reflected as
    /// n − k when p &gt; ½): sequential-search inversion when n·p' &lt; 10, otherwise Hörmann's
    /// BTRS transformed rejection with squeeze (Hörmann 1993, "The generation of binomial
    /// random variates", J. Statist. Comput. Simul. 46:101–110), whose expected cost does not
    /// grow with n. The acceptance test compares ln V with the log-ratio of the binomial mass
    /// to its mode, as the rejection principle requires.
    /// </summary>
    public static int Binomial(ref Xoshiro256StarStar rng, int n, double p)
    {
        if (n < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(n), n, "The number of trials must be non-negative.");
        }

        if (!(p >= 0.0 && p <= 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(p), p, "The probability must lie in [0, 1].");
        }

        bool reflect = p > 0.5;
        double smaller = reflect ? 1.0 - p : p;
        int successes;
        if (n == 0 || smaller == 0.0)
        {
            successes = 0;
        }
        else if (n * smaller < 10.0)
        {
            successes = BinomialByInversion(ref rng, n, smaller);
        }
        else
        {
            successes = BinomialByTransformedRejection(ref rng, n, smaller);
        }

        return reflect ? n - successes : successes;
    }

    /// <summary>
    /// Walks the cumulative distribution from 0 using f(x)/f(x−1) = ((n+1)/x − 1)·p/q. Expected
    /// steps n·p + 1 &lt; 11. If rounding leaves the summed mass short of u, the draw restarts
    /// rather than return an impossible value.
    /// </summary>
    private static int BinomialByInversion(ref Xoshiro256StarStar rng, int n, double p)
    {
        double q = 1.0 - p;
        double odds = p / q;
        double scaledOdds = (n + 1) * odds;
        double massAtZero = Math.Pow(q, n);
        while (true)
        {
            double u = rng.NextDouble();
            double mass = massAtZero;
            int x = 0;
            while (u > mass)
            {
                u -= mass;
                x++;
                if (x > n)
                {
                    break;
                }

                mass *= scaledOdds / x - odds;
            }

            if (x <= n)
            {
                return x;
            }
        }
    }

    /// <summary>BTRS for p ≤ ½ and n·p ≥ 10; constants as published by Hörmann (1993).</summary>
    private static int BinomialByTransformedRejection(ref Xoshiro256StarStar rng, int n, double p)
    {
        double q = 1.0 - p;
        double spq = Math.Sqrt(n * p * q);
        double b = 1.15 + 2.53 * spq;
        double a = -0.0873 + 0.0248 * b + 0.01 * p;
        double c = n * p + 0.5;
        double vr = 0.92 - 4.2 / b;

        // Needed only when the box test fails, which happens for a minority of candidates.
        double alpha = (2.83 + 5.1 / b) * spq;
        double logOdds = Math.Log(p / q);
        int mode = (int)Math.Floor((n + 1) * p);
        double logModeTerms = LogFactorial.Of(mode) + LogFactorial.Of(n - mode);

        while (true)
        {
            double u = rng.NextDouble() - 0.5;
            double v = rng.NextDouble();
            double us = 0.5 - Math.Abs(u);

            // Kept in double until range-checked: us = 0 gives an infinite candidate.
            double candidate = Math.Floor((2.0 * a / us + b) * u + c);
            if (!(candidate >= 0.0 && candidate <= n))
            {
                continue;
            }

            int k = (int)candidate;
            if (us >= 0.07 && v <= vr)
            {
                return k;
            }

            v *= alpha / (a / (us * us) + b);
            double logRatio = logModeTerms - LogFactorial.Of(k) - LogFactorial.Of(n - k) + (k - mode) * logOdds;
            if (Math.Log(v) <= logRatio)
            {
                return k;
            }
        }
    }
}
