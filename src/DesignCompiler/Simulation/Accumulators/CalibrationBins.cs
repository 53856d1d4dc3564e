namespace DesignCompiler.Simulation.Accumulators;

/// <summary>
/// Calibration of the final P(best): every (trial, arm) pair goes into one of ten bins of
/// width 0.1 by its P(best) after the last round, and each bin counts how often that arm truly
/// was best. When the true values come from the prior the model assumes, a bin's frequency
/// should match its mean P(best) (the idea behind simulation-based calibration, Talts et al.
/// 2018). Counts are integers and the P(best) sums exact, so bins merge exactly.
/// </summary>
public sealed class CalibrationBins
{
    public const int BinCount = 10;

    private readonly long[] _pairs = new long[BinCount];
    private readonly long[] _best = new long[BinCount];
    private readonly ExactSum[] _probability = Enumerable.Range(0, BinCount).Select(_ => new ExactSum()).ToArray();

    public long Pairs(int bin) => _pairs[bin];
    public long TrulyBest(int bin) => _best[bin];
    public ExactSum ProbabilitySum(int bin) => _probability[bin];

    /// <summary>P = 1 goes into the last bin, so the bins are [0, 0.1), …, [0.9, 1].</summary>
    public static int BinOf(double probability) => Math.Clamp((int)Math.Floor(probability * BinCount), 0, BinCount - 1);

    public void Add(double probability, bool trulyBest)
    {
        var bin = BinOf(probability);
        _pairs[bin]++;
        if (trulyBest) _best[bin]++;
        _probability[bin].Add(probability);
    }

    public void Add(CalibrationBins other)
    {
        for (var b = 0; b < BinCount; b++)
        {
            _pairs[b] += other._pairs[b];
            _best[b] += other._best[b];
            _probability[b].Add(other._probability[b]);
        }
    }

    internal void Set(int bin, long pairs, long best, System.Numerics.BigInteger probabilityUnits)
    {
        _pairs[bin] = pairs;
        _best[bin] = best;
        _probability[bin].SetUnits(probabilityUnits);
    }
}
