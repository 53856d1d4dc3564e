using DesignCompiler.Text;

namespace DesignCompiler.Syntax;

/// <summary>The whole design file as written: the trial's name and its statements in order.</summary>
public sealed record DesignSyntax(StringSyntax? Name, IReadOnlyList<StatementSyntax> Statements, TextSpan Span);

/// <summary>One statement line. Each kind of statement is its own record.</summary>
public abstract record StatementSyntax(TextSpan Span);
