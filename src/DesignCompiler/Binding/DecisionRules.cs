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
