using DesignCompiler.Binding;
using DesignCompiler.Planning.Families;
using DesignCompiler.Results;

namespace DesignCompiler.Tests.Ledger;

/// <summary>
/// One outcome cell, read or refused. A decimal comma is read only where it cannot mean anything
/// else; three digits after a lone comma could be a thousands separator (common practice in
/// German, French and other locales writes 1.250 or 1 250 for 1250), so it is refused.
/// </summary>
public sealed class OutcomeReaderTests
{
    private static readonly OutcomeSpec Normal = new("yield", "t/ha", OutcomeFamily.Normal, 1, null, default);
    private static readonly OutcomeSpec Count = new("aphids", null, OutcomeFamily.Count, 1, null, default);
    private static readonly OutcomeSpec Bernoulli = new("established", null, OutcomeFamily.Bernoulli, 1, null, default);
    private static readonly OutcomeSpec Binomial = new("germinated", null, OutcomeFamily.Binomial, 50, null, default);

    private static OutcomeReading Read(string text, OutcomeSpec outcome) => OutcomeReader.Read(text, outcome, OutcomeModels.For(outcome));

    [Theory]
    [InlineData("7.25", 7.25)]
    [InlineData("7,25", 7.25)]
    [InlineData("-0,5", -0.5)]
    [InlineData("12,3456", 12.3456)]
    [InlineData("1234,5", 1234.5)]
    [InlineData(".5", 0.5)]
    [InlineData("2.5e1", 25)]
    [InlineData(" 8 ", 8)]
    public void Numbers_a_normal_outcome_takes(string text, double value)
    {
        var reading = Read(text, Normal);
        Assert.Equal(OutcomeKind.Value, reading.Kind);
        Assert.Equal(value, reading.Value);
    }

    [Theory]
    [InlineData("7,250", "TD4023")]      // decimal comma or thousands separator?
    [InlineData("1,234.5", "TD4024")]
    [InlineData("1.234.567", "TD4024")]
    [InlineData("1,234,567", "TD4024")]
    [InlineData("1 234", "TD4024")]
    [InlineData("1'234", "TD4024")]
    [InlineData("1.234,5", "TD4024")]
    [InlineData("n/a", "TD4021")]
    [InlineData("NaN", "TD4021")]
    [InlineData("Infinity", "TD4021")]
    [InlineData("1e999", "TD4022")]
    [InlineData("0x10", "TD4021")]
    [InlineData("٣", "TD4021")]           // Arabic-Indic digit three: not read as 3
    public void Values_a_normal_outcome_refuses(string text, string id)
    {
        var reading = Read(text, Normal);
        Assert.Equal(OutcomeKind.Problem, reading.Kind);
        Assert.Equal(id, reading.Problem!.Id);
    }

    [Theory]
    [InlineData("0", true)]
    [InlineData("1", true)]
    [InlineData("1.0", true)]
    [InlineData("2", false)]
    [InlineData("0.5", false)]
    [InlineData("-1", false)]
    public void Bernoulli_takes_0_and_1(string text, bool ok) =>
        Assert.Equal(ok ? OutcomeKind.Value : OutcomeKind.Problem, Read(text, Bernoulli).Kind);

    [Theory]
    [InlineData("50", true)]
    [InlineData("51", false)]
    [InlineData("0", true)]
    public void Binomial_takes_whole_numbers_up_to_n(string text, bool ok) =>
        Assert.Equal(ok ? OutcomeKind.Value : OutcomeKind.Problem, Read(text, Binomial).Kind);

    [Theory]
    [InlineData("3,5", "TD4025")]
    [InlineData("1,250", "TD4024")]
    [InlineData("-1", "TD4022")]
    [InlineData("3.5", "TD4022")]
    public void Counts_refuse_commas_negatives_and_fractions(string text, string id) =>
        Assert.Equal(id, Read(text, Count).Problem?.Id);

    [Theory]
    [InlineData("missing", "")]
    [InlineData("Missing: hail", "hail")]
    [InlineData("MISSING:plot flooded ", "plot flooded")]
    [InlineData("missing  deer", "deer")]
    public void Missing_marks_with_and_without_a_reason(string text, string reason)
    {
        var reading = Read(text, Count);
        Assert.Equal(OutcomeKind.Missing, reading.Kind);
        Assert.Equal(reason, reading.MissingReason);
    }

    [Fact]
    public void A_blank_cell_is_blank_not_zero() => Assert.Equal(OutcomeKind.Blank, Read("  ", Count).Kind);

    [Fact]
    public void A_word_starting_with_missing_is_not_a_missing_mark() => Assert.Equal(OutcomeKind.Problem, Read("missingno", Count).Kind);
}
