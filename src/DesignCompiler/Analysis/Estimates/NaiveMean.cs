using DesignCompiler.Numerics;

namespace DesignCompiler.Analysis.Estimates;

/// <summary>
/// The plain mean of an arm's plots with the textbook t interval ȳ ± t(1 − α/2; n − 1)·s/√n. Under adaptive allocation
/// it is biased: an arm that does badly early by chance gets fewer later plots to correct it.
/// </summary>
public static class NaiveMean
{
    /// <summary>The mean alone, or null when the arm has no plot (cheap enough for a simulation loop).</summary>
    public static double? Mean(IReadOnlyList<PlotRecord> records, int arm)
    {
        ArgumentNullException.ThrowIfNull(records);
        double sum = 0;
        int n = 0;
        foreach (var record in records)
            if (record.Arm == arm)
            {
                sum += record.Value;
                n++;
            }
        return n == 0 ? null : sum / n;
    }

    public static ArmEstimate Estimate(IReadOnlyList<PlotRecord> records, int arm, double level = 0.95)
    {
        ArgumentNullException.ThrowIfNull(records);
        Level.Check(level);
        var values = records.Where(r => r.Arm == arm).Select(r => r.Value).ToArray();
        int n = values.Length;
        if (n == 0) return new ArmEstimate(arm, 0, EstimateStatus.NoData, null, null, null, null);
        double mean = values.Average();
        if (n == 1) return new ArmEstimate(arm, 1, EstimateStatus.MeanOnly, mean, null, null, null);
        double squares = values.Sum(v => (v - mean) * (v - mean));
        double standardError = Math.Sqrt(squares / (n - 1) / n);
        double half = StudentT.Quantile(n - 1, Level.UpperProbability(level)) * standardError;
        return new ArmEstimate(arm, n, EstimateStatus.Estimated, mean, mean - half, mean + half, n - 1);
    }
}
