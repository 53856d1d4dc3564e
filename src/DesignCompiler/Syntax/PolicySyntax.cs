using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public enum PolicyKind
{
    Thompson,
    TopTwoThompson,
    Ucb1,
    KlUcb,
    EpsilonGreedy,
    ExploreThenCommit,
    Equal,
}

/// <summary>
/// The policy as written. <see cref="Parameter"/> is the one number a policy may take
/// (top-two β, KL-UCB c, ε, or the exploration rounds).
/// </summary>
public sealed record PolicySyntax(PolicyKind Kind, NumberSyntax? Parameter, bool Decreasing, TextSpan Span);

public sealed record PolicyStatementSyntax(PolicySyntax Policy, TextSpan Span) : StatementSyntax(Span);
