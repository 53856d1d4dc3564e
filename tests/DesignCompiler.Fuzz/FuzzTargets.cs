namespace DesignCompiler.Fuzz;

/// <summary>Every target, by name. A new input kind is one class and one line here (README.md says how).</summary>
internal static class FuzzTargets
{
    public static readonly IReadOnlyList<IFuzzTarget> All =
    [
        new DesignTarget(),
        new CsvResultsTarget(),
        new XlsxResultsTarget(),
    ];

    public static IFuzzTarget? Find(string name) =>
        All.FirstOrDefault(t => string.Equals(t.Name, name, StringComparison.Ordinal));
}
