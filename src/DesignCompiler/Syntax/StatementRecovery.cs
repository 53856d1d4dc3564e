using DesignCompiler.Text;
using Sprache;

namespace DesignCompiler.Syntax;

/// <summary>One statement line: either the statement or the error that stopped it.</summary>
internal sealed record StatementOrError(StatementSyntax? Statement, SyntaxError? Error);

/// <summary>The design's syntax tree and every syntax error found on the way.</summary>
internal sealed record ParsedDesign(DesignSyntax Syntax, IReadOnlyList<SyntaxError> Errors);

/// <summary>
/// Error recovery at statement granularity. Sprache reports one failure per parse, but a
/// person fixing a design wants every broken line at once, so each line is parsed on
/// its own: a line that fails becomes a <see cref="SyntaxError"/> and parsing resumes on
/// the next line. The top rule therefore never fails.
/// </summary>
internal static class StatementRecovery
{
    internal const string UnexpectedCode = "TD1001";
    internal const string UnknownStatementCode = "TD1002";
    internal const string TrailingTextCode = "TD1003";
    internal const string MissingHeaderCode = "TD1004";
    internal const string UnclosedTrialCode = "TD1005";
    internal const string TextAfterTrialCode = "TD1006";

    internal static Parser<StatementOrError> StatementLine(Parser<StatementSyntax> statement) =>
        input =>
        {
            var at = SkipSeparators(input);
            if (at.AtEnd || at.Current == '}')
                return Result.Failure<StatementOrError>(input, "end of statements", ["a statement"]);

            var result = statement(at);
            if (result.WasSuccessful)
            {
                var end = LineEnd(result.Remainder);
                if (end is not null)
                    return Result.Success(new StatementOrError(result.Value, null), end);
                var trailing = new SyntaxError(TrailingTextCode,
                    $"unexpected {Describe(result.Remainder)} after the statement; write one statement per line",
                    "start a new line for the next statement, or put a comment after '#'",
                    WordSpan(result.Remainder), [WordAt(at), WordAt(result.Remainder)]);
                return Result.Success(new StatementOrError(null, trailing), SkipBroken(at));
            }

            return Result.Success(new StatementOrError(null, ErrorFrom(at, result)), SkipBroken(at));
        };

    internal static Parser<ParsedDesign> Design(
        Parser<StringSyntax> header, Parser<StatementOrError> line, Parser<KeywordSyntax> trialEnd) =>
        input =>
        {
            var errors = new List<SyntaxError>();
            var statements = new List<StatementSyntax>();
            var at = SkipSeparators(input);
            var start = at.Position;
            StringSyntax? name = null;

            var head = header(at);
            if (head.WasSuccessful && LineEnd(head.Remainder) is { } afterHeader)
            {
                name = head.Value;
                at = afterHeader;
            }
            else
            {
                errors.Add(new SyntaxError(MissingHeaderCode,
                    "a design begins with 'trial \"NAME\" {' on its own line",
                    "for example: trial \"Late-sown cover mixes\" {", WordSpan(at), ["trial"]));
                // A design that forgot its header still gets its statements checked.
                if (!StartsWithStatementKeyword(at)) at = SkipBroken(at);
            }

            while (true)
            {
                var next = line(at);
                if (!next.WasSuccessful) break;
                if (next.Value.Statement is { } s) statements.Add(s);
                if (next.Value.Error is { } e) errors.Add(e);
                at = next.Remainder;
            }

            at = SkipSeparators(at);
            if (at.AtEnd)
            {
                // A scenario whose own '}' is missing takes the trial's closing brace as its own.
                var hint = statements.Count > 0 && statements[^1] is ScenarioStatementSyntax scenario
                           && input.Source[scenario.Span.Start..scenario.Span.End].Contains('\n')
                    ? $"the scenario \"{scenario.Name.Value}\" may be missing its own '}}': it took the trial's"
                    : "add a line holding only '}' after the last statement";
                errors.Add(new SyntaxError(UnclosedTrialCode,
                    "the trial is not closed: expected '}' at the end of the file", hint, new TextSpan(at.Position, 0)));
            }
            else
            {
                var close = trialEnd(at);
                at = SkipSeparators(close.WasSuccessful ? close.Remainder : at);
                if (!at.AtEnd)
                {
                    errors.Add(new SyntaxError(TextAfterTrialCode,
                        $"unexpected {Describe(at)} after the '}}' that closes the trial",
                        "move statements inside the braces; a file holds one trial", WordSpan(at)));
                }
            }

            var syntax = new DesignSyntax(name, statements, TextSpan.FromBounds(start, input.Source.Length));
            return Result.Success(new ParsedDesign(syntax, errors), at);
        };

    private static SyntaxError ErrorFrom(IInput lineStart, IResult<StatementSyntax> failure)
    {
        var at = failure.Remainder;
        if (at.Position == lineStart.Position)
        {
            var word = WordAt(at);
            return new SyntaxError(UnknownStatementCode,
                $"'{word}' does not begin a statement",
                Suggestions.DidYouMean(word, DesignGrammar.StatementKeywords)
                    ?? "a statement begins with one of: " + string.Join(", ", DesignGrammar.StatementKeywords),
                WordSpan(at), [Suggestions.Closest(word, DesignGrammar.StatementKeywords) ?? word]);
        }

        var expected = failure.Expectations.Distinct().ToList();
        var expectation = expected.Count == 0 ? "more" : string.Join(" or ", expected);
        return new SyntaxError(UnexpectedCode, $"expected {expectation}, found {Describe(at)}", null, WordSpan(at), [WordAt(lineStart)]);
    }

    /// <summary>Blank lines, comment lines and leading blanks between statements.</summary>
    internal static IInput SkipSeparators(IInput input)
    {
        while (!input.AtEnd)
        {
            var c = input.Current;
            if (c is ' ' or '\t' or '\r' or '\n') input = input.Advance();
            else if (c == '#') input = SkipToLineBreak(input);
            else break;
        }
        return input;
    }

    /// <summary>After a statement: blanks, an optional comment, then a line break or the end.</summary>
    private static IInput? LineEnd(IInput input)
    {
        while (!input.AtEnd && input.Current is ' ' or '\t') input = input.Advance();
        if (!input.AtEnd && input.Current == '#') input = SkipToLineBreak(input);
        if (input.AtEnd) return input;
        if (input.Current == '\r')
        {
            input = input.Advance();
            if (!input.AtEnd && input.Current == '\n') input = input.Advance();
            return input;
        }
        return input.Current == '\n' ? input.Advance() : null;
    }

    private static IInput SkipToLineBreak(IInput input)
    {
        while (!input.AtEnd && input.Current is not '\r' and not '\n') input = input.Advance();
        return input;
    }

    private static IInput SkipLine(IInput input)
    {
        input = SkipToLineBreak(input);
        return LineEnd(input) ?? input;
    }

    /// <summary>
    /// Skips a broken statement. A scenario may span lines inside its braces, so a broken
    /// one is skipped up to the line that closes it, or up to the next statement.
    /// </summary>
    private static IInput SkipBroken(IInput lineStart)
    {
        var isScenario = WordAt(lineStart) == "scenario";
        var lineText = LineFrom(lineStart);
        var next = SkipLine(lineStart);
        if (!isScenario || !lineText.Contains('{') || lineText.Contains('}')) return next;

        while (!next.AtEnd)
        {
            var candidate = SkipSeparators(next);
            if (candidate.AtEnd || StartsWithStatementKeyword(candidate)) return candidate;
            // A line holding only '}' closes the broken scenario, unless it is the file's last
            // brace, which closes the trial.
            if (candidate.Current == '}')
                return IsLastContent(candidate) ? candidate : SkipLine(candidate);
            var text = LineFrom(candidate);
            next = SkipLine(candidate);
            if (text.Contains('}')) return next;
        }
        return next;
    }

    private static bool StartsWithStatementKeyword(IInput input) => DesignGrammar.StatementKeywords.Contains(WordAt(input));

    /// <summary>True when nothing but blanks and comments follows the character at <paramref name="input"/>.</summary>
    private static bool IsLastContent(IInput input) => SkipSeparators(input.Advance()).AtEnd;

    private static string LineFrom(IInput input)
    {
        var source = input.Source;
        var end = input.Position;
        while (end < source.Length && source[end] is not '\r' and not '\n') end++;
        return source[input.Position..end];
    }

    /// <summary>The word (or single character) at a position, as the user would name it.</summary>
    private static string WordAt(IInput input)
    {
        var source = input.Source;
        var start = input.Position;
        var end = start;
        while (end < source.Length && (char.IsAsciiLetterOrDigit(source[end]) || source[end] is '_' or '-' or '.')) end++;
        if (end == start && end < source.Length && source[end] is not '\r' and not '\n') end++;
        return source[start..end];
    }

    private static TextSpan WordSpan(IInput input) => new(input.Position, WordAt(input).Length);

    private static string Describe(IInput input)
    {
        if (input.AtEnd) return "the end of the file";
        if (input.Current is '\r' or '\n') return "the end of the line";
        return $"'{WordAt(input)}'";
    }
}
