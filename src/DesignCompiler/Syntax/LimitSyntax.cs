using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public enum LimitTargetKind
{
    EveryArm,
    Control,
    Arm,
}

/// <summary>Whom a limit or rotation rule is about: every arm, the control, or one arm.</summary>
public sealed record LimitTargetSyntax(LimitTargetKind Kind, IdentifierSyntax? Arm, TextSpan Span);

public sealed record LimitStatementSyntax(LimitTargetSyntax Target, LimitRuleSyntax Rule, TextSpan Span) : StatementSyntax(Span);

public abstract record LimitRuleSyntax(TextSpan Span);

public enum BoundDirection
{
    AtLeast,
    AtMost,
}

public enum LimitScope
{
    PerRound,
    PerBlock,
}

/// <summary>A whole number of plots, or a share in percent.</summary>
public sealed record AmountSyntax(NumberSyntax Value, bool IsPercent, TextSpan Span);

public sealed record BoundRuleSyntax(BoundDirection Direction, AmountSyntax Amount, LimitScope Scope, TextSpan Span) : LimitRuleSyntax(Span);

public sealed record StockRuleSyntax(NumberSyntax Plots, TextSpan Span) : LimitRuleSyntax(Span);

public sealed record WindowRuleSyntax(NumberSyntax? FromRound, NumberSyntax? UntilRound, TextSpan Span) : LimitRuleSyntax(Span);
