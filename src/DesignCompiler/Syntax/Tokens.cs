using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

/// <summary>A name the user wrote: an arm code, a block name, the outcome's name.</summary>
public sealed record IdentifierSyntax(string Name, TextSpan Span);

/// <summary>A quoted string, with its escapes resolved.</summary>
public sealed record StringSyntax(string Value, TextSpan Span);

/// <summary>
/// A number as written. The text is kept so that messages can quote it; the value is
/// read with the invariant culture and may be infinite when the text is out of range,
/// which the binder reports.
/// </summary>
public sealed record NumberSyntax(string Text, double Value, bool IsInteger, TextSpan Span);

/// <summary>A keyword choice such as <c>maximize</c>, kept with where it was written.</summary>
public sealed record KeywordSyntax(string Keyword, TextSpan Span);
