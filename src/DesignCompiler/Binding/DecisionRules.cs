using System.Globalization;
using DesignCompiler.Syntax;
using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>A test on an arm's posterior: its probability of being best, or its expected loss.</summary>
public sealed record Criterion(CriterionMetric Metric, Comparison Comparison, double Threshold)
{
    public bool Holds(double value) => Comparison switch
    {
        Comparison.AtLeast => value >= Threshold,
        Comparison.AtMost => value <= Threshold,
        Comparison.Above => value > Threshold,
        _ => value < Threshold,
    };

    /// <summary>
    /// The value as a finding prints it: four decimals, or as many more as it takes for the printed number to
    /// fall on the same side of the threshold as the value itself. Four alone would print P(best) 0.99986 as
    /// "0.9999" beside "not met" for 'best &gt;= 0.9999', and a reader would rightly ask why.
    /// </summary>
    public string Show(double value)
    {
        var holds = Holds(value);
        for (var digits = 4; digits <= 17; digits++)
        {
            var text = value.ToString("0." + new string('#', digits), CultureInfo.InvariantCulture);
            if (Holds(double.Parse(text, CultureInfo.InvariantCulture)) == holds) return text;
        }
        return value.ToString("R", CultureInfo.InvariantCulture);
    }

    public string Describe() =>
        FormattableString.Invariant($"{(Metric == CriterionMetric.Best ? "best" : "loss")} {Operator} {Threshold}");

    private string Operator => Comparison switch
    {
        Comparison.AtLeast => ">=",
        Comparison.AtMost => "<=",
        Comparison.Above => ">",
        _ => "<",
    };
}

/// <summary>
/// Stop the trial when the leading arm meets the criterion, once <see cref="AfterRound"/>
/// rounds are recorded (0: from the first result on).
/// </summary>
public sealed record StopRule(Criterion Criterion, int AfterRound, TextSpan Span);

/// <summary>Stop sowing an arm when it meets the criterion, once <see cref="AfterRound"/> rounds are recorded. The control is never dropped.</summary>
public sealed record DropRule(Criterion Criterion, int AfterRound, TextSpan Span);
