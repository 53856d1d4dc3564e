namespace DesignCompiler.Planning.Policies;

/// <summary>
/// The confidence indices of the published bandit rules, as pure functions of counts and
/// means. Natural logarithms throughout.
/// </summary>
public static class ConfidenceBounds
{
    /// <summary>UCB1 (Auer, Cesa-Bianchi and Fischer 2002, Fig. 1): x̄ ± √(2 ln n / n_j).</summary>
    public static double Ucb1(double mean, double count, double total, bool upper) =>
        mean + (upper ? 1 : -1) * Math.Sqrt(2 * Math.Log(total) / count);

    /// <summary>
    /// UCB1-NORMAL (Auer et al. 2002, Fig. 4): x̄ ± √(16 · s² · ln(n − 1) / n_j), with s² the
    /// sample variance. The rule first plays any arm with fewer than ⌈8 ln n⌉ plays; see
    /// <see cref="Ucb1NormalNeedsPlays"/>.
    /// </summary>
    public static double Ucb1Normal(double mean, double sampleVariance, double count, double total, bool upper) =>
        mean + (upper ? 1 : -1) * Math.Sqrt(16 * sampleVariance * Math.Log(Math.Max(total - 1, 1)) / count);

    public static bool Ucb1NormalNeedsPlays(double count, double total) =>
        count < Math.Ceiling(8 * Math.Log(Math.Max(total, 1)));

    /// <summary>KL-UCB's exploration level log t + c·log log t (Garivier and Cappé 2011); c applies once log log t > 0.</summary>
    public static double KlLevel(double total, double c)
    {
        var log = Math.Log(Math.Max(total, 1));
        return c > 0 && total >= 3 ? log + c * Math.Log(log) : log;
    }

    /// <summary>Bernoulli KL divergence d(p, q) = p ln(p/q) + (1−p) ln((1−p)/(1−q)).</summary>
    public static double BernoulliKl(double p, double q)
    {
        const double eps = 1e-15;
        q = Math.Clamp(q, eps, 1 - eps);
        var a = p <= 0 ? 0 : p * Math.Log(p / q);
        var b = p >= 1 ? 0 : (1 - p) * Math.Log((1 - p) / (1 - q));
        return a + b;
    }

    /// <summary>Poisson KL divergence d(p, q) = q − p + p ln(p/q).</summary>
    public static double PoissonKl(double p, double q) => q - p + (p <= 0 ? 0 : p * Math.Log(p / q));

    /// <summary>
    /// KL-UCB for a bernoulli mean: the largest q in [x̄, 1] (or, for a lower bound, the smallest
    /// in [0, x̄]) with n·d(x̄, q) ≤ level, by bisection to 1e-13.
    /// </summary>
    public static double KlBernoulli(double mean, double count, double level, bool upper)
    {
        double inside = mean, outside = upper ? 1 : 0;
        if (count * BernoulliKl(mean, outside) <= level) return outside;
        for (var k = 0; k < 200 && Math.Abs(outside - inside) > 1e-13; k++)
        {
            var mid = 0.5 * (inside + outside);
            if (count * BernoulliKl(mean, mid) <= level) inside = mid; else outside = mid;
        }
        return inside;
    }

    /// <summary>KL-UCB for a Poisson mean, with the Poisson divergence; the upper search range doubles until it brackets.</summary>
    public static double KlPoisson(double mean, double count, double level, bool upper)
    {
        double inside = mean, outside;
        if (upper)
        {
            outside = Math.Max(2 * mean, 1);
            for (var k = 0; k < 200 && count * PoissonKl(mean, outside) <= level; k++) outside *= 2;
        }
        else
        {
            outside = 0;
            if (count * PoissonKl(mean, 1e-300) <= level) return 0;
        }
        for (var k = 0; k < 200 && Math.Abs(outside - inside) > 1e-13 * Math.Max(1, mean); k++)
        {
            var mid = 0.5 * (inside + outside);
            if (count * PoissonKl(mean, Math.Max(mid, 1e-300)) <= level) inside = mid; else outside = mid;
        }
        return inside;
    }

    /// <summary>KL-UCB for a normal mean with sd σ: the Gaussian divergence (p−q)²/(2σ²) gives x̄ ± σ√(2·level/n).</summary>
    public static double KlNormal(double mean, double sd, double count, double level, bool upper) =>
        mean + (upper ? 1 : -1) * sd * Math.Sqrt(2 * level / count);
}
