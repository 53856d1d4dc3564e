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
}
