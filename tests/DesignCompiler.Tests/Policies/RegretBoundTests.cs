using DesignCompiler.Planning.Policies;
using DesignCompiler.Tests.Testing;
using Xunit.Abstractions;

namespace DesignCompiler.Tests.Policies;

/// <summary>Simulated regret of the product's policies against published bounds (shared/REFERENCES.md §5–6).</summary>
public sealed class RegretBoundTests(ITestOutputHelper output)
{
    private static Binding.CheckedDesign Bernoulli(int arms) => TestDesigns.FromText(
        "trial \"bandit\" {\n  seed 1\n  rounds 2\n  outcome y: bernoulli\n  default prior beta(1, 1)\n"
        + string.Concat(Enumerable.Range(0, arms).Select(i => $"  arm A{i} \"arm {i}\"\n"))
        + "  plots 1 per round\n}\n");

    [Fact]
    public void Ucb1_two_arm_regret_stays_below_theorem_1()
    {
        // Auer, Cesa-Bianchi and Fischer (2002), Theorem 1, means (0.9, 0.8), n = 10⁴: bound UB01 = 737.256…
        var regret = SequentialBandit.MeanRegret(Bernoulli(2), new Ucb1Policy(), [0.9, 0.8], [10_000], runs: 40, seed: 11, sampleFromShares: false);
        output.WriteLine($"UCB1 K=2 mean regret at 10^4: {regret[0]}");
        Assert.InRange(regret[0], 1, 737.256216571464264173051748532);
    }

    [Fact]
    public void Ucb1_ten_arm_regret_stays_below_theorem_1()
    {
        // Theorem 1 for best 0.5 and nine arms at 0.4, n = 10⁴: bound UB03 = 6635.31.
        var regret = SequentialBandit.MeanRegret(Bernoulli(10), new Ucb1Policy(), [0.5, .4, .4, .4, .4, .4, .4, .4, .4, .4], [10_000], runs: 20, seed: 12, sampleFromShares: false);
        output.WriteLine($"UCB1 K=10 mean regret at 10^4: {regret[0]}");
        Assert.InRange(regret[0], 1, 6635.30594914317837755746573679);
    }

    [Fact]
    public void Sequential_thompson_regret_grows_like_log_n_near_the_lai_robbins_constant()
    {
        // Lai and Robbins (1985): regret ≥ (C + o(1)) ln n with C = Σ Δ/KL(μ, μ*); for (0.9, 0.8), C = 2.2521 (LR03).
        // Thompson sampling attains the constant asymptotically (Chapelle and Li 2011 report the slope close to it).
        // Here Thompson is driven by the product's exact P(best) with one plot per round (see SequentialBandit).
        // The check is on the growth rate: the slope of mean regret against ln n between n = 200 and 2,000
        // lies within [0.5C, 2C] (measured: 2.19 with C = 2.25). At these horizons R(n)/ln n itself is still
        // below C (1.13 here) because the bound is asymptotic, so the ratio is only required to be positive
        // and below 2C.
        const double c = 2.25209969852452904904305551715;
        var regret = SequentialBandit.MeanRegret(Bernoulli(2), new ThompsonPolicy(), [0.9, 0.8], [200, 2_000], runs: 40, seed: 13, sampleFromShares: true);
        var slope = (regret[1] - regret[0]) / Math.Log(10);
        var ratio = regret[1] / Math.Log(2_000);
        output.WriteLine($"Thompson K=2 regret at 200 {regret[0]}, at 2000 {regret[1]}, slope {slope}, ratio {ratio}, C {c}");
        Assert.InRange(slope, 0.5 * c, 2 * c);
        Assert.InRange(ratio, 0.1, 2 * c);
    }
}
