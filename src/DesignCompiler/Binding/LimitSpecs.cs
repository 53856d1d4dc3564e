using DesignCompiler.Syntax;
using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>
/// A minimum or maximum on the plots of some arms, per round or per block. Percentages are
/// kept as written and turned into plots against each round's or block's size by the planner
/// (a minimum rounds up, a maximum rounds down, so the written share always holds).
/// </summary>
public sealed record BoundLimit(
    LimitTargetKind TargetKind, IReadOnlyList<int> Arms, BoundDirection Direction, double Amount, bool IsPercent,
    LimitScope Scope, TextSpan Span)
{
    public int PlotsFor(int size) => !IsPercent
        ? (int)Amount
        : Direction == BoundDirection.AtLeast
            ? (int)Math.Ceiling(Amount * size / 100 - 1e-9)
            : (int)Math.Floor(Amount * size / 100 + 1e-9);
}

/// <summary>Plots of seed or material available for one arm over the whole trial.</summary>
public sealed record StockLimit(int Arm, int Plots, TextSpan Span);

/// <summary>Rounds in which an arm may be sown, inclusive.</summary>
public sealed record WindowLimit(int Arm, int FromRound, int UntilRound, TextSpan Span)
{
    public bool Contains(int round) => round >= FromRound && round <= UntilRound;
}

/// <summary>After a plot grows one of <see cref="Arms"/>, it does not grow that same arm again for the next <see cref="Rounds"/> rounds.</summary>
public sealed record RestRule(IReadOnlyList<int> Arms, int Rounds, TextSpan Span);

/// <summary><see cref="Arm"/> may not follow <see cref="Previous"/> on the same plot.</summary>
public sealed record AfterRule(int Arm, int Previous, TextSpan Span);
