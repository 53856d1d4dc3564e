namespace DesignCompiler.Results;

/// <summary>One plot as it was issued: where it is and which arm was sown on it. <see cref="Ordinal"/> is its place on the sheet.</summary>
public sealed record IssuedPlot(int Ordinal, string Block, string PlotId, int? Row, int? Column, string Arm);

/// <summary>
/// What a returned sheet is checked against: an issued round's plots, and, when the round is
/// already recorded, a note saying when and by whom.
/// </summary>
public sealed record IssuedSheet(int Round, IReadOnlyList<IssuedPlot> Plots, string? RecordedAs);

/// <summary>One plot's result as read from a sheet: a value, or missing with a reason (possibly empty).</summary>
public sealed record PlotResult(
    int Ordinal, string PlotId, string Arm, double? Value, string? ValueText, string? MissingReason, string Notes, int Line);

/// <summary>A returned sheet that matches its issued round: one result for every plot, in sheet order.</summary>
public sealed record CheckedSheet(int Round, IReadOnlyList<PlotResult> Results)
{
    public int Missing => Results.Count(r => r.Value is null);
}
