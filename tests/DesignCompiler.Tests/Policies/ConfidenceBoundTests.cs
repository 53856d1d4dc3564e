using DesignCompiler.Planning.Policies;

namespace DesignCompiler.Tests.Policies;

/// <summary>The published indices against the mpmath values of shared/REFERENCES.md §5 and §7.</summary>
public sealed class ConfidenceBoundTests
{
    [Theory]
    // UCB1 index x̄ + √(2 ln n / n_j): Auer, Cesa-Bianchi and Fischer (2002), Fig. 1; values UB10–UB12 (mpmath, 30 digits).
    [InlineData(0.3, 10, 100, 1.25970518243761624151347377378)]
    [InlineData(0.75, 400, 10000, 0.964596602628934723963618357029)]
    [InlineData(0.0, 1, 2, 1.17741002251547469101156932646)]
    public void Ucb1_index_matches_the_reference(double mean, double count, double total, double expected) =>
        Assert.Equal(expected, ConfidenceBounds.Ucb1(mean, count, total, upper: true), 14);

    [Fact]
    public void Ucb1_normal_index_matches_the_reference()
    {
        // UCB1-NORMAL (Auer et al. 2002, Fig. 4), rewards (1, 2, 1/2, 3/2) at n = 100: UN01 = 4.01740547870341000343871626415.
        double[] rewards = [1, 2, 0.5, 1.5];
        var mean = rewards.Average();
        var variance = rewards.Sum(r => (r - mean) * (r - mean)) / (rewards.Length - 1);
        Assert.Equal(4.01740547870341000343871626415, ConfidenceBounds.Ucb1Normal(mean, variance, 4, 100, upper: true), 13);
        // UN02: ⌈8 ln 100⌉ = 37 forced plays.
        Assert.True(ConfidenceBounds.Ucb1NormalNeedsPlays(36, 100));
        Assert.False(ConfidenceBounds.Ucb1NormalNeedsPlays(37, 100));
    }

    [Theory]
    // KL-UCB (Garivier and Cappé 2011): KU01–KU06, 50-digit bisection values at the double inputs (REFERENCES §7).
    [InlineData(0.3, 10, 100, 0, 0.756022738042071551558450184094)]
    [InlineData(0.3, 10, 100, 3, 0.881267398758224240444055065058)]
    [InlineData(0.0, 20, 1000, 0, 0.292054215615862089197785057811)]
    [InlineData(0.9, 50, 10000, 0, 0.99348792732228281018652332934)]
    [InlineData(0.5, 100, 10000, 0, 0.705083049578292180364222358146)]
    [InlineData(1.0, 5, 100, 0, 1.0)]
    public void Kl_ucb_bernoulli_index_matches_the_reference(double mean, double count, double total, double c, double expected) =>
        Assert.Equal(expected, ConfidenceBounds.KlBernoulli(mean, count, ConfidenceBounds.KlLevel(total, c), upper: true), 12);

    [Fact]
    public void Kl_ucb_closed_form_at_zero_successes()
    {
        // For x̄ = 0 the bernoulli KL is −ln(1 − q), so the index is 1 − t^(−1/N) (REFERENCES §7, KU03).
        Assert.Equal(1 - Math.Pow(1000, -1.0 / 20), ConfidenceBounds.KlBernoulli(0, 20, Math.Log(1000), true), 12);
    }

    [Fact]
    public void Kl_lower_bound_mirrors_the_upper_bound()
    {
        // The bernoulli KL is symmetric under p → 1−p, q → 1−q, so the lower bound at x̄ is 1 − the upper bound at 1 − x̄.
        var upper = ConfidenceBounds.KlBernoulli(0.3, 10, Math.Log(100), upper: true);
        var lower = ConfidenceBounds.KlBernoulli(0.7, 10, Math.Log(100), upper: false);
        Assert.Equal(1 - upper, lower, 12);
    }

    [Fact]
    public void Kl_poisson_index_meets_its_defining_equation()
    {
        // The index q solves n·d(x̄, q) = level with d(p, q) = q − p + p ln(p/q), the Poisson divergence (Garivier and Cappé 2011, §2).
        var q = ConfidenceBounds.KlPoisson(4, 10, Math.Log(200), upper: true);
        Assert.True(q > 4);
        Assert.Equal(Math.Log(200), 10 * ConfidenceBounds.PoissonKl(4, q), 9);
        var low = ConfidenceBounds.KlPoisson(4, 10, Math.Log(200), upper: false);
        Assert.True(low < 4);
        Assert.Equal(Math.Log(200), 10 * ConfidenceBounds.PoissonKl(4, low), 9);
    }

    [Fact]
    public void Kl_normal_index_is_the_gaussian_closed_form()
    {
        // Gaussian KL (p−q)²/(2σ²) gives x̄ + σ√(2·level/n) (common textbook result).
        Assert.Equal(5 + 2 * Math.Sqrt(2 * Math.Log(50) / 8), ConfidenceBounds.KlNormal(5, 2, 8, Math.Log(50), true), 13);
    }
}
