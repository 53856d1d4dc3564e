using System.Globalization;
using System.Text;
using DesignCompiler.Tests.Testing;
using static DesignCompiler.Results.SheetColumns;

namespace DesignCompiler.Tests.Ledger;

/// <summary>What spreadsheets and editors do to a sheet that is still the same sheet: it is read, and read right.</summary>
public sealed class ReturnedSheetToleranceTests
{
    [Fact]
    public void Bom_lf_line_ends_quoted_fields_blank_rows_missing_marks_and_a_decimal_comma_are_read_right()
    {
        using var trial = new LedgerTrial("nitrogen-rates.trial");
        trial.Issue(1);
        var rows = trial.SheetRows(1);
        var lines = new List<string> { string.Join(",", rows[0].Select(f => "\"" + f + "\"")) };
        for (var k = 1; k < rows.Count; k++)
        {
            var row = rows[k];
            row[Outcome] = k switch
            {
                1 => "7,25",                    // a decimal comma, unambiguous on a normal outcome
                2 => "missing: lodged by wind",
                3 => "MISSING",
                4 => " 8.5 ",                   // blanks around a value
                5 => "6.1e0",
                _ => (6 + k % 3).ToString(CultureInfo.InvariantCulture),
            };
            if (k == 6) row[Notes] = "replanted, \"late\"";
            lines.Add(string.Join(",", row.Select(f => "\"" + f.Replace("\"", "\"\"") + "\"")));
        }
        lines.Add(",,,,,,,,");
        lines.Add("");
        var sheet = trial.File("returned.csv");
        File.WriteAllBytes(sheet, [0xEF, 0xBB, 0xBF, .. Encoding.UTF8.GetBytes(string.Concat(lines.Select(l => l + "\n")) + "\n\n")]);

        var run = trial.Record(sheet);
        Assert.True(run.ExitCode == 0, run.Error);
        Assert.Contains($"recorded round 1 from {sheet}: 40 plots (38 with results, 2 missing)", run.Out);

        var export = Trialc.Invoke("export", "--ledger", trial.Ledger).Out.Split("\r\n");
        Assert.Contains(",7.25,,", export[1]);
        Assert.Contains(",,lodged by wind,", export[2]);
        Assert.Contains(",,(no reason given),", export[3]);
        Assert.Contains(",8.5,,", export[4]);
        Assert.Contains(",6.1,,", export[5]);
        Assert.Equal(1, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM outcomes WHERE notes = 'replanted, \"late\"'"));
    }

    [Fact]
    public void Rows_in_any_order_are_recorded_in_sheet_order()
    {
        using var trial = new LedgerTrial("aphid-margins.trial");
        trial.Issue(1);
        var rows = trial.SheetRows(1);
        var lines = new List<string> { string.Join(",", rows[0]) };
        lines.AddRange(rows.Skip(1).Select((r, k) => { r[Outcome] = k.ToString(CultureInfo.InvariantCulture); return string.Join(",", r); }).Reverse());
        var sheet = trial.File("sorted.csv");
        LedgerTrial.WriteLines(sheet, lines);
        Assert.Equal(0, trial.Record(sheet).ExitCode);
        Assert.Equal(0, LedgerDump.Count(trial.Ledger, "SELECT count(*) FROM outcomes WHERE value <> ordinal"));
    }
}
