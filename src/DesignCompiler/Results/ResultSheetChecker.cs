using System.Globalization;
using System.Text.RegularExpressions;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Results;

/// <summary>
/// Checks a returned sheet against the issued rounds: the round exists and is not recorded yet,
/// every plot was issued in it with that arm and place, every issued plot appears exactly once,
/// and every outcome is a value the family takes or an explicit 'missing'. Every problem is
/// reported where it is (line and column in a CSV file, sheet and cell in a workbook); a sheet
/// with any problem yields no results at all, so a round is recorded whole or not at all.
/// CSV and workbook sheets arrive as the same <see cref="SheetTable"/>, so they meet the same checks.
/// </summary>
public static partial class ResultSheetChecker
{
    /// <summary>
    /// Spreadsheets add empty rows below the data (tested: they are skipped); this many are allowed
    /// beyond a header and one row per plot before the file is taken for something else.
    /// </summary>
    public const int BlankRowAllowance = 10_000;

    public static (CheckedSheet? Sheet, IReadOnlyList<Diagnostic> Diagnostics) Check(
        SheetTable table, IReadOnlyList<IssuedSheet> issued, OutcomeSpec outcome, IOutcomeModel model)
    {
        // A file with far more rows than the largest issued round is not a results sheet of this trial.
        var largest = issued.Count == 0 ? 0 : issued.Max(s => s.Plots.Count);
        var limit = largest + 1 + BlankRowAllowance;
        var allRows = table.Sections.SelectMany(s => s.Rows).ToList();
        if (allRows.Count > limit - 1)
            return (null, [new Diagnostic(LedgerDiagnostics.TooManyRows, allRows[limit - 1].Start, [limit, largest])]);

        var bag = new DiagnosticBag();
        var headersRight = true;
        foreach (var section in table.Sections) headersRight &= HeaderIsRight(section, bag);
        if (!headersRight) return (null, bag.ToSortedList());

        var rows = table.Sections.SelectMany(s => s.Rows).Where(r => !r.IsBlank).ToList();
        var sheet = FindRound(table, rows, issued, bag);
        if (sheet is null) return (null, bag.ToSortedList());

        var results = CheckRows(table, rows, sheet, outcome, model, bag);
        return bag.HasErrors ? (null, bag.ToSortedList()) : (new CheckedSheet(sheet.Round, results), []);
    }

    private static bool HeaderIsRight(SheetSection section, DiagnosticBag bag)
    {
        var fields = section.Header.Cells;
        if (fields.Count == 1 && fields[0].Value.Contains(';'))
        {
            bag.Report(LedgerDiagnostics.HeaderMismatch, fields[0].Location,
                $"the fields are separated by ';'; save the sheet as comma-separated CSV with the header '{SheetColumns.Header}'");
            return false;
        }
        var right = true;
        for (var i = 0; i < Math.Min(fields.Count, SheetColumns.Count); i++)
        {
            if (string.Equals(fields[i].Value, SheetColumns.Name(i), StringComparison.OrdinalIgnoreCase)) continue;
            bag.Report(LedgerDiagnostics.HeaderMismatch, fields[i].Location, FormattableString.Invariant(
                $"column {i + 1} of the header is '{fields[i].Value}' but must be '{SheetColumns.Name(i)}'; the header is '{SheetColumns.Header}'"));
            right = false;
        }
        if (fields.Count < SheetColumns.Count)
        {
            bag.Report(LedgerDiagnostics.HeaderMismatch, section.HeaderEnd, FormattableString.Invariant(
                $"the header has {fields.Count} columns and lacks '{SheetColumns.Name(fields.Count)}'; the header is '{SheetColumns.Header}'"));
            right = false;
        }
        else if (fields.Count > SheetColumns.Count)
        {
            bag.Report(LedgerDiagnostics.HeaderMismatch, fields[SheetColumns.Count].Location,
                $"the header has an extra column '{fields[SheetColumns.Count].Value}'; the header is '{SheetColumns.Header}'");
            right = false;
        }
        return right;
    }

    /// <summary>
    /// The round the sheet is for: that of the first row with a readable round number, which must
    /// be issued and not yet recorded. Unreadable round numbers are reported with their rows.
    /// </summary>
    private static IssuedSheet? FindRound(SheetTable table, List<SheetRow> rows, IReadOnlyList<IssuedSheet> issued, DiagnosticBag bag)
    {
        foreach (var row in rows)
        {
            var field = row.Cells[SheetColumns.Round];
            if (!TryWhole(field.Value, out var round)) continue;
            var sheet = issued.FirstOrDefault(s => s.Round == round);
            if (sheet is null)
            {
                bag.Report(LedgerDiagnostics.RoundNotIssued, field.Location, round, IssuedRounds(issued));
                return null;
            }
            if (sheet.RecordedAs is { } note)
            {
                bag.Report(LedgerDiagnostics.RoundAlreadyRecorded, field.Location, round, note);
                return null;
            }
            return sheet;
        }
        if (rows.Count == 0) bag.Report(LedgerDiagnostics.NoRows, table.End);
        foreach (var row in rows)
            bag.Report(LedgerDiagnostics.RoundNotWhole, row.Cells[SheetColumns.Round].Location, row.Cells[SheetColumns.Round].Value);
        return null;
    }

    private static List<PlotResult> CheckRows(
        SheetTable table, List<SheetRow> rows, IssuedSheet sheet, OutcomeSpec outcome, IOutcomeModel model, DiagnosticBag bag)
    {
        var byId = sheet.Plots.ToDictionary(p => p.PlotId, StringComparer.Ordinal);
        var seen = new Dictionary<string, string>(StringComparer.Ordinal);
        var results = new List<PlotResult>();
        var marks = new List<(SheetCell Field, DecimalMark Mark, string Row)>();
        var rule = model.Accepts(double.NaN).Rule;

        foreach (var row in rows)
        {
            var line = row.Line;
            var fields = row.Cells;
            if (fields.Count != SheetColumns.Count)
            {
                bag.Report(LedgerDiagnostics.FieldCount, row.Start, UnquotedCommaHint(fields), null,
                    fields.Count, SheetColumns.Count, SheetColumns.Header);
                // The plot is still named, so it is not reported missing as well.
                if (fields.Count > SheetColumns.Plot) seen.TryAdd(fields[SheetColumns.Plot].Value, row.Name);
                continue;
            }

            var roundField = fields[SheetColumns.Round];
            if (!TryWhole(roundField.Value, out var round))
                bag.Report(LedgerDiagnostics.RoundNotWhole, roundField.Location, roundField.Value);
            else if (round != sheet.Round)
                bag.Report(LedgerDiagnostics.MixedRounds, roundField.Location, round, sheet.Round);

            var plotField = fields[SheetColumns.Plot];
            var plotId = plotField.Value;
            if (!byId.TryGetValue(plotId, out var plot))
            {
                bag.Report(LedgerDiagnostics.UnknownPlot, plotField.Location, plotId, sheet.Round);
                continue;
            }
            if (seen.TryGetValue(plotId, out var firstRow))
            {
                bag.Report(LedgerDiagnostics.DuplicatePlot, plotField.Location, plotId, firstRow);
                continue;
            }
            seen.Add(plotId, row.Name);

            CheckPlace(fields[SheetColumns.Block], plot, "block", plot.Block, bag);
            CheckPlace(fields[SheetColumns.Row], plot, "row", Whole(plot.Row), bag);
            CheckPlace(fields[SheetColumns.Column], plot, "column", Whole(plot.Column), bag);
            var armField = fields[SheetColumns.Arm];
            if (!string.Equals(armField.Value, plot.Arm, StringComparison.Ordinal))
                bag.Report(LedgerDiagnostics.WrongArm, armField.Location, plotId, plot.Arm, sheet.Round, armField.Value);

            var outcomeField = fields[SheetColumns.Outcome];
            if (outcomeField.IsDate)
            {
                bag.Report(LedgerDiagnostics.DateInOutcome, outcomeField.Location, plotId, rule);
                continue;
            }
            var reading = OutcomeReader.Read(outcomeField.Text, outcome, model);
            switch (reading.Kind)
            {
                case OutcomeKind.Blank:
                    bag.Report(LedgerDiagnostics.BlankOutcome, outcomeField.Location, plotId, rule);
                    break;
                case OutcomeKind.Problem:
                    bag.Add(new Diagnostic(reading.Problem!, outcomeField.Location, reading.Arguments!));
                    break;
                case OutcomeKind.Missing:
                    results.Add(new PlotResult(plot.Ordinal, plotId, plot.Arm, null, null, reading.MissingReason, fields[SheetColumns.Notes].Value, line));
                    break;
                default:
                    marks.Add((outcomeField, reading.Mark, row.Name));
                    results.Add(new PlotResult(plot.Ordinal, plotId, plot.Arm, reading.Value, outcomeField.Value, null, fields[SheetColumns.Notes].Value, line));
                    break;
            }
        }

        CheckDecimalMarks(marks, bag);
        var end = table.End;
        foreach (var plot in sheet.Plots)
            if (!seen.ContainsKey(plot.PlotId)) bag.Report(LedgerDiagnostics.MissingPlot, end, plot.PlotId, plot.Arm, sheet.Round);
        return results.OrderBy(r => r.Ordinal).ToList();
    }

    private static void CheckPlace(SheetCell field, IssuedPlot plot, string what, string issued, DiagnosticBag bag)
    {
        var written = field.Value;
        var same = what == "block"
            ? string.Equals(written, issued, StringComparison.Ordinal)
            : issued.Length == 0 ? written.Length == 0 : TryWhole(written, out var number) && Whole(number) == issued;
        if (!same) bag.Report(LedgerDiagnostics.WrongPlace, field.Location, plot.PlotId, what, issued, written);
    }

    /// <summary>
    /// On a sheet that writes decimal commas, a point followed by three digits may be a thousands
    /// separator (1.250 for 1250); elsewhere it is an ordinary decimal point. Such values are refused.
    /// </summary>
    private static void CheckDecimalMarks(List<(SheetCell Field, DecimalMark Mark, string Row)> marks, DiagnosticBag bag)
    {
        var comma = marks.FirstOrDefault(m => m.Mark == DecimalMark.Comma);
        if (comma.Field is null) return;
        foreach (var (field, mark, _) in marks)
            if (mark == DecimalMark.Point && PointCouldGroupThousands().IsMatch(field.Value))
                bag.Report(LedgerDiagnostics.AmbiguousComma, field.Location, field.Value, FormattableString.Invariant(
                    $"the sheet writes decimal commas elsewhere ({comma.Row}), so this point may separate thousands; write the value without it, or with a decimal comma"));
    }

    private static string? UnquotedCommaHint(IReadOnlyList<SheetCell> fields) =>
        fields.Count == SheetColumns.Count + 1 && DigitsOnly().IsMatch(fields[SheetColumns.Outcome].Value) && DigitsOnly().IsMatch(fields[SheetColumns.Outcome + 1].Value)
            ? $"the outcome looks like a decimal comma without quotes ('{fields[SheetColumns.Outcome].Value},{fields[SheetColumns.Outcome + 1].Value}'); write it with a point, or put the field in quotes"
            : null;

    private static string IssuedRounds(IReadOnlyList<IssuedSheet> issued) => issued.Count switch
    {
        0 => "no round has been issued yet",
        1 => FormattableString.Invariant($"the ledger has round {issued[0].Round}"),
        _ => FormattableString.Invariant($"the ledger has rounds {issued.Min(s => s.Round)} to {issued.Max(s => s.Round)}"),
    };

    private static bool TryWhole(string text, out int value) =>
        int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out value);

    private static string Whole(int? value) => value?.ToString(CultureInfo.InvariantCulture) ?? "";

    [GeneratedRegex(@"^[+-]?[0-9]{1,3}\.[0-9]{3}$", RegexOptions.CultureInvariant)]
    private static partial Regex PointCouldGroupThousands();

    [GeneratedRegex(@"^[0-9]+$", RegexOptions.CultureInvariant)]
    private static partial Regex DigitsOnly();
}
