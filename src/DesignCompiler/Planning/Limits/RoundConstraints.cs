using DesignCompiler.Binding;
using DesignCompiler.Syntax;

namespace DesignCompiler.Planning.Limits;

/// <summary>
/// Every limit of the design turned into whole plots for one round: per arm over the
/// round, and per arm and block. Each bound remembers the limit that set it, so a clash
/// can be explained with the lines that caused it.
/// </summary>
public sealed class RoundConstraints
{
    private RoundConstraints(int round, int arms, int blocks)
    {
        Round = round;
        Available = new bool[arms];
        RoundMinimum = new int[arms];
        RoundMaximum = new int[arms];
        CellMinimum = new int[arms, blocks];
        CellMaximum = new int[arms, blocks];
        RoundMinimumSource = new BoundLimit?[arms];
        RoundMaximumSource = new object?[arms];
        CellMinimumSource = new BoundLimit?[arms, blocks];
        CellMaximumSource = new BoundLimit?[arms, blocks];
        RotationCapped = new bool[arms, blocks];
    }

    /// <summary>Cells whose maximum is the number of plots the rotation rules leave for the arm.</summary>
    public bool[,] RotationCapped { get; }

    public int Round { get; private set; }
    public bool[] Available { get; }
    public int[] RoundMinimum { get; }
    public int[] RoundMaximum { get; }
    public int[,] CellMinimum { get; }
    public int[,] CellMaximum { get; }

    /// <summary>The round-scope limit behind each arm's minimum (null: none, or the block minimums add up to more).</summary>
    public BoundLimit?[] RoundMinimumSource { get; }

    /// <summary>The limit behind each arm's maximum: a <see cref="BoundLimit"/>, a <see cref="StockLimit"/>, or null.</summary>
    public object?[] RoundMaximumSource { get; }

    public BoundLimit?[,] CellMinimumSource { get; }
    public BoundLimit?[,] CellMaximumSource { get; }

    /// <summary>
    /// The bounds for <paramref name="round"/>. <paramref name="stockUsed"/> is what earlier
    /// rounds issued per arm; <paramref name="dropped"/> marks arms a drop rule has removed.
    /// Stock still needed for the minimums of later rounds is held back, so adaptive rounds
    /// can never use up the seed that a later minimum needs.
    /// </summary>
    /// <param name="allowedPlots">When rotation rules apply, how many plots of each block may grow each arm this round.</param>
    /// <param name="reuse">an earlier result for the same design to overwrite instead of allocating a new one (the simulator's hot loop).</param>
    public static RoundConstraints Resolve(CheckedDesign design, int round, ReadOnlySpan<int> stockUsed, ReadOnlySpan<bool> dropped, int[,]? allowedPlots = null,
        RoundConstraints? reuse = null)
    {
        var arms = design.Arms.Count;
        var blocks = design.Blocks;
        var total = design.PlotsPerRound;
        var result = reuse is not null && reuse.Available.Length == arms && reuse.CellMinimum.GetLength(1) == blocks.Count
            ? reuse.Cleared(round)
            : new RoundConstraints(round, arms, blocks.Count);

        for (var i = 0; i < arms; i++)
        {
            result.Available[i] = !dropped[i] && IsInWindow(design, i, round);
            if (!result.Available[i]) continue;

            var roundMin = 0;
            var roundMax = total;
            BoundLimit? minSource = null;
            object? maxSource = null;
            for (var j = 0; j < blocks.Count; j++)
            {
                result.CellMaximum[i, j] = blocks[j].Plots;
            }

            // Indexed loops here and below: this runs for every arm of every simulated round, and an interface
            // enumerator is an allocation each time.
            for (var b = 0; b < design.Bounds.Count; b++)
            {
                var limit = design.Bounds[b];
                if (!Targets(limit, i)) continue;
                if (limit.Scope == LimitScope.PerRound)
                {
                    var plots = limit.PlotsFor(total);
                    if (limit.Direction == BoundDirection.AtLeast && plots > roundMin) (roundMin, minSource) = (plots, limit);
                    if (limit.Direction == BoundDirection.AtMost && plots < roundMax) (roundMax, maxSource) = (plots, limit);
                    continue;
                }
                for (var j = 0; j < blocks.Count; j++)
                {
                    var plots = limit.PlotsFor(blocks[j].Plots);
                    if (limit.Direction == BoundDirection.AtLeast && plots > result.CellMinimum[i, j])
                        (result.CellMinimum[i, j], result.CellMinimumSource[i, j]) = (plots, limit);
                    if (limit.Direction == BoundDirection.AtMost && plots < result.CellMaximum[i, j])
                        (result.CellMaximum[i, j], result.CellMaximumSource[i, j]) = (plots, limit);
                }
            }

            if (allowedPlots is not null)
            {
                for (var j = 0; j < blocks.Count; j++)
                {
                    if (allowedPlots[i, j] >= result.CellMaximum[i, j]) continue;
                    result.CellMaximum[i, j] = allowedPlots[i, j];
                    result.CellMaximumSource[i, j] = null;
                    result.RotationCapped[i, j] = true;
                }
            }

            var cellMinSum = 0;
            var cellMaxSum = 0;
            for (var j = 0; j < blocks.Count; j++)
            {
                cellMinSum += result.CellMinimum[i, j];
                cellMaxSum += result.CellMaximum[i, j];
            }
            if (cellMinSum > roundMin) (roundMin, minSource) = (cellMinSum, null);
            if (cellMaxSum < roundMax) (roundMax, maxSource) = (cellMaxSum, null);

            if (StockOf(design, i) is { } stock)
            {
                var left = stock.Plots - stockUsed[i] - FutureMinimums(design, i, round);
                if (left < roundMax) (roundMax, maxSource) = (Math.Max(0, left), stock);
            }

            result.RoundMinimum[i] = roundMin;
            result.RoundMaximum[i] = roundMax;
            result.RoundMinimumSource[i] = minSource;
            result.RoundMaximumSource[i] = maxSource;
        }
        return result;
    }

    private RoundConstraints Cleared(int round)
    {
        Round = round;
        Array.Clear(Available);
        Array.Clear(RoundMinimum);
        Array.Clear(RoundMaximum);
        Array.Clear(CellMinimum);
        Array.Clear(CellMaximum);
        Array.Clear(RoundMinimumSource);
        Array.Clear(RoundMaximumSource);
        Array.Clear(CellMinimumSource);
        Array.Clear(CellMaximumSource);
        Array.Clear(RotationCapped);
        return this;
    }

    public static bool IsInWindow(CheckedDesign design, int arm, int round)
    {
        for (var w = 0; w < design.Windows.Count; w++)
            if (design.Windows[w].Arm == arm && !design.Windows[w].Contains(round)) return false;
        return true;
    }

    public static StockLimit? StockOf(CheckedDesign design, int arm)
    {
        for (var s = 0; s < design.Stocks.Count; s++)
            if (design.Stocks[s].Arm == arm) return design.Stocks[s];
        return null;
    }

    private static bool Targets(BoundLimit limit, int arm)
    {
        for (var k = 0; k < limit.Arms.Count; k++) if (limit.Arms[k] == arm) return true;
        return false;
    }

    /// <summary>The plots an arm's minimums need in the rounds after <paramref name="round"/>, if it stays in the trial.</summary>
    public static int FutureMinimums(CheckedDesign design, int arm, int round)
    {
        var sum = 0;
        for (var r = round + 1; r <= design.Rounds; r++) sum += MinimumIfAvailable(design, arm, r);
        return sum;
    }

    /// <summary>The arm's own minimum in a round, from its limits alone (no stock, no other arms).</summary>
    public static int MinimumIfAvailable(CheckedDesign design, int arm, int round)
    {
        if (!IsInWindow(design, arm, round)) return 0;
        var total = design.PlotsPerRound;
        var roundMin = 0;
        var cellSum = 0;
        foreach (var block in design.Blocks)
        {
            var cell = 0;
            foreach (var limit in design.Bounds)
                if (limit.Scope == LimitScope.PerBlock && limit.Direction == BoundDirection.AtLeast && limit.Arms.Contains(arm))
                    cell = Math.Max(cell, limit.PlotsFor(block.Plots));
            cellSum += cell;
        }
        foreach (var limit in design.Bounds)
            if (limit.Scope == LimitScope.PerRound && limit.Direction == BoundDirection.AtLeast && limit.Arms.Contains(arm))
                roundMin = Math.Max(roundMin, limit.PlotsFor(total));
        return Math.Max(roundMin, cellSum);
    }
}
