using DesignCompiler.Diagnostics;
using DesignCompiler.Syntax;

namespace DesignCompiler.Binding;

public sealed partial class DesignBinder
{
    /// <summary>A whole number within [min, max], or null after reporting why not.</summary>
    private int? Whole(NumberSyntax number, string what, long min, long max)
    {
        if (!number.IsInteger)
        {
            Report(DiagnosticCatalog.NotWholeNumber, number.Span, what, number.Text);
            return null;
        }
        if (number.Value < min || number.Value > max)
        {
            Report(DiagnosticCatalog.OutOfRange, number.Span, what, RangeText(min, max), number.Text);
            return null;
        }
        return (int)number.Value;
    }

    private static string RangeText(long min, long max) =>
        max >= int.MaxValue
            ? FormattableString.Invariant($"at least {min}")
            : FormattableString.Invariant($"between {min} and {max}");

    /// <summary>A finite number that passes <paramref name="ok"/>; <paramref name="range"/> words the rule for the message.</summary>
    private double? Real(NumberSyntax number, string what, string range, Func<double, bool> ok)
    {
        if (!double.IsFinite(number.Value) || !ok(number.Value))
        {
            Report(DiagnosticCatalog.OutOfRange, number.Span, what, range, number.Text);
            return null;
        }
        return number.Value;
    }

    private double? Positive(NumberSyntax number, string what) => Real(number, what, "greater than 0", v => v > 0);

    private double? Probability(NumberSyntax number, string what) => Real(number, what, "between 0 and 1", v => v is >= 0 and <= 1);

    private double? Finite(NumberSyntax number, string what) => Real(number, what, "a finite number", _ => true);

    /// <summary>A number in [<paramref name="min"/>, <paramref name="max"/>], the range named in the message (see <see cref="DesignLimits"/> for why).</summary>
    private double? Between(NumberSyntax number, string what, double min, double max) =>
        Real(number, what, $"between {DesignLimits.Text(min)} and {DesignLimits.Text(max)}", v => v >= min && v <= max);

    private double? PriorParameter(NumberSyntax number, string what) =>
        Between(number, what, DesignLimits.MinPriorParameter, DesignLimits.MaxPriorParameter);

    private double? Scale(NumberSyntax number, string what) => Between(number, what, DesignLimits.MinScale, DesignLimits.MaxMagnitude);
}
