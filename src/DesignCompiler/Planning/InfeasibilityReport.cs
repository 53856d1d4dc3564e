using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning.Allocation;
using DesignCompiler.Planning.Limits;
using DesignCompiler.Text;

namespace DesignCompiler.Planning;

/// <summary>
/// Turns an allocation that cannot be made into a diagnostic that names the clashing limits
/// with their lines and the numbers involved, instead of a silently wrong sheet.
/// </summary>
internal static class InfeasibilityReport
{
    public static PlanResult ForRound(CheckedDesign design, RoundConstraints c, ApportionmentResult result)
    {
        var round = c.Round;
        var arm = result.ArmIndex >= 0 ? design.Arms[result.ArmIndex] : null;
        var (message, spans) = result.Failure switch
        {
            ApportionmentFailure.MinimumsExceedTotal => (
                FormattableString.Invariant($"round {round}: the minimums need {result.Required} plots but the round has {result.Available}"),
                MinimumSources(c)),
            ApportionmentFailure.MaximumsBelowTotal => (
                FormattableString.Invariant($"round {round}: the maximums, remaining stock and rotation rules allow only {result.Available} of the {result.Required} plots to be sown"),
                MaximumSources(c).Concat(RotationSources(design, c)).ToList()),
            ApportionmentFailure.MinimumExceedsMaximum => (
                FormattableString.Invariant($"round {round}: arm '{arm?.Code}' needs at least {result.Required} plots but may have at most {result.Available}"),
                ArmSources(c, result.ArmIndex).Concat(RotationSources(design, c)).ToList()),
            _ => (FormattableString.Invariant($"round {round}: the plots cannot be shared out ({result.Failure})"), new List<(TextSpan, string)>()),
        };
        return Report(design, message, spans);
    }

    public static PlanResult ForBlocks(CheckedDesign design, RoundConstraints c, int[] totals, ControlledRoundingResult result)
    {
        var status = result.Status;
        var block = status.BlockIndex >= 0 && status.BlockIndex < design.Blocks.Count ? design.Blocks[status.BlockIndex] : null;
        var arm = status.ArmIndex >= 0 && status.ArmIndex < design.Arms.Count ? design.Arms[status.ArmIndex] : null;
        var spans = new List<(TextSpan, string)>();
        if (block is { IsImplicit: false }) spans.Add((block.Span, FormattableString.Invariant($"block {block.Name} has {block.Plots} plots")));
        spans.AddRange(MinimumSources(c));
        spans.AddRange(RotationSources(design, c));
        var message = result.Failure switch
        {
            ControlledRoundingFailure.ColumnMinimumsExceedTotal => FormattableString.Invariant(
                $"round {c.Round}, block {block?.Name}: {block?.Plots} plots, but the minimums need {status.Required}"),
            ControlledRoundingFailure.ColumnMaximumsBelowTotal => FormattableString.Invariant(
                $"round {c.Round}, block {block?.Name}: {block?.Plots} plots, but the maximums allow only {status.Available}"),
            ControlledRoundingFailure.RowMinimumsExceedTotal => FormattableString.Invariant(
                $"round {c.Round}: arm '{arm?.Code}' gets {status.Available} plots but its per-block minimums need {status.Required}"),
            ControlledRoundingFailure.RowMaximumsBelowTotal => FormattableString.Invariant(
                $"round {c.Round}: arm '{arm?.Code}' gets {status.Required} plots but its per-block maximums hold only {status.Available}"),
            _ => FormattableString.Invariant(
                $"round {c.Round}: the arm totals ({string.Join(", ", totals.Select((t, i) => design.Arms[i].Code + " " + t))}) cannot be split over the blocks within the per-block limits ({result.Failure}: {status.Required} plots needed, {status.Available} possible)"),
        };
        return Report(design, message, spans);
    }

    public static PlanResult ForRotation(CheckedDesign design, string problem)
    {
        var spans = design.RestRules.Select(r => (r.Span, "a rotation rule"))
            .Concat(design.AfterRules.Select(r => (r.Span, "a rotation rule"))).ToList();
        var primary = spans.Count > 0 ? design.Locate(spans[0].Span) : SourceLocation.File(design.Source.Path);
        var related = spans.Skip(1).Select(s => new RelatedLocation(design.Locate(s.Span), s.Item2)).ToList();
        return new PlanResult(null, null, [new Diagnostic(DiagnosticCatalog.RotationInfeasible, primary, [problem], null, related)]);
    }

    private static PlanResult Report(CheckedDesign design, string message, List<(TextSpan Span, string Note)> spans)
    {
        var distinct = spans.DistinctBy(s => s.Span).ToList();
        var primary = distinct.Count > 0 ? design.Locate(distinct[0].Span) : SourceLocation.File(design.Source.Path);
        var related = distinct.Skip(1).Select(s => new RelatedLocation(design.Locate(s.Span), s.Note)).ToList();
        return new PlanResult(null, null, [new Diagnostic(DiagnosticCatalog.RoundInfeasible, primary, [message], null, related)]);
    }

    /// <summary>The rotation rules, when they capped where some arm may go this round.</summary>
    private static IEnumerable<(TextSpan, string)> RotationSources(CheckedDesign design, RoundConstraints c)
    {
        var capped = false;
        foreach (var cell in c.RotationCapped) capped |= cell;
        if (!capped) return [];
        return design.RestRules.Select(r => (r.Span, "a rotation rule limits which plots an arm may use"))
            .Concat(design.AfterRules.Select(r => (r.Span, "a rotation rule limits which plots an arm may use")));
    }

    private static List<(TextSpan, string)> MinimumSources(RoundConstraints c)
    {
        var list = new List<(TextSpan, string)>();
        for (var i = 0; i < c.RoundMinimum.Length; i++)
        {
            if (c.RoundMinimumSource[i] is { } s) list.Add((s.Span, "a minimum set here"));
            for (var j = 0; j < c.CellMinimumSource.GetLength(1); j++)
                if (c.CellMinimumSource[i, j] is { } cell) list.Add((cell.Span, "a minimum set here"));
        }
        return list;
    }

    private static List<(TextSpan, string)> MaximumSources(RoundConstraints c)
    {
        var list = new List<(TextSpan, string)>();
        foreach (var source in c.RoundMaximumSource)
        {
            if (source is BoundLimit b) list.Add((b.Span, "a maximum set here"));
            if (source is StockLimit s) list.Add((s.Span, "a stock set here"));
        }
        return list;
    }

    private static List<(TextSpan, string)> ArmSources(RoundConstraints c, int arm)
    {
        var list = new List<(TextSpan, string)>();
        if (c.RoundMinimumSource[arm] is { } min) list.Add((min.Span, "the minimum is set here"));
        if (c.RoundMaximumSource[arm] is BoundLimit max) list.Add((max.Span, "the maximum is set here"));
        if (c.RoundMaximumSource[arm] is StockLimit stock) list.Add((stock.Span, "the stock is set here"));
        return list;
    }
}
