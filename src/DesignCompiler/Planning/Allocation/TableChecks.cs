namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// The infeasibility reports of <see cref="ControlledRounding"/>: cheap checks of single rows,
/// columns and cells first, so the common mistakes get a precise message, and the minimum cut
/// left by a failed flow for everything else.
/// </summary>
internal static class TableChecks
{
    public static ControlledRoundingStatus Check(
        ReadOnlySpan<int> rowTotals,
        ReadOnlySpan<int> columnTotals,
        ReadOnlySpan<int> cellMinimum,
        ReadOnlySpan<int> cellMaximum,
        out long grandTotal)
    {
        int rows = rowTotals.Length;
        int columns = columnTotals.Length;
        grandTotal = 0;
        long columnSum = 0;
        for (int i = 0; i < rows; i++)
        {
            if (rowTotals[i] < 0)
            {
                return ControlledRoundingStatus.ForArm(ControlledRoundingFailure.NegativeRowTotal, i, rowTotals[i], 0);
            }

            grandTotal += rowTotals[i];
        }

        for (int j = 0; j < columns; j++)
        {
            if (columnTotals[j] < 0)
            {
                return ControlledRoundingStatus.ForBlock(ControlledRoundingFailure.NegativeColumnTotal, j, columnTotals[j], 0);
            }

            columnSum += columnTotals[j];
        }

        if (grandTotal != columnSum)
        {
            return new ControlledRoundingStatus(ControlledRoundingFailure.TotalsDisagree, RoundingMethod.None, -1, -1, grandTotal, columnSum);
        }

        for (int i = 0; i < rows; i++)
        {
            for (int j = 0; j < columns; j++)
            {
                int cell = i * columns + j;
                if (cellMinimum[cell] < 0)
                {
                    return new ControlledRoundingStatus(ControlledRoundingFailure.NegativeCellMinimum, RoundingMethod.None, i, j, cellMinimum[cell], 0);
                }

                if (cellMinimum[cell] > cellMaximum[cell])
                {
                    return new ControlledRoundingStatus(ControlledRoundingFailure.CellMinimumExceedsMaximum, RoundingMethod.None, i, j, cellMinimum[cell], cellMaximum[cell]);
                }
            }
        }

        for (int i = 0; i < rows; i++)
        {
            long minimumSum = 0;
            long maximumSum = 0;
            for (int j = 0; j < columns; j++)
            {
                minimumSum += cellMinimum[i * columns + j];
                maximumSum += cellMaximum[i * columns + j];
            }

            if (minimumSum > rowTotals[i])
            {
                return ControlledRoundingStatus.ForArm(ControlledRoundingFailure.RowMinimumsExceedTotal, i, minimumSum, rowTotals[i]);
            }

            if (maximumSum < rowTotals[i])
            {
                return ControlledRoundingStatus.ForArm(ControlledRoundingFailure.RowMaximumsBelowTotal, i, rowTotals[i], maximumSum);
            }
        }

        for (int j = 0; j < columns; j++)
        {
            long minimumSum = 0;
            long maximumSum = 0;
            for (int i = 0; i < rows; i++)
            {
                minimumSum += cellMinimum[i * columns + j];
                maximumSum += cellMaximum[i * columns + j];
            }

            if (minimumSum > columnTotals[j])
            {
                return ControlledRoundingStatus.ForBlock(ControlledRoundingFailure.ColumnMinimumsExceedTotal, j, minimumSum, columnTotals[j]);
            }

            if (maximumSum < columnTotals[j])
            {
                return ControlledRoundingStatus.ForBlock(ControlledRoundingFailure.ColumnMaximumsBelowTotal, j, columnTotals[j], maximumSum);
            }
        }

        return ControlledRoundingStatus.Solved(RoundingMethod.None);
    }

    /// <summary>
    /// Reads the cut left by a failed flow with bounds [min, max]. With A the arms and B the
    /// blocks still reachable from the source, every cell from A to a block outside B is at its
    /// maximum, every block in B is full, and every cell from an arm outside A into B is at its
    /// minimum; so A can place at most Σ_{A×B̄} max + Σ_B C_j − Σ_{Ā×B} min plots, fewer than
    /// Σ_A R_i. Any table meeting the bounds would have to satisfy the opposite inequality, so
    /// this is a certificate of infeasibility, not just a symptom.
    /// </summary>
    public static ControlledRoundingStatus DescribeCut(
        ControlledRoundingWorkspace w,
        ReadOnlySpan<int> rowTotals,
        ReadOnlySpan<int> columnTotals,
        ReadOnlySpan<int> cellMinimum,
        ReadOnlySpan<int> cellMaximum)
    {
        int rows = w.Rows;
        int columns = w.Columns;
        int armCount = 0;
        int blockCount = 0;
        for (int i = 0; i < rows; i++)
        {
            armCount += w.Settled[1 + i] ? 1 : 0;
        }

        for (int j = 0; j < columns; j++)
        {
            blockCount += w.Settled[1 + rows + j] ? 1 : 0;
        }

        var arms = new int[armCount];
        var blocks = new int[blockCount];
        armCount = 0;
        blockCount = 0;
        for (int i = 0; i < rows; i++)
        {
            if (w.Settled[1 + i])
            {
                arms[armCount++] = i;
            }
        }

        for (int j = 0; j < columns; j++)
        {
            if (w.Settled[1 + rows + j])
            {
                blocks[blockCount++] = j;
            }
        }

        long required = 0;
        long available = 0;
        for (int i = 0; i < rows; i++)
        {
            bool inArms = w.Settled[1 + i];
            if (inArms)
            {
                required += rowTotals[i];
            }

            for (int j = 0; j < columns; j++)
            {
                bool inBlocks = w.Settled[1 + rows + j];
                if (inArms && !inBlocks)
                {
                    available += cellMaximum[i * columns + j];
                }
                else if (!inArms && inBlocks)
                {
                    available -= cellMinimum[i * columns + j];
                }
            }
        }

        foreach (int j in blocks)
        {
            available += columnTotals[j];
        }

        return new ControlledRoundingStatus(ControlledRoundingFailure.FlowCut, RoundingMethod.None, -1, -1, required, available, arms, blocks);
    }
}
