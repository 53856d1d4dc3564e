using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public sealed record SeedStatementSyntax(NumberSyntax Value, TextSpan Span) : StatementSyntax(Span);

public sealed record RoundsStatementSyntax(NumberSyntax Value, TextSpan Span) : StatementSyntax(Span);

/// <summary><c>goal maximize</c> or <c>goal minimize</c>.</summary>
public sealed record GoalStatementSyntax(KeywordSyntax Direction, TextSpan Span) : StatementSyntax(Span);

/// <summary>Money per outcome unit, with an optional currency name.</summary>
public sealed record PriceStatementSyntax(NumberSyntax Value, StringSyntax? Currency, TextSpan Span) : StatementSyntax(Span);

public sealed record PlotsStatementSyntax(NumberSyntax Count, TextSpan Span) : StatementSyntax(Span);

public sealed record BlockStatementSyntax(
    IdentifierSyntax Name, NumberSyntax Plots, NumberSyntax? Rows, NumberSyntax? Columns, TextSpan Span) : StatementSyntax(Span);

public sealed record ControlStatementSyntax(IdentifierSyntax Arm, TextSpan Span) : StatementSyntax(Span);
