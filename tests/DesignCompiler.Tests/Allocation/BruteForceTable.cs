namespace DesignCompiler.Tests.Allocation;

/// <summary>
/// Enumerates every integer table with the given margins and cell bounds (tiny tables only) and
/// reports the least Σ (x − p)², both over all tables and over floor/ceiling tables. Costs are
/// kept exact as Σ (x·G − R_i·C_j)², i.e. scaled by G².
/// </summary>
internal static class BruteForceTable
{
    public sealed record Optimum(long? BestNearest, long? BestOverall);

    public static Optimum Solve(int[] rows, int[] columns, int[,] minimum, int[,] maximum)
    {
        int r = rows.Length;
        int c = columns.Length;
        long grand = rows.Sum();
        var table = new int[r, c];
        var rowLeft = (int[])rows.Clone();
        var columnLeft = (int[])columns.Clone();
        long? bestNearest = null;
        long? bestOverall = null;

        void Visit(int cell, long cost, bool nearest)
        {
            if (cell == r * c)
            {
                if (rowLeft.All(x => x == 0) && columnLeft.All(x => x == 0))
                {
                    bestOverall = bestOverall is null ? cost : Math.Min(bestOverall.Value, cost);
                    if (nearest)
                    {
                        bestNearest = bestNearest is null ? cost : Math.Min(bestNearest.Value, cost);
                    }
                }

                return;
            }

            int i = cell / c;
            int j = cell % c;
            int high = Math.Min(maximum[i, j], Math.Min(rowLeft[i], columnLeft[j]));
            for (int x = minimum[i, j]; x <= high; x++)
            {
                long target = (long)rows[i] * columns[j];
                long deviation = x * grand - target;
                bool isNearest = grand == 0 || (x == target / grand || x == (target + grand - 1) / grand);
                table[i, j] = x;
                rowLeft[i] -= x;
                columnLeft[j] -= x;
                Visit(cell + 1, cost + deviation * deviation, nearest && isNearest);
                rowLeft[i] += x;
                columnLeft[j] += x;
            }
        }

        Visit(0, 0, true);
        return new Optimum(bestNearest, bestOverall);
    }

    public static long Cost(int[] rows, int[] columns, int[,] table)
    {
        long grand = rows.Sum();
        long cost = 0;
        for (int i = 0; i < rows.Length; i++)
        {
            for (int j = 0; j < columns.Length; j++)
            {
                long deviation = table[i, j] * grand - (long)rows[i] * columns[j];
                cost += deviation * deviation;
            }
        }

        return cost;
    }
}
