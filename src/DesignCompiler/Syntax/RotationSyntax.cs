using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public abstract record RotationStatementSyntax(TextSpan Span) : StatementSyntax(Span);

/// <summary>After a plot grows one of the target arms, that arm rests on that plot for this many rounds.</summary>
public sealed record RestRotationSyntax(LimitTargetSyntax Target, NumberSyntax Rounds, TextSpan Span) : RotationStatementSyntax(Span);

/// <summary><c>Arm</c> may not be sown on a plot that grew <c>Previous</c> in the round before.</summary>
public sealed record AfterRotationSyntax(IdentifierSyntax Arm, IdentifierSyntax Previous, TextSpan Span) : RotationStatementSyntax(Span);
