using DesignCompiler.Results;
using DesignCompiler.Text;

namespace DesignCompiler.Tests.Ledger;

/// <summary>The sheet reader against RFC 4180 (Y. Shafranovich, "Common Format and MIME Type for CSV Files", 2005), with positions.</summary>
public sealed class CsvReaderTests
{
    private static (IReadOnlyList<CsvRecord> Records, IReadOnlyList<DesignCompiler.Diagnostics.Diagnostic> Problems) Read(string text) =>
        CsvReader.Read(new SourceText("t.csv", text));

    [Fact]
    public void Quoted_fields_hold_commas_doubled_quotes_and_line_breaks()
    {
        // RFC 4180 §2 rules 5–7.
        var (records, problems) = Read("a,\"b,c\",\"say \"\"hi\"\"\"\r\n\"two\r\nlines\",x,\r\n");
        Assert.Empty(problems);
        Assert.Equal(2, records.Count);
        Assert.Equal(["a", "b,c", "say \"hi\""], records[0].Fields.Select(f => f.Text));
        Assert.Equal(["two\r\nlines", "x", ""], records[1].Fields.Select(f => f.Text));
    }

    [Theory]
    [InlineData("a,b\r\nc,d\r\n")]
    [InlineData("a,b\nc,d\n")]
    [InlineData("a,b\rc,d")]
    public void Crlf_lf_and_cr_line_ends_all_end_a_record(string text)
    {
        var (records, problems) = Read(text);
        Assert.Empty(problems);
        Assert.Equal([["a", "b"], ["c", "d"]], records.Select(r => r.Fields.Select(f => f.Text).ToArray()));
    }

    [Fact]
    public void A_field_starts_after_its_comma_so_a_quoted_field_starts_at_its_quote()
    {
        var source = new SourceText("t.csv", "h1,h2\n1,\"7,25\",x\n");
        var (records, _) = CsvReader.Read(source);
        var field = records[1].Fields[1];
        Assert.Equal(new LinePosition(2, 3), source.PositionOf(field.Span.Start));
        Assert.Equal("7,25", field.Text);
        Assert.True(field.Quoted);
        Assert.Equal(new LinePosition(2, 10), source.PositionOf(records[1].Fields[2].Span.Start));
    }

    [Fact]
    public void An_unclosed_quote_and_text_after_a_closing_quote_are_reported_where_they_are()
    {
        var source = new SourceText("t.csv", "a,\"b\"c,d\ne,\"never closed\n");
        var (_, problems) = CsvReader.Read(source);
        Assert.Equal(2, problems.Count);
        Assert.Equal(new LinePosition(1, 6), problems[0].Location.Start);
        Assert.Contains("text follows the closing quote", problems[0].Message);
        Assert.Equal(new LinePosition(2, 3), problems[1].Location.Start);
        Assert.Contains("never closed", problems[1].Message);
    }

    [Fact]
    public void Rows_of_empty_fields_are_blank()
    {
        var (records, _) = Read("a,b\n,,\n\n");
        Assert.False(records[0].IsBlank);
        Assert.All(records.Skip(1), r => Assert.True(r.IsBlank));
    }
}
