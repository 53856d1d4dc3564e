using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public sealed record OutcomeStatementSyntax(
    IdentifierSyntax Name, StringSyntax? Unit, FamilySyntax Family, TextSpan Span) : StatementSyntax(Span);

public abstract record FamilySyntax(TextSpan Span);

public sealed record BernoulliFamilySyntax(TextSpan Span) : FamilySyntax(Span);

public sealed record BinomialFamilySyntax(NumberSyntax Trials, TextSpan Span) : FamilySyntax(Span);

/// <summary>A normal outcome; <see cref="NoiseSd"/> is null when the noise is unknown.</summary>
public sealed record NormalFamilySyntax(NumberSyntax? NoiseSd, TextSpan Span) : FamilySyntax(Span);

public sealed record CountFamilySyntax(TextSpan Span) : FamilySyntax(Span);
