using DesignCompiler.Diagnostics;

namespace DesignCompiler.Analysis.Trial;

/// <summary>Problems with the data given to <c>trialc analyze</c> (TD42xx). Ids never change meaning once released.</summary>
public static class AnalysisDiagnostics
{
    private static DiagnosticDescriptor Error(string id, string format) => new(id, Severity.Error, format);

    public static readonly DiagnosticDescriptor DataEmpty = Error("TD4201", "the data file has no header and no rows");
    public static readonly DiagnosticDescriptor DataColumnMissing = Error("TD4202", "the header has no '{0}' column");
    public static readonly DiagnosticDescriptor DataRowShort = Error("TD4203", "the row has {1} fields where the header has {0}");
    public static readonly DiagnosticDescriptor DataBadRound = Error("TD4204", "'{0}' is not a round of this design");
    public static readonly DiagnosticDescriptor DataUnknownBlock = Error("TD4205", "the design has no block '{0}'");
    public static readonly DiagnosticDescriptor DataUnknownArm = Error("TD4206", "the design has no arm '{0}'");
    public static readonly DiagnosticDescriptor DataBadValue = Error("TD4207", "'{0}' is not a number");
    public static readonly DiagnosticDescriptor NothingRecorded = Error("TD4208", "there are no recorded plots to analyse");
    public static readonly DiagnosticDescriptor UnknownInLedger = Error("TD4209", "the ledger holds plots of {0}, which the design does not name");

    public static Diagnostic At(DiagnosticDescriptor descriptor, SourceLocation location, string hint, params object[] arguments) =>
        new(descriptor, location, arguments, hint);
}
