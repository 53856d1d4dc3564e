namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// Reusable buffers for <see cref="ControlledRounding"/>, so that a simulation calling it
/// millions of times allocates nothing after the first call. Not thread-safe: keep one per
/// thread. The buffers grow to the largest table seen and are never shrunk.
/// </summary>
public sealed class ControlledRoundingWorkspace
{
    internal int Rows { get; private set; }

    internal int Columns { get; private set; }

    internal int NodeCount => Rows + Columns + 2;

    // Per cell, row-major: the bounds of the current step, the current value, and R_i·C_j.
    internal int[] Lower = [];
    internal int[] Upper = [];
    internal int[] Flow = [];
    internal long[] Target = [];

    // Per row: its total minus its current sum (positive: short; negative: over).
    internal int[] RowSupply = [];

    // Per column: its total minus its current sum (positive: short; negative: over).
    internal int[] ColumnDemand = [];

    // Per node of the flow network (source, arms, blocks, sink).
    internal long[] Potential = [];
    internal long[] Distance = [];
    internal bool[] Settled = [];
    internal int[] Level = [];
    internal int[] CurrentArc = [];
    internal int[] Queue = [];

    // Binary heap of tentative distances, with stale entries skipped on pop.
    internal long[] HeapKeys = [];
    internal int[] HeapNodes = [];

    internal void Prepare(int rows, int columns)
    {
        Rows = rows;
        Columns = columns;
        int cells = rows * columns;
        int nodes = rows + columns + 2;
        int heap = 2 * cells + rows + columns + 2;
        Grow(ref Lower, cells);
        Grow(ref Upper, cells);
        Grow(ref Flow, cells);
        Grow(ref Target, cells);
        Grow(ref RowSupply, rows);
        Grow(ref ColumnDemand, columns);
        Grow(ref Potential, nodes);
        Grow(ref Distance, nodes);
        Grow(ref Settled, nodes);
        Grow(ref Level, nodes);
        Grow(ref CurrentArc, nodes);
        Grow(ref Queue, nodes);
        Grow(ref HeapKeys, heap);
        Grow(ref HeapNodes, heap);
    }

    private static void Grow<T>(ref T[] buffer, int length)
    {
        if (buffer.Length < length)
        {
            buffer = new T[length];
        }
    }
}
