using System.Diagnostics;

namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// Minimum-cost flow for the arms × blocks table with convex cell costs, by the primal-dual
/// method from a cell-wise optimal start: every cell starts at its own best value, and only the
/// resulting row and column mismatches are routed, along shortest paths of reduced cost.
/// </summary>
/// <remarks>
/// Network: each cell (i, j) is an arc arm i → block j that raises x_ij by one (up to its upper
/// bound) and a reverse arc block j → arm i that lowers it (down to its lower bound). The unit
/// from x to x + 1 costs (x + 1 − p)² − (x − p)² = 2(x − p) + 1, which rises with x, so the
/// cost is convex and separable. Costs are multiplied by the grand total G to be integers,
/// 2(x·G − R_i·C_j) + G, so every comparison is exact and platform-independent.
/// <para>
/// Start: x_ij = p_ij rounded (half down) and clamped to the cell's bounds. At that point no
/// single-cell move lowers the cost, so every residual arc costs at least 0 and zero node
/// potentials are valid. An arm with fewer plots than its total, or a block with more, holds
/// an excess (an arc from the source); an arm with too many, or a block with too few, holds a
/// deficit (an arc to the sink). Each shortest source–sink path moves one unit of excess to a
/// deficit, and because every push uses arcs of zero reduced cost, the table stays the cheapest
/// one with its current mismatches (successive shortest paths for pseudoflows; Ahuja, Magnanti
/// and Orlin, <i>Network Flows</i>, 1993, ch. 9 and 14). The number of paths is the total
/// mismatch of the start, usually far below the number of plots.
/// </para>
/// <para>
/// After each Dijkstra as many units as possible are pushed along zero-reduced-cost paths
/// (see <c>TransportationFlow.ZeroCostPaths.cs</c>) before the next one.
/// </para>
/// <para>
/// Deterministic tie-breaking: Dijkstra settles equal distances in node order (source, arms by
/// index, blocks by index, sink); the zero-cost paths are searched in index order, arms before
/// blocks, and a block tries the sink before sending a unit back through an arm, so lower
/// indices are served first.
/// </para>
/// </remarks>
internal static partial class TransportationFlow
{
    private const int Source = 0;

    /// <summary>
    /// Routes every excess to a deficit. Returns false if that is impossible; the workspace's
    /// <c>Settled</c> flags then mark the nodes reachable from the source (a minimum cut).
    /// Expects <c>Flow</c> at the cell-wise optimal start and <c>RowSupply</c> /
    /// <c>ColumnDemand</c> equal to the totals minus the current row and column sums.
    /// </summary>
    public static bool Route(ControlledRoundingWorkspace w, long grandTotal)
    {
        w.Potential.AsSpan(0, w.NodeCount).Clear();
        long units = 0;
        for (int i = 0; i < w.Rows; i++)
        {
            units += Math.Max(0, w.RowSupply[i]);
        }

        for (int j = 0; j < w.Columns; j++)
        {
            units += Math.Max(0, -w.ColumnDemand[j]);
        }

        while (units > 0)
        {
            if (!ShortestPath(w, grandTotal))
            {
                return false;
            }

            units -= PushAlongZeroCostPaths(w, grandTotal, units);
        }

        return true;
    }

    internal static int Arm(int row) => 1 + row;

    internal static int Block(ControlledRoundingWorkspace w, int column) => 1 + w.Rows + column;

    internal static int Sink(ControlledRoundingWorkspace w) => w.Rows + w.Columns + 1;

    /// <summary>The scaled cost of raising a cell from <paramref name="value"/> to value + 1.</summary>
    internal static long StepCost(ControlledRoundingWorkspace w, int cell, long value, long grandTotal) =>
        2 * (value * grandTotal - w.Target[cell]) + grandTotal;

    /// <summary>Raises or lowers one cell by one plot, keeping the row and column mismatches in step.</summary>
    internal static void MoveCell(ControlledRoundingWorkspace w, int row, int column, int step)
    {
        w.Flow[row * w.Columns + column] += step;
        w.RowSupply[row] -= step;
        w.ColumnDemand[column] -= step;
    }

    private static bool ShortestPath(ControlledRoundingWorkspace w, long grandTotal)
    {
        int rows = w.Rows;
        int columns = w.Columns;
        int sink = Sink(w);
        long[] distance = w.Distance;
        long[] potential = w.Potential;
        bool[] settled = w.Settled;
        for (int v = 0; v < w.NodeCount; v++)
        {
            distance[v] = long.MaxValue;
            settled[v] = false;
        }

        var heap = new NodeHeap(w.HeapKeys, w.HeapNodes);
        distance[Source] = 0;
        heap.Push(0, Source);
        while (heap.TryPop(out long d, out int v))
        {
            if (settled[v] || d != distance[v])
            {
                continue;
            }

            settled[v] = true;
            if (v == sink)
            {
                break;
            }

            if (v == Source)
            {
                for (int i = 0; i < rows; i++)
                {
                    if (w.RowSupply[i] > 0)
                    {
                        Relax(w, ref heap, v, Arm(i), d, 0);
                    }
                }

                for (int j = 0; j < columns; j++)
                {
                    if (w.ColumnDemand[j] < 0)
                    {
                        Relax(w, ref heap, v, Block(w, j), d, 0);
                    }
                }
            }
            else if (v <= rows)
            {
                int i = v - 1;
                int rowStart = i * columns;
                for (int j = 0; j < columns; j++)
                {
                    int cell = rowStart + j;
                    if (w.Flow[cell] < w.Upper[cell])
                    {
                        Relax(w, ref heap, v, Block(w, j), d, StepCost(w, cell, w.Flow[cell], grandTotal));
                    }
                }

                if (w.RowSupply[i] < 0)
                {
                    Relax(w, ref heap, v, sink, d, 0);
                }
            }
            else
            {
                int j = v - 1 - rows;
                if (w.ColumnDemand[j] > 0)
                {
                    Relax(w, ref heap, v, sink, d, 0);
                }

                for (int i = 0; i < rows; i++)
                {
                    int cell = i * columns + j;
                    if (w.Flow[cell] > w.Lower[cell])
                    {
                        Relax(w, ref heap, v, Arm(i), d, -StepCost(w, cell, w.Flow[cell] - 1, grandTotal));
                    }
                }
            }
        }

        if (!settled[sink])
        {
            return false;
        }

        // Johnson-style update that stays valid when Dijkstra stopped at the sink: nodes not
        // settled by then are treated as lying at the sink's distance.
        long sinkDistance = distance[sink];
        for (int v = 0; v < w.NodeCount; v++)
        {
            potential[v] += settled[v] ? distance[v] : sinkDistance;
        }

        return true;
    }

    private static void Relax(ControlledRoundingWorkspace w, ref NodeHeap heap, int from, int to, long fromDistance, long cost)
    {
        if (w.Settled[to])
        {
            return;
        }

        long reduced = cost + w.Potential[from] - w.Potential[to];
        Debug.Assert(reduced >= 0, "Reduced costs stay non-negative under valid potentials.");
        long candidate = fromDistance + reduced;
        if (candidate < w.Distance[to])
        {
            w.Distance[to] = candidate;
            heap.Push(candidate, to);
        }
    }
}
