using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public enum CriterionMetric
{
    /// <summary>Posterior probability of being the best arm.</summary>
    Best,

    /// <summary>Expected loss against the best arm, in outcome units.</summary>
    Loss,
}

public enum Comparison
{
    AtLeast,
    AtMost,
    Above,
    Below,
}

public sealed record CriterionSyntax(CriterionMetric Metric, Comparison Comparison, NumberSyntax Threshold, TextSpan Span);

public sealed record StopStatementSyntax(CriterionSyntax Criterion, NumberSyntax? AfterRound, TextSpan Span) : StatementSyntax(Span);

public sealed record DropStatementSyntax(CriterionSyntax Criterion, NumberSyntax? AfterRound, TextSpan Span) : StatementSyntax(Span);
