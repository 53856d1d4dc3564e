using DesignCompiler.Analysis;
using DesignCompiler.Analysis.Rcbd;

namespace DesignCompiler.Tests.Analysis;

/// <summary>Published tables the analysis tests share.</summary>
internal static class AnalysisData
{
    /// <summary>
    /// Gomez &amp; Gomez (1984), <i>Statistical Procedures for Agricultural Research</i>, 2nd ed., Table 2.5: rice grain yield
    /// (kg/ha) at six seeding rates (25…150 kg/ha, rows) in four replications (columns). Typed from memory (REFERENCES.md §10),
    /// but they reproduce every figure of the book's Table 2.6.
    /// </summary>
    public static readonly double[,] GomezYields =
    {
        { 5113, 5398, 5307, 4678 },
        { 5346, 5952, 4719, 4264 },
        { 5272, 5713, 5483, 4749 },
        { 5164, 4831, 4986, 4410 },
        { 4804, 4848, 4432, 4748 },
        { 5254, 4542, 4919, 4098 },
    };

    /// <summary>
    /// The missing-plot worked example of the University of Florida on-farm research manual
    /// (ufdcimages.uflib.ufl.edu/UF/00/08/05/57/00001/00036.txt): treatments D, E, F (rows) in blocks I, II, III (columns),
    /// D in block III lost. Read from the manual's text (block II: 26, 27, 35; block III: —, 33, 45; treatment totals 56, 95, 123;
    /// block totals 108, 88, 78), block I following from those totals. It reproduces the manual's ANOVA of the completed table.
    /// </summary>
    public static readonly double?[,] FloridaMissingPlot =
    {
        { 30, 26, null },
        { 35, 27, 33 },
        { 43, 35, 45 },
    };

    /// <summary>The table's plots as records: treatment = arm, replication = block, all in one round.</summary>
    public static List<PlotRecord> Records(double?[,] table, int round = 1)
    {
        var records = new List<PlotRecord>();
        for (int i = 0; i < table.GetLength(0); i++)
            for (int j = 0; j < table.GetLength(1); j++)
                if (table[i, j] is { } v) records.Add(new PlotRecord(i, j, round, v));
        return records;
    }

    public static List<PlotRecord> Records(double[,] table) => Records(RcbdTable.Complete(table));

    private static List<PlotRecord> Records(RcbdTable table)
    {
        var copy = new double?[table.Treatments, table.Blocks];
        for (int i = 0; i < table.Treatments; i++)
            for (int j = 0; j < table.Blocks; j++) copy[i, j] = table[i, j];
        return Records(copy);
    }
}
