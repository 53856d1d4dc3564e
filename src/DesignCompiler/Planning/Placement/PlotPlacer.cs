using DesignCompiler.Binding;
using DesignCompiler.Randomness;

namespace DesignCompiler.Planning.Placement;

/// <summary>A round's placement, or the arms a block could not place under the rotation rules.</summary>
public sealed record PlacementResult(IReadOnlyList<PlotAssignment>? Assignments, string? Problem);

/// <summary>
/// Puts each block's arms on its plots at random, reproducibly. For round r and block j
/// (zero-based index in design order) the block's arm list is written in design order, each
/// arm repeated by its count, then shuffled by Fisher–Yates (Knuth, TAOCP vol. 2, Algorithm P)
/// driven by xoshiro256** seeded with StreamSeed.Derive(seed, 1, r, j); position k of the
/// shuffled list is plot k (row-major in the layout). Anyone with the seed can redo it.
/// With rotation rules, arms the shuffle put on a plot where they may not grow are lifted off
/// and placed again by augmenting paths (Kuhn's bipartite matching), trying plots in an order
/// drawn from the same stream; the result is a random placement that meets every rule, close
/// to the plain shuffle, though not exactly uniform over all placements that meet the rules.
/// </summary>
public static class PlotPlacer
{
    public static PlacementResult Place(CheckedDesign design, int round, int[,] counts, RotationRules? rules = null)
    {
        var blocks = design.Blocks.Count;
        var flat = new int[design.Arms.Count * blocks];
        for (var i = 0; i < design.Arms.Count; i++)
            for (var j = 0; j < blocks; j++) flat[i * blocks + j] = counts[i, j];
        var arms = new int[design.PlotsPerRound];
        var problem = PlaceArms(design, round, flat, rules, arms);
        if (problem is not null) return new PlacementResult(null, problem);

        var result = new List<PlotAssignment>(arms.Length);
        var offset = 0;
        foreach (var block in design.Blocks)
        {
            for (var plot = 0; plot < block.Plots; plot++)
            {
                var arm = arms[offset + plot];
                result.Add(new PlotAssignment(block.Name, block.Index, plot, block.PlotId(plot), block.RowOf(plot), block.ColumnOf(plot), arm, design.Arms[arm].Code));
            }
            offset += block.Plots;
        }
        return new PlacementResult(result, null);
    }

    /// <summary>
    /// The placement as the arm on every plot (design order), for callers that need no plot records: the
    /// simulator. <paramref name="counts"/> is row-major (arm · blocks + block). Returns the problem when the
    /// rotation rules leave some arm too few plots, otherwise null.
    /// </summary>
    public static string? PlaceArms(CheckedDesign design, int round, ReadOnlySpan<int> counts, RotationRules? rules, Span<int> armOfPlot)
    {
        var blocks = design.Blocks.Count;
        var offset = 0;
        for (var b = 0; b < blocks; b++)
        {
            var block = design.Blocks[b];
            var arms = armOfPlot.Slice(offset, block.Plots);
            var k = 0;
            for (var i = 0; i < design.Arms.Count; i++)
                for (var c = 0; c < counts[i * blocks + block.Index]; c++) arms[k++] = i;

            var rng = new Xoshiro256StarStar(StreamSeed.Derive(design.Seed, StreamPurpose.Placement, (ulong)round, (ulong)block.Index));
            Shuffle.FisherYates(arms, ref rng);

            if (rules is { Any: true })
            {
                var repaired = arms.ToArray();
                var problem = Repair(design, block, offset, repaired, rules, ref rng);
                if (problem is not null) return FormattableString.Invariant($"round {round}, block {block.Name}: {problem}");
                repaired.CopyTo(arms);
            }
            offset += block.Plots;
        }
        return null;
    }

    /// <summary>Moves arms off plots where they may not grow; null when every arm found a plot.</summary>
    private static string? Repair(CheckedDesign design, BlockSpec block, int offset, int[] arms, RotationRules rules, ref Xoshiro256StarStar rng)
    {
        var plots = arms.Length;
        var owner = (int[])arms.Clone();
        var lifted = new List<int>();
        for (var plot = 0; plot < plots; plot++)
        {
            if (!rules.IsForbidden(offset + plot, arms[plot])) continue;
            lifted.Add(arms[plot]);
            owner[plot] = -1;
        }
        if (lifted.Count == 0) return null;

        var order = Enumerable.Range(0, plots).ToArray();
        Shuffle.FisherYates<int>(order, ref rng);
        foreach (var arm in lifted)
        {
            var visited = new bool[plots];
            if (!TryPlace(arm, owner, visited, order, offset, rules))
            {
                var allowed = Enumerable.Range(0, plots).Count(p => !rules.IsForbidden(offset + p, arm));
                var needed = arms.Count(a => a == arm);
                return FormattableString.Invariant(
                    $"{needed} plots of {design.Arms[arm].Code} cannot all be placed: the rotation rules leave {allowed} of its {block.Plots} plots, and the other arms need some of those");
            }
        }
        Array.Copy(owner, arms, plots);
        return null;
    }

    /// <summary>One augmenting path: put the arm on a free allowed plot, or move that plot's arm on.</summary>
    private static bool TryPlace(int arm, int[] owner, bool[] visited, int[] order, int offset, RotationRules rules)
    {
        foreach (var plot in order)
        {
            if (visited[plot] || rules.IsForbidden(offset + plot, arm)) continue;
            visited[plot] = true;
            if (owner[plot] < 0 || TryPlace(owner[plot], owner, visited, order, offset, rules))
            {
                owner[plot] = arm;
                return true;
            }
        }
        return false;
    }
}
