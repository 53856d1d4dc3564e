using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public sealed record ArmStatementSyntax(
    IdentifierSyntax Code, StringSyntax Label, IReadOnlyList<ArmOptionSyntax> Options, TextSpan Span) : StatementSyntax(Span);

public abstract record ArmOptionSyntax(TextSpan Span);

public sealed record ArmPriorOptionSyntax(PriorSyntax Prior, TextSpan Span) : ArmOptionSyntax(Span);

public sealed record ArmCostOptionSyntax(NumberSyntax Cost, TextSpan Span) : ArmOptionSyntax(Span);
