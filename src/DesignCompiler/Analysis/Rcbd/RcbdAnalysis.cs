using DesignCompiler.Numerics;

namespace DesignCompiler.Analysis.Rcbd;

/// <summary>The analysis of variance of a randomized complete block table, with lost plots estimated if there are any.</summary>
/// <remarks>
/// Complete table (Gomez &amp; Gomez 1984, §2.2.3): replication SS t·Σ(ȳ_j − ȳ)², treatment SS b·Σ(ȳ_i − ȳ)², error SS
/// Σ(y − ȳ_i − ȳ_j + ȳ)², each formed from deviations rather than from "sum of squares minus correction factor", which
/// would cancel most of its digits for yields in kg/ha.
/// <para>With missing plots the error line is that of the completed table (the estimates leave no residual) with one df
/// fewer per estimate. The treatment line is adjusted for blocks: the completed table's treatment SS less its bias, by
/// Gomez &amp; Gomez's formula for one plot and, for several, as the error SS of a blocks-only fit to the recorded plots
/// minus the error SS (the same quantity, exact for any number). The replication line is blocks ignoring treatments,
/// from the recorded plots, so that the three lines add up to the recorded plots' total SS; that differs from the
/// replication SS of the completed table, which some hand methods print instead.</para>
/// </remarks>
public static class RcbdAnalysis
{
    internal const double ExactFit = 1e-24;

    public static AnalysisResult<RcbdAnova> Analyse(RcbdTable table)
    {
        ArgumentNullException.ThrowIfNull(table);
        int t = table.Treatments, b = table.Blocks, m = table.MissingCount;
        if (t < 2 || b < 2)
            return AnalysisResult<RcbdAnova>.Fail(AnalysisProblemKind.TableTooSmall,
                $"an analysis of variance needs at least two treatments and two blocks; the table has {t} × {b}",
                "record at least two treatments in each of at least two blocks");
        if (EmptyLine(table) is { } empty) return empty;
        if (!Connected(table))
            return AnalysisResult<RcbdAnova>.Fail(AnalysisProblemKind.Disconnected,
                "the recorded plots split into groups of treatments and blocks that share no plot, so treatments in different groups cannot be compared",
                "analyse each group on its own, or record the missing plots that link them");
        int errorDf = (t - 1) * (b - 1) - m;
        if (errorDf <= 0)
            return AnalysisResult<RcbdAnova>.Fail(AnalysisProblemKind.NoErrorDegreesOfFreedom,
                $"{m} of the {t * b} plots are missing, which leaves no degree of freedom to estimate error",
                "record more plots, or leave out the treatments or blocks with the most missing plots");
        if (MissingPlots.Complete(table) is not { } completion)
            return AnalysisResult<RcbdAnova>.Fail(AnalysisProblemKind.MissingPlotsDidNotSettle,
                $"the estimates of the {m} missing plots did not settle",
                "leave out the treatments or blocks with the most missing plots and analyse again");
        return AnalysisResult<RcbdAnova>.Ok(Lines(table, completion.Completed, completion.Sweeps, errorDf));
    }

    private static RcbdAnova Lines(RcbdTable table, double[,] cells, int sweeps, int errorDf)
    {
        int t = table.Treatments, b = table.Blocks, m = table.MissingCount;
        var rowMeans = new double[t];
        var columnMeans = new double[b];
        double grand = 0;
        for (int i = 0; i < t; i++)
            for (int j = 0; j < b; j++)
            {
                rowMeans[i] += cells[i, j] / b;
                columnMeans[j] += cells[i, j] / t;
                grand += cells[i, j];
            }
        grand /= t * b;

        double completedTreatment = 0, error = 0;
        for (int i = 0; i < t; i++) completedTreatment += b * (rowMeans[i] - grand) * (rowMeans[i] - grand);
        for (int i = 0; i < t; i++)
            for (int j = 0; j < b; j++)
            {
                double residual = cells[i, j] - rowMeans[i] - columnMeans[j] + grand;
                error += residual * residual;
            }

        var recorded = Recorded(table);
        // Residuals of data that fit exactly are rounding noise of order 1e-16·|y|; counted as error they would give a
        // meaningless astronomically large F. Anything this far below the data's own size is an exact fit.
        if (error <= ExactFit * recorded.Sum(p => p.Value * p.Value)) error = 0;
        double recordedMean = recorded.Average(p => p.Value);
        double total = recorded.Sum(p => (p.Value - recordedMean) * (p.Value - recordedMean));
        var blockMeans = new double[b];
        var blockCounts = new int[b];
        foreach (var p in recorded)
        {
            blockMeans[p.Block] += p.Value;
            blockCounts[p.Block]++;
        }
        for (int j = 0; j < b; j++) blockMeans[j] /= blockCounts[j];
        double replication = 0;
        for (int j = 0; j < b; j++) replication += blockCounts[j] * (blockMeans[j] - recordedMean) * (blockMeans[j] - recordedMean);

        double treatment;
        MissingPlotEstimates? missing = null;
        if (m == 0) treatment = completedTreatment;
        else
        {
            var plots = MissingCells(table).Select(c => new EstimatedPlot(c.Treatment, c.Block, cells[c.Treatment, c.Block])).ToArray();
            if (m == 1)
            {
                var only = plots[0];
                double blockTotal = recorded.Where(p => p.Block == only.Block).Sum(p => p.Value);
                treatment = completedTreatment - MissingPlots.SingleTreatmentBias(t, blockTotal, only.Value);
            }
            else
            {
                double blocksOnly = recorded.Sum(p => (p.Value - blockMeans[p.Block]) * (p.Value - blockMeans[p.Block]));
                treatment = blocksOnly - error;
            }
            missing = new MissingPlotEstimates(plots, completedTreatment - treatment, sweeps, Completed(cells));
        }

        double errorMs = error / errorDf;
        double treatmentMs = treatment / (t - 1);
        double replicationMs = replication / (b - 1);
        double? f = errorMs > 0 ? treatmentMs / errorMs : null;
        double? pValue = f is { } fv ? FisherF.UpperTail(t - 1, errorDf, fv) : null;

        double? re = null, reAdjusted = null;
        if (m == 0 && errorMs > 0)
        {
            re = ((b - 1) * replicationMs + b * (t - 1.0) * errorMs) / ((t * b - 1.0) * errorMs);
            double e = (b - 1.0) * (t - 1.0);
            double k = (e + 1) * (t * (b - 1.0) + 3) / ((e + 3) * (t * (b - 1.0) + 1));
            reAdjusted = re * k;
        }

        return new RcbdAnova(
            t, b,
            new AnovaLine(b - 1, replication, replicationMs, null, null),
            new AnovaLine(t - 1, treatment, treatmentMs, f, pValue),
            new AnovaLine(errorDf, error, errorMs, null, null),
            new AnovaLine(t * b - 1 - m, total, null, null, null),
            recordedMean,
            recordedMean != 0 ? 100 * Math.Sqrt(errorMs) / recordedMean : null,
            re, reAdjusted,
            rowMeans,
            missing);
    }

    private static List<(int Treatment, int Block, double Value)> Recorded(RcbdTable table)
    {
        var list = new List<(int, int, double)>();
        for (int i = 0; i < table.Treatments; i++)
            for (int j = 0; j < table.Blocks; j++)
                if (table[i, j] is { } v) list.Add((i, j, v));
        return list;
    }

    private static IEnumerable<(int Treatment, int Block)> MissingCells(RcbdTable table)
    {
        for (int i = 0; i < table.Treatments; i++)
            for (int j = 0; j < table.Blocks; j++)
                if (table[i, j] is null) yield return (i, j);
    }

    private static RcbdTable Completed(double[,] cells) => RcbdTable.Complete(cells);

    private static AnalysisResult<RcbdAnova>? EmptyLine(RcbdTable table)
    {
        for (int i = 0; i < table.Treatments; i++)
            if (Enumerable.Range(0, table.Blocks).All(j => table[i, j] is null))
                return AnalysisResult<RcbdAnova>.Fail(AnalysisProblemKind.EmptyTreatmentOrBlock,
                    $"treatment {i + 1} has no recorded plot, so its mean cannot be estimated",
                    "leave the treatment out of the analysis");
        for (int j = 0; j < table.Blocks; j++)
            if (Enumerable.Range(0, table.Treatments).All(i => table[i, j] is null))
                return AnalysisResult<RcbdAnova>.Fail(AnalysisProblemKind.EmptyTreatmentOrBlock,
                    $"block {j + 1} has no recorded plot",
                    "leave the block out of the analysis");
        return null;
    }

    // Treatments and blocks are the nodes, recorded plots the edges: every treatment contrast is estimable exactly
    // when this graph is connected.
    private static bool Connected(RcbdTable table)
    {
        int t = table.Treatments, b = table.Blocks;
        var parent = Enumerable.Range(0, t + b).ToArray();
        int Find(int x)
        {
            while (parent[x] != x) x = parent[x] = parent[parent[x]];
            return x;
        }
        for (int i = 0; i < t; i++)
            for (int j = 0; j < b; j++)
                if (table[i, j] is not null) parent[Find(i)] = Find(t + j);
        int root = Find(0);
        return Enumerable.Range(0, t + b).All(n => Find(n) == root);
    }
}
