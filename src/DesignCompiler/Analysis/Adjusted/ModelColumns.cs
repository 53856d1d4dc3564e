namespace DesignCompiler.Analysis.Adjusted;

/// <summary>Which column of the design matrix is which coefficient, and the deviation coding that fills it.</summary>
public sealed class ModelColumns
{
    private readonly int[] blocks;
    private readonly int[] rounds;

    internal ModelColumns(int arms, int[] blocks, int[] rounds)
    {
        Arms = arms;
        this.blocks = blocks;
        this.rounds = rounds;
    }

    public int Arms { get; }

    /// <summary>The block labels the model adjusts for, ascending (empty when it does not adjust for blocks).</summary>
    public IReadOnlyList<int> Blocks => blocks;

    /// <summary>The round labels the model adjusts for, ascending.</summary>
    public IReadOnlyList<int> Rounds => rounds;

    public int FirstBlockColumn => Arms;

    public int FirstRoundColumn => Arms + FreeEffects(blocks.Length);

    public int Count => FirstRoundColumn + FreeEffects(rounds.Length);

    internal double[,] DesignMatrix(IReadOnlyList<PlotRecord> records)
    {
        var x = new double[records.Count, Count];
        for (int r = 0; r < records.Count; r++)
        {
            x[r, records[r].Arm] = 1;
            Code(x, r, FirstBlockColumn, blocks, records[r].Block);
            Code(x, r, FirstRoundColumn, rounds, records[r].Round);
        }
        return x;
    }

    /// <summary>The effect of one level as a combination of the free columns: itself, or minus all of them for the last level.</summary>
    internal IEnumerable<(int Column, double Weight)> EffectOf(bool block, int label)
    {
        var levels = block ? blocks : rounds;
        int first = block ? FirstBlockColumn : FirstRoundColumn;
        int level = Array.BinarySearch(levels, label);
        if (level < 0) yield break;
        if (level < levels.Length - 1) yield return (first + level, 1);
        else
            for (int i = 0; i < levels.Length - 1; i++) yield return (first + i, -1);
    }

    internal bool HasLevel(bool block, int label) => Array.BinarySearch(block ? blocks : rounds, label) >= 0;

    private static int FreeEffects(int levels) => Math.Max(0, levels - 1);

    private static void Code(double[,] x, int row, int first, int[] levels, int label)
    {
        if (levels.Length < 2) return;
        int level = Array.BinarySearch(levels, label);
        if (level < levels.Length - 1) x[row, first + level] = 1;
        else
            for (int i = 0; i < levels.Length - 1; i++) x[row, first + i] = -1;
    }
}
