namespace DesignCompiler.Diagnostics;

/// <summary>Collects diagnostics from one stage; stages after it refuse to run when it holds errors.</summary>
public sealed class DiagnosticBag
{
    private readonly List<Diagnostic> _items = [];

    public bool HasErrors => _items.Any(d => d.Severity == Severity.Error);
    public int Count => _items.Count;

    public void Add(Diagnostic diagnostic) => _items.Add(diagnostic);

    public void AddRange(IEnumerable<Diagnostic> diagnostics) => _items.AddRange(diagnostics);

    public void Report(DiagnosticDescriptor descriptor, SourceLocation location, params object[] arguments) =>
        _items.Add(new Diagnostic(descriptor, location, arguments));

    public void Report(DiagnosticDescriptor descriptor, SourceLocation location, string? hint, IReadOnlyList<RelatedLocation>? related, params object[] arguments) =>
        _items.Add(new Diagnostic(descriptor, location, arguments, hint, related));

    /// <summary>In the order a reader meets them: by file, then position, then id.</summary>
    public IReadOnlyList<Diagnostic> ToSortedList() =>
        _items
            .Select((d, i) => (d, i))
            .OrderBy(x => x.d.Location.Path, StringComparer.Ordinal)
            .ThenBy(x => x.d.Location.Order)
            .ThenBy(x => x.i)
            .Select(x => x.d)
            .ToList();
}
