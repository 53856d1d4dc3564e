using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

/// <summary>
/// A line that did not parse. The parser keeps going after it, so one run reports
/// every broken line; the error becomes a diagnostic and the line is otherwise ignored.
/// </summary>
/// <param name="StatementKeywords">The statements the broken line was meant to hold (its first word,
/// or the keyword a misspelt first word is closest to, and the first word of text that followed a
/// statement on the same line), so the binder can hold back problems that only say one of them is missing.</param>
public sealed record SyntaxError(string Code, string Message, string? Hint, TextSpan Span, IReadOnlyList<string>? StatementKeywords = null);
