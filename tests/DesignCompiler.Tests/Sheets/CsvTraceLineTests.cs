using DesignCompiler.Results;
using DesignCompiler.Tests.Ledger;

namespace DesignCompiler.Tests.Sheets;

/// <summary>The CSV sheet's first line traces it; a returned sheet that keeps it, as issued or padded by a spreadsheet, is still read.</summary>
public sealed class CsvTraceLineTests
{
    [Theory]
    [InlineData("")]
    // Spreadsheets pad every record to the widest row when they save CSV (common practice).
    [InlineData(",,,,,,,,")]
    public void A_returned_sheet_that_keeps_the_trace_line_is_recorded(string padding)
    {
        using var trial = new LedgerTrial("aphid-margins.trial");
        trial.Issue(1);
        var issued = File.ReadAllText(trial.Sheet(1)).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("# ", issued[0]);
        var lines = new List<string> { issued[0] + padding, issued[1] };
        lines.AddRange(issued.Skip(2).Select((l, k) =>
        {
            var fields = SheetLines.Fields(l);
            fields[SheetColumns.Outcome] = (k % 9).ToString(System.Globalization.CultureInfo.InvariantCulture);
            return string.Join(",", fields);
        }));
        var returned = trial.File("returned.csv");
        LedgerTrial.WriteLines(returned, lines);

        var run = trial.Record(returned);
        Assert.True(run.ExitCode == 0, run.Error);
        Assert.Contains("24 plots (24 with results, 0 missing)", run.Out);
    }

    [Fact]
    public void A_trace_line_after_the_header_is_a_plot_row_and_is_refused_where_it_stands()
    {
        using var trial = new LedgerTrial("aphid-margins.trial");
        trial.Issue(1);
        var issued = File.ReadAllText(trial.Sheet(1)).Split("\r\n", StringSplitOptions.RemoveEmptyEntries).ToList();
        var lines = new List<string> { issued[1], issued[0] };
        lines.AddRange(issued.Skip(2).Select(l => SheetLines.WithField(l, SheetColumns.Outcome, "3")));
        var returned = trial.File("moved.csv");
        LedgerTrial.WriteLines(returned, lines);

        var run = trial.Record(returned);
        Assert.Equal(1, run.ExitCode);
        Assert.Contains($"{returned}:2:1: error TD4006: ", run.Error);
    }
}
