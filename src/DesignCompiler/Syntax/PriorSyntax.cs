using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public abstract record PriorSyntax(TextSpan Span);

public sealed record BetaPriorSyntax(NumberSyntax A, NumberSyntax B, TextSpan Span) : PriorSyntax(Span);

/// <summary>
/// A normal prior on the mean. <see cref="Noise"/> and <see cref="Worth"/> are the
/// user's guess of the plot-to-plot sd and how many plots' worth of confidence it carries,
/// used when the outcome's noise is unknown.
/// </summary>
public sealed record NormalPriorSyntax(
    NumberSyntax Mean, NumberSyntax Sd, NumberSyntax? Noise, NumberSyntax? Worth, TextSpan Span) : PriorSyntax(Span);

public sealed record GammaPriorSyntax(NumberSyntax Shape, NumberSyntax Rate, TextSpan Span) : PriorSyntax(Span);

public sealed record DefaultPriorStatementSyntax(PriorSyntax Prior, TextSpan Span) : StatementSyntax(Span);
