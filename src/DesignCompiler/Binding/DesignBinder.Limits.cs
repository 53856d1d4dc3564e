using DesignCompiler.Diagnostics;
using DesignCompiler.Syntax;
using DesignCompiler.Text;

namespace DesignCompiler.Binding;

public sealed partial class DesignBinder
{
    private sealed record BoundLimits(List<BoundLimit> Bounds, List<StockLimit> Stocks, List<WindowLimit> Windows);

    private BoundLimits BindLimits(IReadOnlyList<LimitStatementSyntax> statements, IReadOnlyList<ArmSpec> arms, int? control, int rounds)
    {
        var result = new BoundLimits([], [], []);
        foreach (var statement in statements)
        {
            var targets = ResolveTarget(statement.Target, arms, control);
            if (targets is null) continue;
            switch (statement.Rule)
            {
                case BoundRuleSyntax bound:
                    var amount = BindAmount(bound.Amount);
                    if (amount is not null)
                        result.Bounds.Add(new BoundLimit(statement.Target.Kind, targets, bound.Direction, amount.Value,
                            bound.Amount.IsPercent, bound.Scope, statement.Span));
                    break;
                case StockRuleSyntax stock:
                    var plots = Whole(stock.Plots, "a stock", 0, int.MaxValue);
                    if (plots is not null)
                        result.Stocks.AddRange(targets.Select(arm => new StockLimit(arm, plots.Value, statement.Span)));
                    break;
                case WindowRuleSyntax window:
                    var span = BindWindow(window, rounds);
                    if (span is not null)
                        result.Windows.AddRange(targets.Select(arm => new WindowLimit(arm, span.Value.From, span.Value.Until, statement.Span)));
                    break;
            }
        }

        foreach (var arm in arms)
        {
            var windows = result.Windows.Where(w => w.Arm == arm.Index).ToList();
            if (windows.Count == 0) continue;
            var from = windows.Max(w => w.FromRound);
            var until = windows.Min(w => w.UntilRound);
            if (from > until)
                Report(DiagnosticCatalog.ArmNeverAvailable, windows[^1].Span, arm.Code,
                    FormattableString.Invariant($"its windows leave no round between {from} and {until}"));
        }

        var stockByArm = result.Stocks.GroupBy(s => s.Arm).Where(g => g.Count() > 1);
        foreach (var group in stockByArm)
        {
            var list = group.ToList();
            Report(DiagnosticCatalog.RepeatedWindow, list[1].Span, arms[group.Key].Code, "a stock", LineOf(list[0].Span));
        }
        return result;
    }

    /// <summary>The arms a limit or rotation rule is about, or null after reporting why none.</summary>
    private IReadOnlyList<int>? ResolveTarget(LimitTargetSyntax target, IReadOnlyList<ArmSpec> arms, int? control)
    {
        switch (target.Kind)
        {
            case LimitTargetKind.EveryArm:
                return arms.Select(a => a.Index).ToList();
            case LimitTargetKind.Control:
                if (control is not null) return [control.Value];
                if (!IsBroken("control") && !_controlWritten)
                    ReportWithHint(DiagnosticCatalog.ControlNotNamed, target.Span, "add a line such as 'control OV'");
                return null;
            default:
                var index = ResolveArm(target.Arm!, arms);
                return index is null ? null : [index.Value];
        }
    }

    private double? BindAmount(AmountSyntax amount)
    {
        if (amount.IsPercent)
            return Real(amount.Value, "a share", "between 0% and 100%", v => v is >= 0 and <= 100);
        var plots = Whole(amount.Value, "a number of plots in a limit", 0, DesignLimits.MaxPlotsPerRound);
        return plots;
    }

    private (int From, int Until)? BindWindow(WindowRuleSyntax window, int rounds)
    {
        var from = 1;
        var until = rounds;
        if (window.FromRound is { } first)
        {
            var value = WindowRound(first, rounds);
            if (value is null) return null;
            from = value.Value;
        }
        if (window.UntilRound is { } last)
        {
            var value = WindowRound(last, rounds);
            if (value is null) return null;
            until = value.Value;
        }
        if (from > until)
        {
            ReportWithHint(DiagnosticCatalog.WindowOutsideTrial, window.Span, "swap the two rounds",
                FormattableString.Invariant($"the window from round {from} until round {until} is empty"));
            return null;
        }
        return (from, until);
    }

    private int? WindowRound(NumberSyntax number, int rounds)
    {
        if (!number.IsInteger)
        {
            Report(DiagnosticCatalog.NotWholeNumber, number.Span, "a round number", number.Text);
            return null;
        }
        if (number.Value < 1 || number.Value > rounds)
        {
            ReportWithHint(DiagnosticCatalog.WindowOutsideTrial, number.Span,
                FormattableString.Invariant($"rounds are numbered 1 to {rounds}"),
                FormattableString.Invariant($"round {number.Text} is outside the trial, which has {rounds} rounds"));
            return null;
        }
        return (int)number.Value;
    }

    private (List<RestRule> RestRules, List<AfterRule> AfterRules) BindRotation(
        IReadOnlyList<RotationStatementSyntax> statements, IReadOnlyList<ArmSpec> arms, int? control, int? rounds)
    {
        var rest = new List<RestRule>();
        var after = new List<AfterRule>();
        foreach (var statement in statements)
        {
            switch (statement)
            {
                case RestRotationSyntax r:
                    var targets = ResolveTarget(r.Target, arms, control);
                    var count = Whole(r.Rounds, "a rest in rounds", 1, DesignLimits.MaxRounds);
                    if (targets is null || count is null) break;
                    if (rounds is not null && count >= rounds)
                        Report(DiagnosticCatalog.RotationRestTooLong, r.Rounds.Span, count, rounds);
                    // A plot must grow some arm every round, so resting every arm r rounds needs r + 1 arms.
                    if (r.Target.Kind == LimitTargetKind.EveryArm && rounds > count && arms.Count <= count)
                        ReportWithHint(DiagnosticCatalog.RotationNeedsArms, r.Span, "shorten the rest or add arms", count, count + 1, arms.Count);
                    rest.Add(new RestRule(targets, count.Value, r.Span));
                    break;
                case AfterRotationSyntax a:
                    if (a.Arm.Name == a.Previous.Name)
                    {
                        Report(DiagnosticCatalog.RotationSelf, a.Span, a.Arm.Name);
                        break;
                    }
                    var arm = ResolveArm(a.Arm, arms);
                    var previous = ResolveArm(a.Previous, arms);
                    if (arm is not null && previous is not null) after.Add(new AfterRule(arm.Value, previous.Value, a.Span));
                    break;
            }
        }
        return (rest, after);
    }

    private Criterion BindCriterion(CriterionSyntax criterion)
    {
        var threshold = criterion.Metric == CriterionMetric.Best
            ? Probability(criterion.Threshold, "a probability of being best")
            : Real(criterion.Threshold, "an expected loss", "0 or more", v => v >= 0);
        return new Criterion(criterion.Metric, criterion.Comparison, threshold ?? 0);
    }

    private int BindAfterRound(NumberSyntax? round, int? rounds) =>
        round is null ? 0 : Whole(round, "the round after which a rule applies", 1, rounds ?? DesignLimits.MaxRounds) ?? 0;

}
