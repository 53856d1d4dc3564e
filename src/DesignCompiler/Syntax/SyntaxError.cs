using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

/// <summary>
/// A line that did not parse. The parser keeps going after it, so one run reports
/// every broken line; the error becomes a diagnostic and the line is otherwise ignored.
/// </summary>
/// <param name="StatementKeyword">The statement the broken line was meant to be (its first word,
/// or the keyword a misspelt first word is closest to), so the binder can hold back problems
/// that only say that statement is missing.</param>
public sealed record SyntaxError(string Code, string Message, string? Hint, TextSpan Span, string? StatementKeyword = null);
