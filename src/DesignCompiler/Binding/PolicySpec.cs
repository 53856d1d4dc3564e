using DesignCompiler.Syntax;
using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>The checked policy with every parameter filled in (defaults included).</summary>
public sealed record PolicySpec(PolicyKind Kind, double Parameter, bool Decreasing, TextSpan Span)
{
    /// <summary>Top-two Thompson's β (Russo 2016 uses 1/2).</summary>
    public const double DefaultTopTwoBeta = 0.5;

    /// <summary>KL-UCB's c; the regret theorem of Garivier and Cappé (2011) uses 3, their experiments 0.</summary>
    public const double DefaultKlUcbC = 0;

    public static PolicySpec Default { get; } = new(PolicyKind.Thompson, 0, false, default);

    public string Name => Kind switch
    {
        PolicyKind.Thompson => "thompson",
        PolicyKind.TopTwoThompson => "top-two thompson",
        PolicyKind.Ucb1 => "ucb1",
        PolicyKind.KlUcb => "kl-ucb",
        PolicyKind.EpsilonGreedy => "epsilon-greedy",
        PolicyKind.ExploreThenCommit => "explore-then-commit",
        _ => "equal",
    };
}
