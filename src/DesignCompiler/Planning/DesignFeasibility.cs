using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning.Limits;
using DesignCompiler.Text;

namespace DesignCompiler.Planning;

/// <summary>
/// Limits that can never hold together, found from the design alone, before any data:
/// minimums that need more plots than a round or block has, maximums that leave plots
/// unsown, a minimum above a maximum, a stock smaller than the minimums it must cover.
/// Uses the same <see cref="RoundConstraints"/> the planner uses, so check and compile agree.
/// </summary>
public static class DesignFeasibility
{
    private sealed record Problem(DiagnosticDescriptor Descriptor, TextSpan Span, string? Scope, object[] Arguments, IReadOnlyList<(TextSpan Span, string Note)> Related);

    public static IReadOnlyList<Diagnostic> Check(CheckedDesign design)
    {
        var diagnostics = new List<Diagnostic>();
        var stockShort = CheckStocks(design, diagnostics);

        var problems = new List<(int Round, Problem Problem)>();
        var none = new int[design.Arms.Count];
        var notDropped = new bool[design.Arms.Count];
        for (var round = 1; round <= design.Rounds; round++)
        {
            var constraints = RoundConstraints.Resolve(design, round, none, notDropped);
            foreach (var problem in ProblemsIn(design, constraints, stockShort))
                problems.Add((round, problem));
        }

        // The same clash usually holds in every round: say it once and list the rounds.
        foreach (var group in problems.GroupBy(p => (p.Problem.Descriptor.Id, p.Problem.Span, p.Problem.Scope, Key: string.Join("|", p.Problem.Arguments))))
        {
            var rounds = group.Select(p => p.Round).ToList();
            var first = group.First().Problem;
            var arguments = first.Arguments.ToArray();
            arguments[0] = RoundText(rounds, design.Rounds);
            var related = first.Related
                .Select(r => new RelatedLocation(design.Locate(r.Span), r.Note))
                .ToList();
            diagnostics.Add(new Diagnostic(first.Descriptor, design.Locate(first.Span), arguments, null, related));
        }
        return diagnostics.OrderBy(d => d.Location.Span.Start).ToList();
    }

    private static HashSet<int> CheckStocks(CheckedDesign design, List<Diagnostic> diagnostics)
    {
        var shortArms = new HashSet<int>();
        foreach (var stock in design.Stocks)
        {
            var need = 0;
            var rounds = new List<int>();
            for (var r = 1; r <= design.Rounds; r++)
            {
                var min = RoundConstraints.MinimumIfAvailable(design, stock.Arm, r);
                if (min > 0) rounds.Add(r);
                need += min;
            }
            if (need <= stock.Plots) continue;
            shortArms.Add(stock.Arm);
            diagnostics.Add(new Diagnostic(DiagnosticCatalog.StockBelowMinimums, design.Locate(stock.Span),
                [design.Arms[stock.Arm].Code, stock.Plots, RangeText(rounds), need],
                FormattableString.Invariant($"order at least {need} plots' worth, or lower the arm's minimums or rounds")));
        }
        return shortArms;
    }

    private static IEnumerable<Problem> ProblemsIn(CheckedDesign design, RoundConstraints c, HashSet<int> stockShort)
    {
        var blocks = design.Blocks;
        var arms = design.Arms;
        var multipleBlocks = blocks.Count > 1 || !blocks[0].IsImplicit;

        for (var i = 0; i < arms.Count; i++)
        {
            if (!c.Available[i] || stockShort.Contains(i)) continue;
            // One clash of two limits is one problem, however many blocks it shows in.
            var clashes = Enumerable.Range(0, blocks.Count).Where(j => c.CellMinimum[i, j] > c.CellMaximum[i, j]).ToList();
            foreach (var group in clashes.GroupBy(j => (c.CellMinimumSource[i, j]!.Span, c.CellMaximumSource[i, j]?.Span, c.CellMinimum[i, j], c.CellMaximum[i, j])))
            {
                var j = group.First();
                var max = c.CellMaximumSource[i, j];
                yield return new Problem(DiagnosticCatalog.ContradictoryBounds, c.CellMinimumSource[i, j]!.Span, null,
                    [0, "arm '" + arms[i].Code + "'", c.CellMinimum[i, j], c.CellMaximum[i, j], BlocksText(group.Select(b => blocks[b].Name).ToList())],
                    max is null ? [(blocks[j].Span, $"block {blocks[j].Name} has {blocks[j].Plots} plots")] : [(max.Span, "the maximum is set here")]);
            }
            // The round's bounds are sums of the block bounds, so a block clash would show again here.
            if (clashes.Count == 0 && c.RoundMinimum[i] > c.RoundMaximum[i])
            {
                var span = c.RoundMinimumSource[i]?.Span ?? FirstBlockMinimum(c, i)?.Span ?? arms[i].Span;
                var related = new List<(TextSpan, string)>();
                if (c.RoundMaximumSource[i] is BoundLimit maxLimit) related.Add((maxLimit.Span, "the maximum is set here"));
                yield return new Problem(DiagnosticCatalog.ContradictoryBounds, span, null,
                    [0, "arm '" + arms[i].Code + "'", c.RoundMinimum[i], c.RoundMaximum[i], "per round"], related);
            }
        }

        for (var j = 0; j < blocks.Count; j++)
        {
            long needed = 0;
            long allowed = 0;
            var minSources = new List<BoundLimit>();
            var maxSources = new List<BoundLimit>();
            for (var i = 0; i < arms.Count; i++)
            {
                if (!c.Available[i]) continue;
                needed += c.CellMinimum[i, j];
                allowed += Math.Min(c.CellMaximum[i, j], c.RoundMaximum[i]);
                if (c.CellMinimumSource[i, j] is { } s && !minSources.Contains(s)) minSources.Add(s);
                if (c.CellMaximumSource[i, j] is { } m && !maxSources.Contains(m)) maxSources.Add(m);
            }
            var where = multipleBlocks ? ", block " + blocks[j].Name : "";
            if (needed > blocks[j].Plots && minSources.Count > 0)
                yield return new Problem(DiagnosticCatalog.MinimumsExceedPlots, minSources[0].Span, blocks[j].Name,
                    [0, where, needed, blocks[j].Plots], Notes(minSources.Skip(1), "another minimum counted here", blocks[j]));
            if (allowed < blocks[j].Plots && maxSources.Count > 0)
                yield return new Problem(DiagnosticCatalog.MaximumsBelowPlots, maxSources[0].Span, blocks[j].Name,
                    [0, where, allowed, blocks[j].Plots], Notes(maxSources.Skip(1), "another maximum counted here", blocks[j]));
        }

        long roundNeeded = 0;
        long roundAllowed = 0;
        var roundMinSources = new List<BoundLimit>();
        var roundMaxSources = new List<object>();
        for (var i = 0; i < arms.Count; i++)
        {
            if (!c.Available[i]) continue;
            roundNeeded += c.RoundMinimum[i];
            roundAllowed += c.RoundMaximum[i];
            if (c.RoundMinimumSource[i] is { } s && !roundMinSources.Contains(s)) roundMinSources.Add(s);
            if (c.RoundMaximumSource[i] is { } m && !roundMaxSources.Contains(m)) roundMaxSources.Add(m);
        }
        var total = design.PlotsPerRound;
        if (roundNeeded > total && roundMinSources.Count > 0)
            yield return new Problem(DiagnosticCatalog.MinimumsExceedPlots, roundMinSources[0].Span, null,
                [0, "", roundNeeded, total], Notes(roundMinSources.Skip(1), "another minimum counted here", null));
        if (roundAllowed < total && roundMaxSources.Count > 0)
        {
            var first = SpanOf(roundMaxSources[0]);
            yield return new Problem(DiagnosticCatalog.MaximumsBelowPlots, first, null,
                [0, "", roundAllowed, total],
                roundMaxSources.Skip(1).Select(m => (SpanOf(m), "another maximum counted here")).ToList());
        }
    }

    private static string BlocksText(IReadOnlyList<string> names) =>
        names.Count == 1 ? "in block " + names[0]
        : names.Count <= 4 ? "in blocks " + string.Join(", ", names)
        : FormattableString.Invariant($"in {names.Count} blocks ({string.Join(", ", names.Take(3))}, ...)");

    private static BoundLimit? FirstBlockMinimum(RoundConstraints c, int arm)
    {
        for (var j = 0; j < c.CellMinimumSource.GetLength(1); j++)
            if (c.CellMinimumSource[arm, j] is { } s) return s;
        return null;
    }

    private static TextSpan SpanOf(object source) => source switch
    {
        BoundLimit b => b.Span,
        StockLimit s => s.Span,
        _ => default,
    };

    private static List<(TextSpan, string)> Notes(IEnumerable<BoundLimit> limits, string note, BlockSpec? block)
    {
        var notes = limits.Select(l => (l.Span, note)).ToList();
        if (block is { IsImplicit: false })
            notes.Add((block.Span, FormattableString.Invariant($"block {block.Name} has {block.Plots} plots")));
        return notes;
    }

    /// <summary>"round 3", "rounds 1-3" or "every round".</summary>
    private static string RoundText(IReadOnlyList<int> rounds, int totalRounds) =>
        rounds.Count == totalRounds && totalRounds > 1 ? "every round"
        : rounds.Count == 1 ? "round " + RangeText(rounds)
        : "rounds " + RangeText(rounds);

    /// <summary>"2", "1-4" or "1, 3, 4".</summary>
    internal static string RangeText(IReadOnlyList<int> rounds)
    {
        if (rounds.Count == 0) return "none";
        var contiguous = rounds.Zip(rounds.Skip(1)).All(p => p.Second == p.First + 1);
        if (rounds.Count == 1) return rounds[0].ToString(System.Globalization.CultureInfo.InvariantCulture);
        return contiguous
            ? FormattableString.Invariant($"{rounds[0]}-{rounds[^1]}")
            : string.Join(", ", rounds.Select(r => r.ToString(System.Globalization.CultureInfo.InvariantCulture)));
    }
}
