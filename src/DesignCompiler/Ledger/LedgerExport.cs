using System.Globalization;
using System.Text;

namespace DesignCompiler.Ledger;

/// <summary>
/// The ledger as one tidy table for analysis elsewhere: one row per plot and round, RFC 4180
/// CSV with CRLF line ends, numbers in the invariant round-trip form. A plot of a round not yet
/// recorded has empty outcome, reason and time; a plot recorded as missing has an empty outcome
/// and its reason.
/// </summary>
public static class LedgerExport
{
    public const string Header = "round,block,plot,row,column,arm,outcome,missing_reason,recorded_at";

    /// <summary>Written for a plot marked missing without a reason, so it is told from a plot not yet recorded.</summary>
    public const string NoReasonGiven = "(no reason given)";

    public static string ToCsv(LedgerHistory history)
    {
        var text = new StringBuilder(Header).Append("\r\n");
        foreach (var round in history.Rounds)
        {
            var outcomes = round.Recording?.Outcomes.ToDictionary(o => o.Ordinal) ?? [];
            for (var k = 0; k < round.Plots.Count; k++)
            {
                var plot = round.Plots[k];
                outcomes.TryGetValue(k, out var outcome);
                var value = outcome?.Value?.ToString("R", CultureInfo.InvariantCulture) ?? "";
                var reason = outcome is { Value: null } ? (outcome.MissingReason is { Length: > 0 } r ? r : NoReasonGiven) : "";
                text.AppendJoin(',',
                    Whole(round.Round), Field(plot.Block), Field(plot.PlotId), Whole(plot.Row), Whole(plot.Column), Field(plot.ArmCode),
                    value, Field(reason), outcome is null ? "" : round.Recording!.Entry.At).Append("\r\n");
            }
        }
        return text.ToString();
    }

    private static string Whole(int? value) => value?.ToString(CultureInfo.InvariantCulture) ?? "";

    /// <summary>RFC 4180: quoted when the text holds a comma, quote or line break; quotes doubled.</summary>
    private static string Field(string text) =>
        text.IndexOfAny([',', '"', '\r', '\n']) >= 0 ? "\"" + text.Replace("\"", "\"\"") + "\"" : text;
}
