using DesignCompiler.Diagnostics;

namespace DesignCompiler.Results;

public enum OutcomeKind
{
    /// <summary>A number the family accepts.</summary>
    Value,

    /// <summary>Written as <c>missing</c> or <c>missing: reason</c>.</summary>
    Missing,

    /// <summary>Nothing written.</summary>
    Blank,

    /// <summary>Written, but not a value that can be recorded; <see cref="OutcomeReading.Problem"/> says why.</summary>
    Problem,
}

/// <summary>How a number marked its decimals, so a sheet that mixes commas and points can be caught.</summary>
public enum DecimalMark
{
    None,
    Point,
    Comma,
}

/// <summary>What one outcome cell says.</summary>
public sealed record OutcomeReading(
    OutcomeKind Kind, double Value, string? MissingReason, DecimalMark Mark,
    DiagnosticDescriptor? Problem = null, IReadOnlyList<object>? Arguments = null)
{
    public static OutcomeReading Blank { get; } = new(OutcomeKind.Blank, 0, null, DecimalMark.None);

    public static OutcomeReading Missing(string reason) => new(OutcomeKind.Missing, 0, reason, DecimalMark.None);

    public static OutcomeReading Number(double value, DecimalMark mark) => new(OutcomeKind.Value, value, null, mark);

    public static OutcomeReading Refused(DiagnosticDescriptor problem, params object[] arguments) =>
        new(OutcomeKind.Problem, 0, null, DecimalMark.None, problem, arguments);
}
