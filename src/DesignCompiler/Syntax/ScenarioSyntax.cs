using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

public sealed record ScenarioStatementSyntax(
    StringSyntax Name, bool FromPrior, IReadOnlyList<ScenarioEntrySyntax> Entries, TextSpan Span) : StatementSyntax(Span);

public enum ScenarioEntryKind
{
    EveryArm,
    Arm,
    Noise,

    /// <summary>Every arm shifts by one random amount per round (sd).</summary>
    Season,

    /// <summary>Each arm shifts by its own random amount per round (sd).</summary>
    Interaction,

    /// <summary>Each block lifts or lowers every arm for the whole trial (sd).</summary>
    BlockEffect,

    /// <summary>A share of plots lost at random, for every arm or for the named one (%).</summary>
    Missing,

    /// <summary>Counts only: the shape of the gamma mixing a plot's Poisson mean.</summary>
    Dispersion,
}

public sealed record ScenarioEntrySyntax(ScenarioEntryKind Kind, IdentifierSyntax? Arm, NumberSyntax Value, TextSpan Span);
