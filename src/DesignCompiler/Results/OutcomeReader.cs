using System.Globalization;
using System.Text.RegularExpressions;
using DesignCompiler.Binding;
using DesignCompiler.Ledger;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Results;

/// <summary>
/// Reads one outcome cell. Sheets are written with a decimal point, but they come back from
/// spreadsheets set to many languages, so a decimal comma is read when it can mean only one
/// thing (a single comma, no point, a normal outcome, and not three digits after the comma,
/// which could as well be a thousands separator). Anything that could be misread is refused
/// with the reason: a wrong number in the ledger is far worse than a sheet sent back.
/// </summary>
public static partial class OutcomeReader
{
    public static OutcomeReading Read(string cell, OutcomeSpec outcome, IOutcomeModel model)
    {
        var text = cell.Trim();
        if (text.Length == 0) return OutcomeReading.Blank;

        var missing = MissingPattern().Match(text);
        if (missing.Success) return OutcomeReading.Missing(missing.Groups["reason"].Value.Trim());

        var rule = model.Accepts(double.NaN).Rule;
        OutcomeReading reading;
        if (PlainNumber().IsMatch(text))
            reading = OutcomeReading.Number(double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture),
                text.Contains('.') ? DecimalMark.Point : DecimalMark.None);
        else if (SingleComma().Match(text) is { Success: true } comma)
            reading = ReadComma(text, comma, outcome, rule);
        else if (SeparatedDigits().IsMatch(text))
            reading = OutcomeReading.Refused(LedgerDiagnostics.ThousandsSeparator, text, "1234.5");
        else
            return OutcomeReading.Refused(LedgerDiagnostics.NotANumber, text, rule);

        if (reading.Kind != OutcomeKind.Value) return reading;
        var (ok, words) = model.Accepts(reading.Value);
        return ok ? reading : OutcomeReading.Refused(LedgerDiagnostics.OutsideSupport, text, outcome.FamilyText, words);
    }

    private static OutcomeReading ReadComma(string text, Match comma, OutcomeSpec outcome, string rule)
    {
        var whole = comma.Groups["whole"].Value;
        var fraction = comma.Groups["fraction"].Value;
        var sign = comma.Groups["sign"].Value;
        var asDecimal = sign + whole + "." + fraction;
        var asThousands = sign + whole + fraction;
        var couldBeThousands = fraction.Length == 3 && whole.Length <= 3;

        if (outcome.Family != OutcomeFamily.Normal)
            return couldBeThousands
                ? OutcomeReading.Refused(LedgerDiagnostics.ThousandsSeparator, text, asThousands)
                : OutcomeReading.Refused(LedgerDiagnostics.CommaNotDecimal, text, outcome.FamilyText, rule);
        if (couldBeThousands)
            return OutcomeReading.Refused(LedgerDiagnostics.AmbiguousComma, text,
                $"with a decimal comma it is {asDecimal}, with a thousands separator {asThousands}; write {asDecimal} or {asThousands}");
        return OutcomeReading.Number(double.Parse(asDecimal, NumberStyles.Float, CultureInfo.InvariantCulture), DecimalMark.Comma);
    }

    [GeneratedRegex(@"^missing(?:\s*:\s*|\s+|$)(?<reason>.*)$", RegexOptions.IgnoreCase | RegexOptions.Singleline | RegexOptions.CultureInvariant)]
    private static partial Regex MissingPattern();

    [GeneratedRegex(@"^[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?$", RegexOptions.CultureInvariant)]
    private static partial Regex PlainNumber();

    [GeneratedRegex(@"^(?<sign>[+-]?)(?<whole>[0-9]+),(?<fraction>[0-9]+)$", RegexOptions.CultureInvariant)]
    private static partial Regex SingleComma();

    /// <summary>Digits grouped by commas, points, apostrophes or (no-break) spaces: what thousands separators look like.</summary>
    [GeneratedRegex(@"^[+-]?[0-9]+(?:[,.'\u00A0\u202F ][0-9]+)+$", RegexOptions.CultureInvariant)]
    private static partial Regex SeparatedDigits();
}
