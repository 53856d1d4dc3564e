using DesignCompiler.Diagnostics;

namespace DesignCompiler.Ledger;

/// <summary>What a ledger operation gave, or why it gave nothing. Problems are data, as everywhere in trialc.</summary>
public sealed record LedgerResult<T>(T? Value, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool HasErrors => Diagnostics.Any(d => d.Severity == Severity.Error);

    public static LedgerResult<T> Ok(T value, IReadOnlyList<Diagnostic>? warnings = null) => new(value, warnings ?? []);

    public static LedgerResult<T> Fail(params Diagnostic[] diagnostics) => new(default, diagnostics);

    public static LedgerResult<T> Fail(IReadOnlyList<Diagnostic> diagnostics) => new(default, diagnostics);
}
