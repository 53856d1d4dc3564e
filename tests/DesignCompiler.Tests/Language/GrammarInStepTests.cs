using System.Reflection;
using System.Text.RegularExpressions;
using DesignCompiler.Syntax;
using Sprache;

namespace DesignCompiler.Tests.Language;

/// <summary>
/// grammar/trial.ebnf and the parser stay in step: every nonterminal defined there has an
/// internal static parser field named like it in PascalCase (trial-header is TrialHeader),
/// and every non-private parser field of DesignGrammar is a nonterminal of the grammar.
/// </summary>
public sealed partial class GrammarInStepTests
{
    private const BindingFlags StaticFields = BindingFlags.Static | BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.DeclaredOnly;

    /// <summary>
    /// TokenGrammar fields that are helpers of the lexical conventions rather than productions:
    /// Blank (the spaces and tabs between tokens) and AnySpace (white space and comments inside
    /// scenario braces). Any other non-private parser field must be a nonterminal.
    /// </summary>
    private static readonly string[] TokenHelpersWithoutNonterminal = ["Blank", "AnySpace"];

    [GeneratedRegex(@"\(\*.*?\*\)", RegexOptions.Singleline)]
    private static partial Regex CommentPattern();

    [GeneratedRegex(@"^([a-z][a-z0-9]*(?:-[a-z0-9]+)*)\s*=", RegexOptions.Multiline)]
    private static partial Regex DefinitionPattern();

    /// <summary>The nonterminals defined in the grammar, in file order.</summary>
    internal static IReadOnlyList<string> Nonterminals()
    {
        var text = CommentPattern().Replace(File.ReadAllText(LanguagePaths.Grammar), " ");
        return DefinitionPattern().Matches(text).Select(m => m.Groups[1].Value).ToList();
    }

    internal static string PascalCase(string kebab) =>
        string.Concat(kebab.Split('-').Select(part => char.ToUpperInvariant(part[0]) + part[1..]));

    private static bool IsParser(Type type) => type.IsGenericType && type.GetGenericTypeDefinition() == typeof(Parser<>);

    private static FieldInfo? ParserField(Type owner, string name)
    {
        var field = owner.GetField(name, StaticFields);
        return field is not null && IsParser(field.FieldType) ? field : null;
    }

    [Fact]
    public void Kebab_case_names_map_to_pascal_case_as_documented()
    {
        Assert.Equal("TrialHeader", PascalCase("trial-header"));
        Assert.Equal("Ucb1Policy", PascalCase("ucb1-policy"));
        Assert.Equal("KlUcbPolicy", PascalCase("kl-ucb-policy"));
        Assert.Equal("StringLiteral", PascalCase("string-literal"));
        Assert.Equal("Design", PascalCase("design"));
    }

    [Fact]
    public void The_grammar_file_defines_the_expected_core_nonterminals()
    {
        var names = Nonterminals();
        // A guard against a pattern that silently finds nothing.
        Assert.True(names.Count >= 50, $"found only {names.Count} nonterminals: {string.Join(", ", names)}");
        Assert.Equal("design", names[0]);
        Assert.Contains("trial-header", names);
        Assert.Contains("scenario-entry", names);
        Assert.Contains("string-character", names);
        Assert.Equal(names.Count, names.Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void Every_nonterminal_has_an_internal_static_parser_field()
    {
        var missing = new List<string>();
        foreach (var nonterminal in Nonterminals())
        {
            var name = PascalCase(nonterminal);
            var field = ParserField(typeof(DesignGrammar), name) ?? ParserField(typeof(TokenGrammar), name);
            if (field is null) missing.Add($"{nonterminal} (no parser field {name} in DesignGrammar or TokenGrammar)");
            else if (!field.IsAssembly) missing.Add($"{nonterminal} ({field.DeclaringType!.Name}.{name} is not internal)");
            else if (!field.IsInitOnly) missing.Add($"{nonterminal} ({field.DeclaringType!.Name}.{name} is not readonly)");
        }
        Assert.Empty(missing);
    }

    [Fact]
    public void Every_parser_field_of_DesignGrammar_is_a_nonterminal()
    {
        var nonterminals = Nonterminals().Select(PascalCase).ToHashSet(StringComparer.Ordinal);
        var extra = typeof(DesignGrammar).GetFields(StaticFields)
            .Where(f => !f.IsPrivate && IsParser(f.FieldType))
            .Select(f => f.Name)
            .Where(name => !nonterminals.Contains(name))
            .ToList();
        Assert.Empty(extra);
    }

    [Fact]
    public void Every_parser_field_of_TokenGrammar_is_a_nonterminal_or_a_listed_helper()
    {
        var nonterminals = Nonterminals().Select(PascalCase).ToHashSet(StringComparer.Ordinal);
        var extra = typeof(TokenGrammar).GetFields(StaticFields)
            .Where(f => !f.IsPrivate && IsParser(f.FieldType))
            .Select(f => f.Name)
            .Where(name => !nonterminals.Contains(name) && !TokenHelpersWithoutNonterminal.Contains(name))
            .ToList();
        Assert.Empty(extra);
    }

    [Fact]
    public void The_listed_token_helpers_still_exist()
    {
        // A helper that was renamed or removed should leave the exception list too.
        foreach (var helper in TokenHelpersWithoutNonterminal)
            Assert.NotNull(ParserField(typeof(TokenGrammar), helper));
    }

    [Fact]
    public void A_nonterminal_is_not_defined_in_both_grammar_classes()
    {
        var both = Nonterminals().Select(PascalCase)
            .Where(name => ParserField(typeof(DesignGrammar), name) is not null && ParserField(typeof(TokenGrammar), name) is not null)
            .ToList();
        Assert.Empty(both);
    }
}
