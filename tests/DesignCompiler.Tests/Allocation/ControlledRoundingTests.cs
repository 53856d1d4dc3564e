using DesignCompiler.Planning.Allocation;

namespace DesignCompiler.Tests.Allocation;

/// <summary>
/// Controlled rounding of arms × blocks tables. Expected tables are worked by hand from the
/// documented rule (floor/ceiling cells first, least squares otherwise).
/// </summary>
public class ControlledRoundingTests
{
    private static readonly int[,] NoMinimum3x2 = new int[3, 2];

    [Fact]
    public void RoundsToTheClosestFloorCeilingTable()
    {
        // p = [[2, 3], [1.2, 1.8], [0.8, 1.2]]. Row 0 is exact; [[1, 2], [1, 1]] for the other
        // rows costs 4 × 0.04, every alternative at least 0.64 + 0.64.
        var result = ControlledRounding.Round([5, 3, 2], [4, 6]);
        Assert.True(result.IsFeasible);
        Assert.Equal(RoundingMethod.NearestIntegers, result.Method);
        Assert.Equal(new[,] { { 2, 3 }, { 1, 2 }, { 1, 1 } }, result.Counts);
    }

    [Fact]
    public void EqualProportionsAreSettledTowardLowerIndices()
    {
        // 3 arms × 3 blocks, one plot each: p = 1/3 everywhere, every permutation matrix is
        // equally close. The rule is deterministic; pin its answer so any change is deliberate.
        var first = ControlledRounding.Round([1, 1, 1], [1, 1, 1]);
        var second = ControlledRounding.Round([1, 1, 1], [1, 1, 1]);
        Assert.Equal(first.Counts, second.Counts);
        Assert.Equal(new[,] { { 1, 0, 0 }, { 0, 1, 0 }, { 0, 0, 1 } }, first.Counts);
    }

    [Fact]
    public void BoundsInsideTheFloorCeilingWindowAreHonoured()
    {
        // Without bounds cell (1, 0) could be 1 or 2; a maximum of 1 keeps floor/ceiling rounding.
        var maximum = new[,] { { 9, 9 }, { 1, 9 }, { 9, 9 } };
        var result = ControlledRounding.Round([5, 3, 2], [4, 6], NoMinimum3x2, maximum);
        Assert.Equal(RoundingMethod.NearestIntegers, result.Method);
        Assert.True(result.Counts[1, 0] <= 1);
    }

    [Fact]
    public void BoundsOutsideTheWindowFallBackToLeastSquares()
    {
        // p = 2 in every cell of a 2 × 2 table with margins 4; a minimum of 3 in cell (0, 0)
        // leaves only [[3, 1], [1, 3]].
        var minimum = new[,] { { 3, 0 }, { 0, 0 } };
        var maximum = new[,] { { 4, 4 }, { 4, 4 } };
        var result = ControlledRounding.Round([4, 4], [4, 4], minimum, maximum);
        Assert.True(result.IsFeasible);
        Assert.Equal(RoundingMethod.LeastSquares, result.Method);
        Assert.Equal(new[,] { { 3, 1 }, { 1, 3 } }, result.Counts);
    }

    [Fact]
    public void LeastSquaresSpreadsTheForcedDeviation()
    {
        // 3 arms × 2 blocks, p = [[2, 2], [2, 2], [2, 2]]; arm 0 must put all 4 in block 0.
        // Block 0 then needs 2 more from arms 1 and 2: (1, 1) costs 2, (2, 0) costs 4.
        var minimum = new[,] { { 4, 0 }, { 0, 0 }, { 0, 0 } };
        var maximum = new[,] { { 4, 4 }, { 4, 4 }, { 4, 4 } };
        var result = ControlledRounding.Round([4, 4, 4], [6, 6], minimum, maximum);
        Assert.Equal(RoundingMethod.LeastSquares, result.Method);
        Assert.Equal(new[,] { { 4, 0 }, { 1, 3 }, { 1, 3 } }, result.Counts);
    }

    [Fact]
    public void DisagreeingTotalsAreReported()
    {
        var result = ControlledRounding.Round([5, 5], [4, 4]);
        Assert.Equal(ControlledRoundingFailure.TotalsDisagree, result.Failure);
        Assert.Equal(10, result.Status.Required);
        Assert.Equal(8, result.Status.Available);
    }

    [Fact]
    public void BlockWhoseMinimumsExceedItsPlotsIsNamed()
    {
        // "minimums need 18 plots, block has 16".
        var minimum = new[,] { { 10, 0 }, { 8, 0 } };
        var maximum = new[,] { { 20, 20 }, { 20, 20 } };
        var result = ControlledRounding.Round([16, 16], [16, 16], minimum, maximum);
        Assert.Equal(ControlledRoundingFailure.ColumnMinimumsExceedTotal, result.Failure);
        Assert.Equal(0, result.Status.BlockIndex);
        Assert.Equal(18, result.Status.Required);
        Assert.Equal(16, result.Status.Available);
    }

    [Fact]
    public void ArmWhoseMinimumsExceedItsTotalIsNamed()
    {
        var minimum = new[,] { { 0, 0 }, { 3, 3 } };
        var maximum = new[,] { { 9, 9 }, { 9, 9 } };
        var result = ControlledRounding.Round([6, 5], [6, 5], minimum, maximum);
        Assert.Equal(ControlledRoundingFailure.RowMinimumsExceedTotal, result.Failure);
        Assert.Equal(1, result.Status.ArmIndex);
        Assert.Equal(6, result.Status.Required);
        Assert.Equal(5, result.Status.Available);
    }

    [Fact]
    public void MaximumsTooSmallForARowOrColumnAreNamed()
    {
        var maximum = new[,] { { 1, 1 }, { 9, 9 } };
        var row = ControlledRounding.Round([4, 4], [4, 4], new int[2, 2], maximum);
        Assert.Equal(ControlledRoundingFailure.RowMaximumsBelowTotal, row.Failure);
        Assert.Equal(0, row.Status.ArmIndex);

        var columnMaximum = new[,] { { 1, 9 }, { 1, 9 } };
        var column = ControlledRounding.Round([4, 4], [4, 4], new int[2, 2], columnMaximum);
        Assert.Equal(ControlledRoundingFailure.ColumnMaximumsBelowTotal, column.Failure);
        Assert.Equal(0, column.Status.BlockIndex);
        Assert.Equal(4, column.Status.Required);
        Assert.Equal(2, column.Status.Available);
    }

    [Fact]
    public void GroupConflictIsReportedAsACut()
    {
        // Arms 0 and 1 may only use block 0 (4 plots between them, block 0 has 3); no single
        // row or column is at fault.
        var minimum = new int[3, 3];
        var maximum = new[,] { { 9, 0, 0 }, { 9, 0, 0 }, { 9, 9, 9 } };
        int[] rows = [2, 2, 2];
        int[] columns = [3, 2, 1];
        var result = ControlledRounding.Round(rows, columns, minimum, maximum);
        Assert.Equal(ControlledRoundingFailure.FlowCut, result.Failure);
        ControlledRoundingStatus cut = result.Status;
        Assert.True(cut.Required > cut.Available);
        Assert.Contains(0, cut.Arms);
        Assert.Contains(1, cut.Arms);
        Assert.Contains(0, cut.Blocks);

        // The reported numbers are the cut inequality for the reported sets, recomputed here.
        Assert.Equal(cut.Arms.Sum(i => rows[i]), cut.Required);
        Assert.Equal(CutCapacity(cut, columns, minimum, maximum), cut.Available);
    }

    [Fact]
    public void BadCellBoundsAreReported()
    {
        var crossed = ControlledRounding.Round([2, 2], [2, 2], new[,] { { 0, 0 }, { 0, 3 } }, new[,] { { 9, 9 }, { 9, 2 } });
        Assert.Equal(ControlledRoundingFailure.CellMinimumExceedsMaximum, crossed.Failure);
        Assert.Equal(1, crossed.Status.ArmIndex);
        Assert.Equal(1, crossed.Status.BlockIndex);

        var negative = ControlledRounding.Round([2, 2], [2, 2], new[,] { { 0, -1 }, { 0, 0 } }, new[,] { { 9, 9 }, { 9, 9 } });
        Assert.Equal(ControlledRoundingFailure.NegativeCellMinimum, negative.Failure);
        Assert.Equal(ControlledRoundingFailure.NegativeRowTotal, ControlledRounding.Round([-1, 1], [0, 0]).Failure);
        Assert.Equal(ControlledRoundingFailure.NegativeColumnTotal, ControlledRounding.Round([0, 0], [1, -1]).Failure);
    }

    [Fact]
    public void EmptyAndZeroTables()
    {
        Assert.True(ControlledRounding.Round([], []).IsFeasible);
        var zero = ControlledRounding.Round([0, 0], [0, 0, 0]);
        Assert.True(zero.IsFeasible);
        Assert.Equal(new int[2, 3], zero.Counts);
    }

    [Fact]
    public void WorkspaceReuseGivesTheSameTables()
    {
        var workspace = new ControlledRoundingWorkspace();
        int[] rows = [7, 5, 3, 1];
        int[] columns = [6, 5, 5];
        var minimum = new int[12];
        var maximum = Enumerable.Repeat(int.MaxValue, 12).ToArray();
        var first = new int[12];
        var again = new int[12];
        ControlledRounding.Round(rows, columns, minimum, maximum, first, workspace);
        ControlledRounding.Round([2, 2], [1, 3], new int[4], Enumerable.Repeat(9, 4).ToArray(), new int[4], workspace);
        ControlledRounding.Round(rows, columns, minimum, maximum, again, workspace);
        Assert.Equal(first, again);
        var fresh = ControlledRounding.Round(rows, columns);
        Assert.Equal(fresh.Counts.Cast<int>(), first);
    }

    [Fact]
    public void LargestSupportedSizeIsExact()
    {
        // 100 arms × 20 blocks × 5,000 plots, uneven totals, with minimums that force the
        // least-squares fallback in a corner of the table.
        int[] rows = Enumerable.Range(0, 100).Select(i => 30 + (i * 37) % 41).ToArray();
        int surplus = 5000 - rows.Sum();
        rows[0] += surplus;
        int[] columns = Enumerable.Range(0, 20).Select(j => 250).ToArray();
        var minimum = new int[100, 20];
        var maximum = new int[100, 20];
        for (int i = 0; i < 100; i++)
        {
            for (int j = 0; j < 20; j++)
            {
                maximum[i, j] = int.MaxValue;
            }
        }

        var plain = ControlledRounding.Round(rows, columns, minimum, maximum);
        Assert.Equal(RoundingMethod.NearestIntegers, plain.Method);
        AssertMargins(rows, columns, plain.Counts);

        minimum[5, 3] = 20;
        minimum[6, 3] = 20;
        var forced = ControlledRounding.Round(rows, columns, minimum, maximum);
        Assert.Equal(RoundingMethod.LeastSquares, forced.Method);
        AssertMargins(rows, columns, forced.Counts);
        Assert.True(forced.Counts[5, 3] >= 20 && forced.Counts[6, 3] >= 20);
    }

    [Fact]
    public void GrandTotalLimitIsACallerBug()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => ControlledRounding.Round([ControlledRounding.MaximumGrandTotal + 1], [ControlledRounding.MaximumGrandTotal + 1]));
    }

    internal static long CutCapacity(ControlledRoundingStatus cut, int[] columns, int[,] minimum, int[,] maximum)
    {
        long available = cut.Blocks.Sum(j => (long)columns[j]);
        for (int i = 0; i < minimum.GetLength(0); i++)
        {
            for (int j = 0; j < minimum.GetLength(1); j++)
            {
                bool inArms = cut.Arms.Contains(i);
                bool inBlocks = cut.Blocks.Contains(j);
                if (inArms && !inBlocks)
                {
                    available += maximum[i, j];
                }
                else if (!inArms && inBlocks)
                {
                    available -= minimum[i, j];
                }
            }
        }

        return available;
    }

    internal static void AssertMargins(int[] rows, int[] columns, int[,] counts)
    {
        for (int i = 0; i < rows.Length; i++)
        {
            Assert.Equal(rows[i], Enumerable.Range(0, columns.Length).Sum(j => counts[i, j]));
        }

        for (int j = 0; j < columns.Length; j++)
        {
            Assert.Equal(columns[j], Enumerable.Range(0, rows.Length).Sum(i => counts[i, j]));
        }
    }
}
