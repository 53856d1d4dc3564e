using System.Globalization;

namespace DesignCompiler.Diagnostics;

/// <summary>A problem found in the user's input. Diagnostics are data: nothing throws for bad input.</summary>
public sealed record Diagnostic(
    DiagnosticDescriptor Descriptor,
    SourceLocation Location,
    IReadOnlyList<object> Arguments,
    string? Hint = null,
    IReadOnlyList<RelatedLocation>? Related = null)
{
    public string Id => Descriptor.Id;
    public Severity Severity => Descriptor.Severity;

    /// <summary>The message with its arguments, formatted the same under every culture.</summary>
    public string Message => string.Format(CultureInfo.InvariantCulture, Descriptor.MessageFormat, Arguments.ToArray());

    public IReadOnlyList<RelatedLocation> RelatedLocations => Related ?? [];
}
