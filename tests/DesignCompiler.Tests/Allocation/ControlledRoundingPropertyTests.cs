using DesignCompiler.Planning.Allocation;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DesignCompiler.Tests.Allocation;

/// <summary>Random tables: margins exact, bounds respected, optimal against brute force.</summary>
public class ControlledRoundingPropertyTests
{
    /// <summary>Row totals and column totals with the same sum (the plots of one round).</summary>
    private static Gen<(int[] Rows, int[] Columns)> Margins(int maxRows, int maxColumns, int maxTotal) =>
        from rows in Gen.Choose(1, maxRows)
        from columns in Gen.Choose(1, maxColumns)
        from rowTotals in Gen.ArrayOf(Gen.Choose(0, maxTotal), rows)
        from cuts in Gen.ArrayOf(Gen.Choose(0, rowTotals.Sum()), columns - 1)
        select (rowTotals, Split(rowTotals.Sum(), cuts));

    private static int[] Split(int total, int[] cuts)
    {
        var points = cuts.Append(0).Append(total).OrderBy(x => x).ToArray();
        return points.Zip(points.Skip(1), (a, b) => b - a).ToArray();
    }

    [Property(MaxTest = 500)]
    public Property WithoutBoundsEveryCellIsFloorOrCeiling() =>
        Prop.ForAll(Arb.From(Margins(12, 8, 60)), margins =>
        {
            var (rows, columns) = margins;
            var result = ControlledRounding.Round(rows, columns);
            if (!result.IsFeasible || result.Method != RoundingMethod.NearestIntegers)
            {
                return false;
            }

            long grand = rows.Sum();
            for (int i = 0; i < rows.Length; i++)
            {
                for (int j = 0; j < columns.Length; j++)
                {
                    double p = grand == 0 ? 0 : (double)rows[i] * columns[j] / grand;
                    if (Math.Abs(result.Counts[i, j] - p) >= 1)
                    {
                        return false;
                    }
                }
            }

            return MarginsHold(rows, columns, result.Counts);
        });

    [Property(MaxTest = 300)]
    public Property WithBoundsMarginsAndBoundsAlwaysHold() =>
        Prop.ForAll(Arb.From(BoundedTables(10, 6, 40)), table =>
        {
            var result = ControlledRounding.Round(table.Rows, table.Columns, table.Minimum, table.Maximum);
            if (!result.IsFeasible)
            {
                return result.Counts.Length == 0 && result.Failure != ControlledRoundingFailure.None;
            }

            for (int i = 0; i < table.Rows.Length; i++)
            {
                for (int j = 0; j < table.Columns.Length; j++)
                {
                    if (result.Counts[i, j] < table.Minimum[i, j] || result.Counts[i, j] > table.Maximum[i, j])
                    {
                        return false;
                    }
                }
            }

            return MarginsHold(table.Rows, table.Columns, result.Counts);
        });

    [Property(MaxTest = 400)]
    public Property TinyTablesAreOptimalAndInfeasibilityIsReal() =>
        Prop.ForAll(Arb.From(BoundedTables(3, 3, 5)), table =>
        {
            var result = ControlledRounding.Round(table.Rows, table.Columns, table.Minimum, table.Maximum);
            var best = BruteForceTable.Solve(table.Rows, table.Columns, table.Minimum, table.Maximum);
            if (best.BestOverall is null)
            {
                // Whatever the library reports must be a genuine reason, never a table.
                if (result.IsFeasible)
                {
                    return false;
                }

                return result.Failure != ControlledRoundingFailure.FlowCut || result.Status.Required > result.Status.Available;
            }

            if (!result.IsFeasible)
            {
                return false;
            }

            long cost = BruteForceTable.Cost(table.Rows, table.Columns, result.Counts);
            return best.BestNearest is not null
                ? result.Method == RoundingMethod.NearestIntegers && cost == best.BestNearest
                : result.Method == RoundingMethod.LeastSquares && cost == best.BestOverall;
        });

    [Property(MaxTest = 300)]
    public Property ReportedCutsAreCertificates() =>
        Prop.ForAll(Arb.From(BoundedTables(5, 5, 8)), table =>
        {
            var result = ControlledRounding.Round(table.Rows, table.Columns, table.Minimum, table.Maximum);
            if (result.Failure != ControlledRoundingFailure.FlowCut)
            {
                return true;
            }

            ControlledRoundingStatus cut = result.Status;
            return cut.Required == cut.Arms.Sum(i => (long)table.Rows[i])
                && cut.Available == ControlledRoundingTests.CutCapacity(cut, table.Columns, table.Minimum, table.Maximum)
                && cut.Required > cut.Available;
        });

    private static Gen<BoundedTable> BoundedTables(int maxRows, int maxColumns, int maxTotal) =>
        from margins in Margins(maxRows, maxColumns, maxTotal)
        let cells = margins.Rows.Length * margins.Columns.Length
        from low in Gen.ArrayOf(Gen.Frequency((4, Gen.Constant(0)), (1, Gen.Choose(0, 4))), cells)
        from room in Gen.ArrayOf(Gen.Frequency((1, Gen.Choose(0, 2)), (2, Gen.Choose(0, 12)), (1, Gen.Constant(1000))), cells)
        select BoundedTable.From(margins.Rows, margins.Columns, low, room);

    private static bool MarginsHold(int[] rows, int[] columns, int[,] counts)
    {
        for (int i = 0; i < rows.Length; i++)
        {
            if (Enumerable.Range(0, columns.Length).Sum(j => counts[i, j]) != rows[i])
            {
                return false;
            }
        }

        for (int j = 0; j < columns.Length; j++)
        {
            if (Enumerable.Range(0, rows.Length).Sum(i => counts[i, j]) != columns[j])
            {
                return false;
            }
        }

        return true;
    }
}

/// <summary>A bounded table problem; printed in full when a property fails.</summary>
internal sealed record BoundedTable(int[] Rows, int[] Columns, int[,] Minimum, int[,] Maximum)
{
    public static BoundedTable From(int[] rows, int[] columns, int[] low, int[] room)
    {
        var minimum = new int[rows.Length, columns.Length];
        var maximum = new int[rows.Length, columns.Length];
        for (int i = 0; i < rows.Length; i++)
        {
            for (int j = 0; j < columns.Length; j++)
            {
                minimum[i, j] = low[i * columns.Length + j];
                maximum[i, j] = minimum[i, j] + room[i * columns.Length + j];
            }
        }

        return new BoundedTable(rows, columns, minimum, maximum);
    }

    public override string ToString()
    {
        static string Grid(int[,] g) => string.Join(" / ", Enumerable.Range(0, g.GetLength(0)).Select(i => string.Join(",", Enumerable.Range(0, g.GetLength(1)).Select(j => g[i, j]))));
        return $"rows [{string.Join(",", Rows)}] columns [{string.Join(",", Columns)}] min {Grid(Minimum)} max {Grid(Maximum)}";
    }
}
