namespace DesignCompiler.Diagnostics;

/// <summary>A second place that explains a diagnostic, such as the other limit in a clash.</summary>
public sealed record RelatedLocation(SourceLocation Location, string Note);
