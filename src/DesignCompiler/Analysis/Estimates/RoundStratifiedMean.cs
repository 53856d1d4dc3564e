using DesignCompiler.Numerics;

namespace DesignCompiler.Analysis.Estimates;

/// <summary>
/// An arm's mean as a fixed-weight average of its per-round means: μ̂ = Σ_r w_r·ȳ_r / Σ_r w_r over the rounds R in which
/// the arm has plots, with the weights w_r fixed by the design (for instance the planned plots per round), not by how
/// many plots the arm happened to get.
/// </summary>
/// <remarks>
/// Why: within a round the arm's plots are fresh draws whatever the earlier rounds decided, so each ȳ_r is
/// conditionally unbiased; with weights that do not depend on the outcomes the average is unbiased too, whereas the
/// naive mean weights each round by the arm's plot count, which the adaptive rule chose from the outcomes. When an arm
/// misses rounds the weights are renormalised over the rounds it has, which is unbiased given that set of rounds.
/// <para>Interval: the arm's plot variance is pooled within rounds, s² = Σ_r Σ(y − ȳ_r)² / (n − |R|), so that round
/// effects do not inflate it; then Var(μ̂) = s²·Σ_r (w_r/W)²/n_r with W = Σ_{r∈R} w_r, and the interval is
/// μ̂ ± t(1 − α/2; n − |R|)·√Var (a stratified mean with a pooled within-stratum variance: common practice).</para>
/// </remarks>
public static class RoundStratifiedMean
{
    /// <summary>The point estimate alone, or null when the arm has no plot (no t quantile, so cheap enough for a simulation loop).</summary>
    /// <exception cref="ArgumentException">A round of the arm has no weight, or a weight is not positive and finite.</exception>
    public static double? Mean(IReadOnlyList<PlotRecord> records, int arm, IReadOnlyDictionary<int, double> roundWeights)
    {
        ArgumentNullException.ThrowIfNull(records);
        ArgumentNullException.ThrowIfNull(roundWeights);
        var strata = Strata(records, arm, roundWeights);
        return strata.Length == 0 ? null : Combine(strata).Estimate;
    }

    /// <param name="roundWeights">a positive weight for every round label that occurs in the arm's records.</param>
    /// <exception cref="ArgumentException">A round of the arm has no weight, or a weight is not positive and finite.</exception>
    public static ArmEstimate Estimate(IReadOnlyList<PlotRecord> records, int arm, IReadOnlyDictionary<int, double> roundWeights, double level = 0.95)
    {
        ArgumentNullException.ThrowIfNull(records);
        ArgumentNullException.ThrowIfNull(roundWeights);
        Level.Check(level);
        var strata = Strata(records, arm, roundWeights);
        if (strata.Length == 0) return new ArmEstimate(arm, 0, EstimateStatus.NoData, null, null, null, null);
        var (estimate, within, varianceFactor) = Combine(strata);
        int n = strata.Sum(s => s.Count);
        int df = n - strata.Length;
        if (df == 0) return new ArmEstimate(arm, n, EstimateStatus.MeanOnly, estimate, null, null, null);
        double half = StudentT.Quantile(df, Level.UpperProbability(level)) * Math.Sqrt(within / df * varianceFactor);
        return new ArmEstimate(arm, n, EstimateStatus.Estimated, estimate, estimate - half, estimate + half, df);
    }

    private readonly record struct Stratum(double Weight, int Count, double Mean, double Squares);

    // One stratum per round the arm has plots in, ascending by round so every sum runs in the same order.
    private static Stratum[] Strata(IReadOnlyList<PlotRecord> records, int arm, IReadOnlyDictionary<int, double> roundWeights)
    {
        var byRound = new SortedDictionary<int, List<double>>();
        foreach (var record in records)
        {
            if (record.Arm != arm) continue;
            if (!byRound.TryGetValue(record.Round, out var values)) byRound[record.Round] = values = [];
            values.Add(record.Value);
        }
        var strata = new Stratum[byRound.Count];
        int k = 0;
        foreach (var (round, values) in byRound)
        {
            if (!roundWeights.TryGetValue(round, out double w))
                throw new ArgumentException($"Round {round} has no weight.", nameof(roundWeights));
            if (!(w > 0) || !double.IsFinite(w))
                throw new ArgumentException($"The weight of round {round} must be positive and finite.", nameof(roundWeights));
            double mean = values.Average();
            strata[k++] = new Stratum(w, values.Count, mean, values.Sum(v => (v - mean) * (v - mean)));
        }
        return strata;
    }

    private static (double Estimate, double Within, double VarianceFactor) Combine(Stratum[] strata)
    {
        double totalWeight = 0, weighted = 0, within = 0;
        foreach (var s in strata)
        {
            totalWeight += s.Weight;
            weighted += s.Weight * s.Mean;
            within += s.Squares;
        }
        double varianceFactor = 0;
        foreach (var s in strata)
        {
            double share = s.Weight / totalWeight;
            varianceFactor += share * share / s.Count;
        }
        return (weighted / totalWeight, within, varianceFactor);
    }
}
