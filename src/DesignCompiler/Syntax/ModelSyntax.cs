using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

/// <summary>
/// <c>rounding largest-remainder</c> or <c>rounding randomized</c>: how the policy's shares
/// become whole plots.
/// </summary>
public sealed record RoundingStatementSyntax(KeywordSyntax Method, TextSpan Span) : StatementSyntax(Span);

/// <summary>
/// <c>model independent</c>, or <c>model adjusts for block [and round]</c> / <c>… for round</c>:
/// whether the posterior of a normal outcome separates field and season effects from arm effects.
/// </summary>
public sealed record ModelStatementSyntax(bool AdjustsForBlock, bool AdjustsForRound, TextSpan Span) : StatementSyntax(Span);
