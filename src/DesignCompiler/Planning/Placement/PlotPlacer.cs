using DesignCompiler.Binding;
using DesignCompiler.Randomness;

namespace DesignCompiler.Planning.Placement;

/// <summary>
/// Puts each block's arms on its plots at random, reproducibly. For round r and block j
/// (zero-based index in design order) the block's arm list is written in design order, each
/// arm repeated by its count, then shuffled by Fisher–Yates (Knuth, TAOCP vol. 2, Algorithm P)
/// driven by xoshiro256** seeded with StreamSeed.Derive(seed, 1, r, j); position k of the
/// shuffled list is plot k (row-major in the layout). Anyone with the seed can redo it.
/// </summary>
public static class PlotPlacer
{
    public static IReadOnlyList<PlotAssignment> Place(CheckedDesign design, int round, int[,] counts)
    {
        var result = new List<PlotAssignment>(design.PlotsPerRound);
        foreach (var block in design.Blocks)
        {
            var arms = new int[block.Plots];
            var k = 0;
            for (var i = 0; i < design.Arms.Count; i++)
                for (var c = 0; c < counts[i, block.Index]; c++) arms[k++] = i;

            var rng = new Xoshiro256StarStar(StreamSeed.Derive(design.Seed, StreamPurpose.Placement, (ulong)round, (ulong)block.Index));
            Shuffle.FisherYates<int>(arms, ref rng);

            for (var plot = 0; plot < block.Plots; plot++)
                result.Add(new PlotAssignment(block.Name, block.Index, plot, block.PlotId(plot), block.RowOf(plot), block.ColumnOf(plot),
                    arms[plot], design.Arms[arms[plot]].Code));
        }
        return result;
    }
}
