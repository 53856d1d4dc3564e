using System.Text;
using DesignCompiler.Tests.Testing;
using static DesignCompiler.Results.SheetColumns;

namespace DesignCompiler.Tests.Ledger;

/// <summary>
/// Returned sheets with one kind of mistake each. Every one is refused with the line and column
/// where the mistake starts (the field's first character), and the ledger is left exactly as it was.
/// </summary>
public sealed class BadSheetTests(BadSheetFixture fixture) : IClassFixture<BadSheetFixture>
{
    /// <summary>A spoilt sheet for one of the fixture's trials, and the error expected first at its position.</summary>
    public sealed record Case(LedgerTrial Trial, byte[] Content, string Id, int Line, int Column);

    public static TheoryData<string> Names() =>
    [
        "unknown plot", "wrong arm for a plot", "duplicated row", "missing row", "value 2 for bernoulli", "blank without missing",
        "text value", "wrong round", "file already recorded", "round already recorded", "header changed", "empty file",
        "binary junk", "semicolon separated", "unclosed quote", "rounds mixed", "wrong block", "not UTF-8", "header only",
        "count of -1", "count of 3.5", "comma in a count", "decimal comma ambiguous", "thousands separator",
        "decimal point among decimal commas", "unquoted decimal comma", "infinite value",
        // Found probing numeric extremes: once recorded, these broke every later compile and status of the trial.
        "yield of 1e200", "count of 1e300",
    ];

    private Case Build(string name)
    {
        var cover = fixture.CoverRound2;
        var aphids = fixture.AphidRound1;
        var wheat = fixture.WheatRound1;
        return name switch
        {
            "unknown plot" => Field(fixture.Cover, cover, 1, Plot, "north-9-9", "TD4015"),
            "wrong arm for a plot" => Field(fixture.Cover, cover, 2, Arm, SheetLines.Fields(cover[2])[Arm] == "OV" ? "RC" : "OV", "TD4016"),
            "duplicated row" => At(fixture.Cover, [.. cover, cover[3]], cover.Count, SheetLines.Column(cover[3], Plot), "TD4018"),
            "missing row" => At(fixture.Cover, cover.Where((_, i) => i != 4).ToList(), cover.Count - 1, 1, "TD4019"),
            "value 2 for bernoulli" => Field(fixture.Cover, cover, 1, Outcome, "2", "TD4022"),
            "blank without missing" => Field(fixture.Cover, cover, 5, Outcome, "", "TD4020"),
            "text value" => Field(fixture.Cover, cover, 6, Outcome, "yes", "TD4021"),
            "wrong round" => At(fixture.Cover, [cover[0], .. cover.Skip(1).Select(l => SheetLines.WithField(l, Round, "3"))], 1, 1, "TD4011"),
            "file already recorded" => new Case(fixture.Cover, File.ReadAllBytes(fixture.CoverRound1File), "TD4013", 1, 1),
            "round already recorded" => AlreadyRecordedRound(),
            "header changed" => Field(fixture.Cover, cover, 0, Outcome, "result", "TD4004"),
            "empty file" => new Case(fixture.Cover, [], "TD4003", 1, 1),
            "binary junk" => new Case(fixture.Cover, [0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A, 0x00, 0x00, 0x00, 0x0D, 0x49, 0x48, 0x44, 0x52, 0xFF, 0x00], "TD4002", 1, 1),
            "semicolon separated" => At(fixture.Cover, cover.Select(l => l.Replace(',', ';')).ToList(), 0, 1, "TD4004"),
            "unclosed quote" => Field(fixture.Cover, cover, 3, Notes, "\"wet corner", "TD4005"),
            "rounds mixed" => Field(fixture.Cover, cover, 7, Round, "1", "TD4014"),
            "wrong block" => Field(fixture.Cover, cover, 2, Block, SheetLines.Fields(cover[2])[Block] == "north" ? "south" : "north", "TD4017"),
            "not UTF-8" => NotUtf8(),
            "header only" => At(fixture.Cover, [cover[0]], 1, 1, "TD4007"),
            "count of -1" => Field(fixture.Aphids, aphids, 2, Outcome, "-1", "TD4022"),
            "count of 3.5" => Field(fixture.Aphids, aphids, 3, Outcome, "3.5", "TD4022"),
            "comma in a count" => Field(fixture.Aphids, aphids, 4, Outcome, "\"3,5\"", "TD4025"),
            "decimal comma ambiguous" => Field(fixture.Wheat, wheat, 1, Outcome, "\"7,250\"", "TD4023"),
            "thousands separator" => Field(fixture.Wheat, wheat, 2, Outcome, "\"1,234.5\"", "TD4024"),
            "decimal point among decimal commas" => At(fixture.Wheat,
                SheetLines.Replace(SheetLines.Replace(wheat, 1, l => SheetLines.WithField(l, Outcome, "\"7,25\"")), 2, l => SheetLines.WithField(l, Outcome, "7.250")),
                2, SheetLines.Column(wheat[2], Outcome), "TD4023"),
            "unquoted decimal comma" => At(fixture.Wheat, SheetLines.Replace(wheat, 1, l => SheetLines.WithField(l, Outcome, "7,25")), 1, 1, "TD4006"),
            "infinite value" => Field(fixture.Wheat, wheat, 3, Outcome, "1e999", "TD4022"),
            "yield of 1e200" => Field(fixture.Wheat, wheat, 4, Outcome, "1e200", "TD4022"),
            "count of 1e300" => Field(fixture.Aphids, aphids, 5, Outcome, "1e300", "TD4022"),
            _ => throw new ArgumentException("no case " + name),
        };
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void A_spoilt_sheet_is_refused_at_the_mistake_and_the_ledger_is_unchanged(string name)
    {
        var sample = Build(name);
        var folder = Path.Combine(fixture.Cover.Folder, "case-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        var ledger = Path.Combine(folder, "trial.ledger");
        File.Copy(sample.Trial.Ledger, ledger);
        var sheet = Path.Combine(folder, "returned.csv");
        File.WriteAllBytes(sheet, sample.Content);
        var dump = LedgerDump.Of(ledger);
        var bytes = File.ReadAllBytes(ledger);

        var run = Trialc.Invoke("record", sample.Trial.Design, "--ledger", ledger, sheet);

        Assert.Equal(1, run.ExitCode);
        Assert.Contains($"{sheet}:{sample.Line}:{sample.Column}: error {sample.Id}: ", run.Error);
        Assert.DoesNotContain("Exception", run.Error);
        Assert.Equal("", run.Out);
        Assert.Equal(dump, LedgerDump.Of(ledger));
        Assert.Equal(bytes, File.ReadAllBytes(ledger));
    }

    [Fact]
    public void Every_problem_in_a_sheet_is_listed_at_once_in_file_order()
    {
        var cover = fixture.CoverRound2;
        var lines = SheetLines.Replace(SheetLines.Replace(cover, 2, l => SheetLines.WithField(l, Outcome, "2")), 5, l => SheetLines.WithField(l, Plot, "east-1-1"));
        var sample = At(fixture.Cover, lines, 2, 1, "TD4022");
        var folder = Path.Combine(fixture.Cover.Folder, "many-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        var ledger = Path.Combine(folder, "trial.ledger");
        File.Copy(fixture.Cover.Ledger, ledger);
        var sheet = Path.Combine(folder, "returned.csv");
        File.WriteAllBytes(sheet, sample.Content);

        var run = Trialc.Invoke("record", fixture.Cover.Design, "--ledger", ledger, sheet);
        Assert.Equal(1, run.ExitCode);
        var value = run.Error.IndexOf($"{sheet}:3:{SheetLines.Column(lines[2], Outcome)}: error TD4022: outcome 2 is not a value a bernoulli outcome takes: 0 or 1", StringComparison.Ordinal);
        var plot = run.Error.IndexOf($"{sheet}:6:{SheetLines.Column(lines[5], Plot)}: error TD4015: plot 'east-1-1' was not issued in round 2", StringComparison.Ordinal);
        var missing = run.Error.IndexOf($"error TD4019: plot '{SheetLines.Fields(cover[5])[Plot]}'", StringComparison.Ordinal);
        Assert.True(value >= 0 && plot > value && missing > plot, run.Error);
        Assert.Contains("3 errors, 0 warnings", run.Error);
    }

    private Case AlreadyRecordedRound()
    {
        var lines = File.ReadAllText(fixture.CoverRound1File).Split("\r\n").Where(l => l.Length > 0).ToList();
        var changed = SheetLines.Replace(lines, 1, l => SheetLines.WithField(l, Notes, "checked again"));
        return At(fixture.Cover, changed, 1, 1, "TD4012");
    }

    private Case NotUtf8()
    {
        var line = SheetLines.WithField(fixture.CoverRound2[3], Notes, "XX");
        var text = string.Concat(SheetLines.Replace(fixture.CoverRound2, 3, _ => line).Select(l => l + "\r\n"));
        var bytes = Encoding.UTF8.GetBytes(text);
        // "caf\xE9" as a spreadsheet set to Latin-1 writes it: a byte that cannot start a UTF-8 character.
        var at = Array.IndexOf(bytes, (byte)'X');
        bytes[at] = 0xE9;
        bytes[at + 1] = (byte)' ';
        return new Case(fixture.Cover, bytes, "TD4002", 4, SheetLines.Column(line, Notes));
    }

    private static Case Field(LedgerTrial trial, IReadOnlyList<string> lines, int index, int field, string text, string id)
    {
        var changed = SheetLines.Replace(lines, index, l => SheetLines.WithField(l, field, text));
        return At(trial, changed, index, SheetLines.Column(changed[index], field), id);
    }

    /// <summary>A sheet of the given lines (CRLF) whose first error is expected on the line of index <paramref name="index"/> (one-based line index + 1).</summary>
    private static Case At(LedgerTrial trial, IReadOnlyList<string> lines, int index, int column, string id) =>
        new(trial, Encoding.UTF8.GetBytes(string.Concat(lines.Select(l => l + "\r\n"))), id, index + 1, column);
}
