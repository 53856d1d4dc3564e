using System.Globalization;
using System.Text;
using DesignCompiler.Text;
using Sprache;

namespace DesignCompiler.Syntax;

/// <summary>
/// The lexical productions of grammar/trial.ebnf (identifier, integer, number, string,
/// letter, digit, string-character) and the small combinators every statement uses.
/// Tokens never swallow line breaks: a statement ends with its line.
/// </summary>
internal static class TokenGrammar
{
    internal static readonly Parser<char> Letter =
        Parse.Char(c => c is >= 'a' and <= 'z' or >= 'A' and <= 'Z', "letter");

    internal static readonly Parser<char> Digit = Parse.Char(c => c is >= '0' and <= '9', "digit");

    private static readonly Parser<char> IdentifierCharacter =
        Letter.Or(Digit).Or(Parse.Char('_')).Or(Parse.Char('-'));

    /// <summary>Spaces and tabs: the only white space allowed inside a statement.</summary>
    internal static readonly Parser<string> Blank = Parse.Chars(" \t").Many().Text();

    /// <summary>Any white space including line breaks, for inside scenario braces.</summary>
    internal static readonly Parser<string> AnySpace =
        Parse.Chars(" \t\r\n").AtLeastOnce().Text().Or(Comment).Many().Select(parts => string.Concat(parts));

    internal static Parser<string> Comment =>
        from hash in Parse.Char('#')
        from text in Parse.CharExcept("\r\n").Many().Text()
        select text;

    internal static readonly Parser<IdentifierSyntax> Identifier =
        Located(
            from first in Letter
            from rest in IdentifierCharacter.Many().Text()
            select first + rest,
            (name, span) => new IdentifierSyntax(name, span)).Named("a name").Token();

    internal static readonly Parser<NumberSyntax> Integer =
        Located(Digit.AtLeastOnce().Text(), MakeNumber).Named("a whole number").Token();

    internal static readonly Parser<NumberSyntax> Number =
        Located(
            from sign in Parse.Char('-').Optional()
            from whole in Digit.AtLeastOnce().Text()
            from fraction in (from dot in Parse.Char('.') from digits in Digit.AtLeastOnce().Text() select "." + digits).Optional()
            from exponent in (
                from e in Parse.Chars("eE")
                from s in Parse.Chars("+-").Optional()
                from digits in Digit.AtLeastOnce().Text()
                select "e" + (s.IsDefined ? s.Get().ToString() : "") + digits).Optional()
            select (sign.IsDefined ? "-" : "") + whole + fraction.GetOrElse("") + exponent.GetOrElse(""),
            MakeNumber).Named("a number").Token();

    internal static readonly Parser<char> StringCharacter =
        Parse.Char('\\').Then(_ => Parse.Chars("\"\\")).Or(Parse.CharExcept("\"\\\r\n"));

    internal static readonly Parser<StringSyntax> StringLiteral =
        Located(
            from open in Parse.Char('"')
            from body in StringCharacter.Many().Text()
            from close in Parse.Char('"').Named("'\"' to close the string on the same line")
            select body,
            (value, span) => new StringSyntax(value, span)).Named("a quoted string").Token();

    /// <summary>
    /// A reserved word. The whole word is read and compared, so a misspelt keyword fails
    /// where the word starts ("expected 'policy', found 'polcy'"), not halfway through it.
    /// </summary>
    internal static Parser<KeywordSyntax> Keyword(string word) =>
        Located<string, KeywordSyntax>(
            input =>
            {
                var source = input.Source;
                var end = input.Position;
                while (end < source.Length && IsIdentifierCharacter(source[end])) end++;
                if (end - input.Position != word.Length || string.CompareOrdinal(source, input.Position, word, 0, word.Length) != 0)
                    return Result.Failure<string>(input, $"expected '{word}'", [$"'{word}'"]);
                var rest = input;
                for (var i = 0; i < word.Length; i++) rest = rest.Advance();
                return Result.Success(word, rest);
            },
            (text, span) => new KeywordSyntax(text, span)).Token();

    private static bool IsIdentifierCharacter(char c) => char.IsAsciiLetterOrDigit(c) || c is '_' or '-';

    /// <summary>Punctuation such as <c>{</c>, <c>&gt;=</c> or <c>%</c>.</summary>
    internal static Parser<KeywordSyntax> Symbol(string text) =>
        Located(Parse.String(text).Text(), (t, span) => new KeywordSyntax(t, span)).Named($"'{text}'").Token();

    /// <summary>Consumes spaces and tabs after a token, never a line break.</summary>
    internal static Parser<T> Token<T>(this Parser<T> parser) =>
        from value in parser
        from blank in Blank
        select value;

    /// <summary>Runs a parser and hands its value and source span (without trailing blanks) to a node constructor.</summary>
    internal static Parser<TNode> Located<T, TNode>(Parser<T> parser, Func<T, TextSpan, TNode> make) =>
        input =>
        {
            var result = parser(input);
            if (!result.WasSuccessful)
                return Result.Failure<TNode>(result.Remainder, result.Message, result.Expectations);
            return Result.Success(make(result.Value, SpanBetween(input, result.Remainder)), result.Remainder);
        };

    internal static TextSpan SpanBetween(IInput start, IInput end)
    {
        var stop = end.Position;
        while (stop > start.Position && start.Source[stop - 1] is ' ' or '\t') stop--;
        return TextSpan.FromBounds(start.Position, stop);
    }

    private static NumberSyntax MakeNumber(string text, TextSpan span) =>
        new(text, double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture), IsIntegerText(text), span);

    /// <summary>Whole when written without a fraction or exponent; the sign is the range check's business.</summary>
    private static bool IsIntegerText(string text)
    {
        var digits = text.StartsWith('-') ? text[1..] : text;
        foreach (var c in digits)
            if (c is < '0' or > '9') return false;
        return digits.Length > 0;
    }

    /// <summary>Resolves escapes the way <see cref="StringLiteral"/> does, for tests and messages.</summary>
    internal static string Quote(string value)
    {
        var builder = new StringBuilder("\"");
        foreach (var c in value)
            builder.Append(c is '"' or '\\' ? "\\" + c : c.ToString());
        return builder.Append('"').ToString();
    }
}
