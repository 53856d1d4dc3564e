using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public sealed record ScenarioStatementSyntax(
    StringSyntax Name, bool FromPrior, IReadOnlyList<ScenarioEntrySyntax> Entries, TextSpan Span) : StatementSyntax(Span);

public enum ScenarioEntryKind
{
    EveryArm,
    Arm,
    Noise,
}

public sealed record ScenarioEntrySyntax(ScenarioEntryKind Kind, IdentifierSyntax? Arm, NumberSyntax Value, TextSpan Span);
