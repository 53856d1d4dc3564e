using DesignCompiler.Diagnostics;
using DesignCompiler.Text;
using Sprache;

namespace DesignCompiler.Syntax;

/// <summary>The syntax tree of a design and the syntax errors found in it.</summary>
/// <param name="BrokenStatements">The keywords of statements on lines that did not parse.</param>
public sealed record ParseResult(DesignSyntax Syntax, IReadOnlyList<Diagnostic> Diagnostics, IReadOnlySet<string> BrokenStatements)
{
    public bool HasErrors => Diagnostics.Any(d => d.Severity == Severity.Error);
}

/// <summary>Text to syntax tree. Never throws for bad input; every broken line becomes a diagnostic.</summary>
public static class DesignParser
{
    /// <summary>Design files are typed by hand; anything larger is a mistake, not a design.</summary>
    public const int MaxCharacters = 4 * 1024 * 1024;

    private static readonly IReadOnlyDictionary<string, DiagnosticDescriptor> ByCode =
        new[]
        {
            DiagnosticCatalog.Unexpected, DiagnosticCatalog.UnknownStatement, DiagnosticCatalog.TrailingText,
            DiagnosticCatalog.MissingHeader, DiagnosticCatalog.UnclosedTrial, DiagnosticCatalog.TextAfterTrial,
        }.ToDictionary(d => d.Id);

    public static ParseResult Parse(SourceText source)
    {
        if (source.Content.Length > MaxCharacters)
        {
            var tooLarge = new Diagnostic(DiagnosticCatalog.InputTooLarge, SourceLocation.In(source, new TextSpan(0, 0)),
                [FormattableString.Invariant($"the design file has {source.Content.Length:N0} characters; the limit is {MaxCharacters:N0}")],
                "a design file is a few hundred lines; check that the right file was given");
            return new ParseResult(new DesignSyntax(null, [], new TextSpan(0, 0)), [tooLarge], new HashSet<string> { "*" });
        }

        var parsed = DesignGrammar.Design(new Input(source.Content)).Value;
        var diagnostics = parsed.Errors
            .Select(e => new Diagnostic(ByCode[e.Code], SourceLocation.In(source, e.Span), [e.Message], e.Hint))
            .ToList();
        var broken = parsed.Errors.SelectMany(e => e.StatementKeywords ?? []).ToHashSet(StringComparer.Ordinal);
        return new ParseResult(parsed.Syntax, diagnostics, broken);
    }
}
