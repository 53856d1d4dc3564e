namespace DesignCompiler.Diagnostics;

/// <summary>
/// One kind of problem: its stable id, its severity and its message template.
/// Ids are grouped by stage: TD1xxx syntax, TD2xxx binding and validation,
/// TD3xxx planning, TD4xxx results and ledger, TD5xxx command-line input.
/// </summary>
public sealed record DiagnosticDescriptor(string Id, Severity Severity, string MessageFormat);
