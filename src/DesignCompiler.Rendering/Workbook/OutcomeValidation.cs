using System.Globalization;
using DesignCompiler.Binding;

namespace DesignCompiler.Rendering.Workbook;

/// <summary>
/// The data-validation rule on a workbook's outcome column: the values the outcome family takes,
/// or text starting with "missing" (the sheet's way to say a plot gave no result). A custom
/// formula, because the built-in whole-number and decimal rules refuse all text. IF, not AND,
/// guards the number tests: spreadsheets evaluate every argument of AND, and INT of a text is an
/// error that would refuse "missing: hail" too.
/// </summary>
internal sealed record OutcomeValidation(string Formula, string Prompt, string Error)
{
    public static OutcomeValidation For(OutcomeSpec outcome, string topLeft)
    {
        var missing = $"LEFT(LOWER(TRIM({topLeft})),7)=\"missing\"";
        string Rule(string numberTest) => $"IF(ISNUMBER({topLeft}),{numberTest},{missing})";
        var (formula, values) = outcome.Family switch
        {
            OutcomeFamily.Bernoulli => (Rule($"OR({topLeft}=0,{topLeft}=1)"), "1 (yes) or 0 (no)"),
            OutcomeFamily.Binomial => (Rule(Invariant($"AND({topLeft}=INT({topLeft}),{topLeft}>=0,{topLeft}<={outcome.Trials})")),
                Invariant($"a whole number from 0 to {outcome.Trials}")),
            OutcomeFamily.Count => (Rule($"AND({topLeft}=INT({topLeft}),{topLeft}>=0)"), "a whole count, 0 or more"),
            _ => (Rule("TRUE"), "a number" + (outcome.Unit is null ? "" : " in " + outcome.Unit)),
        };
        return new OutcomeValidation(formula, Clip($"Write {values}, or 'missing: reason'."),
            Clip($"{outcome.Name} takes {values}; for a plot without a result write 'missing: reason'."));
    }

    /// <summary>Spreadsheets cap a validation message at 255 characters.</summary>
    private static string Clip(string text) => text.Length <= 255 ? text : text[..254] + "…";

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
