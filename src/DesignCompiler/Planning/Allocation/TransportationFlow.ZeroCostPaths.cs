namespace DesignCompiler.Planning.Allocation;

internal static partial class TransportationFlow
{
    /// <summary>
    /// After a Dijkstra, pushes units along residual paths whose arcs all have zero reduced cost
    /// (Dinic-style: breadth-first levels, then depth-first blocking flow with a current-arc
    /// pointer per node) until no such path is left or <paramref name="limit"/> units are sent.
    /// Returns the number of units sent. The shortest path Dijkstra just found is such a path,
    /// so at least one unit always moves.
    /// </summary>
    /// <remarks>
    /// One Dijkstra then serves many units, where plain successive shortest paths would run one
    /// per unit. Pushing along a zero-reduced-cost arc leaves its reverse at zero and, the cost
    /// being convex, its next unit at zero or more, so the potentials stay valid.
    /// Arcs are numbered per node. Source: k &lt; rows goes to arm k (an arm short of its
    /// total), then to block k − rows (a block over its plots). Arm i: k &lt; columns raises cell
    /// (i, k) into block k, then k = columns goes to the sink (an arm over its total). Block j:
    /// k = 0 goes to the sink (a block short of plots), k ≥ 1 lowers cell (k − 1, j) back into
    /// arm k − 1.
    /// </remarks>
    private static long PushAlongZeroCostPaths(ControlledRoundingWorkspace w, long grandTotal, long limit)
    {
        long sent = 0;
        while (sent < limit && BuildLevels(w, grandTotal))
        {
            w.CurrentArc.AsSpan(0, w.NodeCount).Clear();
            while (sent < limit && Advance(w, Source, grandTotal))
            {
                sent++;
            }
        }

        return sent;
    }

    /// <summary>Breadth-first levels over admissible arcs; false if the sink is not reached.</summary>
    private static bool BuildLevels(ControlledRoundingWorkspace w, long grandTotal)
    {
        int[] level = w.Level;
        int[] queue = w.Queue;
        level.AsSpan(0, w.NodeCount).Fill(-1);
        level[Source] = 0;
        int head = 0;
        int tail = 0;
        queue[tail++] = Source;
        while (head < tail)
        {
            int v = queue[head++];
            int arcs = ArcCount(w, v);
            for (int arc = 0; arc < arcs; arc++)
            {
                int to = Admissible(w, v, arc, grandTotal);
                if (to >= 0 && level[to] < 0)
                {
                    level[to] = level[v] + 1;
                    queue[tail++] = to;
                }
            }
        }

        return level[Sink(w)] >= 0;
    }

    /// <summary>One unit from <paramref name="v"/> to the sink along the level graph, if possible.</summary>
    private static bool Advance(ControlledRoundingWorkspace w, int v, long grandTotal)
    {
        if (v == Sink(w))
        {
            return true;
        }

        int arcs = ArcCount(w, v);
        for (; w.CurrentArc[v] < arcs; w.CurrentArc[v]++)
        {
            int arc = w.CurrentArc[v];
            int to = Admissible(w, v, arc, grandTotal);
            if (to >= 0 && w.Level[to] == w.Level[v] + 1 && Advance(w, to, grandTotal))
            {
                // Stay on this arc: it may carry the next unit too.
                Push(w, v, arc);
                return true;
            }
        }

        return false;
    }

    private static int ArcCount(ControlledRoundingWorkspace w, int v) =>
        v == Source ? w.Rows + w.Columns
        : v <= w.Rows ? w.Columns + 1
        : v == Sink(w) ? 0
        : w.Rows + 1;

    /// <summary>
    /// The head of arc <paramref name="arc"/> of node <paramref name="v"/> if it has residual
    /// capacity and zero reduced cost, otherwise −1.
    /// </summary>
    private static int Admissible(ControlledRoundingWorkspace w, int v, int arc, long grandTotal)
    {
        long[] potential = w.Potential;
        int rows = w.Rows;
        int columns = w.Columns;
        if (v == Source)
        {
            if (arc < rows)
            {
                int arm = Arm(arc);
                return w.RowSupply[arc] > 0 && potential[Source] == potential[arm] ? arm : -1;
            }

            int over = Block(w, arc - rows);
            return w.ColumnDemand[arc - rows] < 0 && potential[Source] == potential[over] ? over : -1;
        }

        if (v <= rows)
        {
            int row = v - 1;
            if (arc == columns)
            {
                int sink = Sink(w);
                return w.RowSupply[row] < 0 && potential[v] == potential[sink] ? sink : -1;
            }

            int cell = row * columns + arc;
            int block = Block(w, arc);
            return w.Flow[cell] < w.Upper[cell]
                && StepCost(w, cell, w.Flow[cell], grandTotal) + potential[v] - potential[block] == 0
                ? block : -1;
        }

        int column = v - 1 - rows;
        if (arc == 0)
        {
            int sink = Sink(w);
            return w.ColumnDemand[column] > 0 && potential[v] == potential[sink] ? sink : -1;
        }

        int backRow = arc - 1;
        int backCell = backRow * columns + column;
        return w.Flow[backCell] > w.Lower[backCell]
            && -StepCost(w, backCell, w.Flow[backCell] - 1, grandTotal) + potential[v] - potential[Arm(backRow)] == 0
            ? Arm(backRow) : -1;
    }

    /// <summary>
    /// Applies one unit on an arc. Source and sink arcs change nothing by themselves: the
    /// mismatches they stand for move with the cell changes along the same path.
    /// </summary>
    private static void Push(ControlledRoundingWorkspace w, int v, int arc)
    {
        int rows = w.Rows;
        if (v == Source)
        {
            return;
        }

        if (v <= rows)
        {
            if (arc < w.Columns)
            {
                MoveCell(w, v - 1, arc, +1);
            }

            return;
        }

        if (arc > 0)
        {
            MoveCell(w, arc - 1, v - 1 - rows, -1);
        }
    }
}
