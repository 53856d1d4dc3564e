using DesignCompiler.Numerics.LinearModel;

namespace DesignCompiler.Analysis.Adjusted;

/// <summary>
/// The adjusted yield model y = μ_arm + α_block + γ_round + ε, ε ~ N(0, σ²), fitted in closed form under its
/// conjugate prior.
/// </summary>
/// <remarks>
/// Parametrisation: one coefficient per arm, then b − 1 block effects and r − 1 round effects in sum-to-zero
/// (deviation) coding over the distinct block and round labels that occur in the records, in ascending order. A
/// plot in level ℓ &lt; b − 1 has 1 in column ℓ; a plot in the last level has −1 in every column of the factor, so
/// α_last = −(α_1 + … + α_{b−1}). Every arm coefficient is therefore the arm's mean at the average block and the
/// average round of the trial, and arms compare on the same footing however unevenly an adaptive trial spread them
/// over fields and seasons.
/// </remarks>
public static class AdjustedModel
{
    /// <summary>Fits the model to the records; arms 0..armCount−1 are all reported, observed or not.</summary>
    /// <exception cref="ArgumentException">An arm index is out of range, a value is not finite, or the proper prior does not have one arm prior per arm.</exception>
    public static AdjustedModelFit Fit(IReadOnlyList<PlotRecord> records, int armCount, ModelAdjustment adjustment, AdjustedModelPrior prior)
    {
        ArgumentNullException.ThrowIfNull(records);
        ArgumentNullException.ThrowIfNull(prior);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(armCount);
        if (!prior.IsFlat && prior.Arms.Count != armCount)
            throw new ArgumentException($"The prior has {prior.Arms.Count} arm priors for {armCount} arms.", nameof(prior));
        foreach (var record in records)
        {
            if (record.Arm < 0 || record.Arm >= armCount) throw new ArgumentException($"Arm index {record.Arm} is outside 0..{armCount - 1}.", nameof(records));
            if (!double.IsFinite(record.Value)) throw new ArgumentException("Every recorded value must be finite.", nameof(records));
        }

        int[] blocks = adjustment is ModelAdjustment.Block or ModelAdjustment.BlockAndRound ? Levels(records, r => r.Block) : [];
        int[] rounds = adjustment is ModelAdjustment.Round or ModelAdjustment.BlockAndRound ? Levels(records, r => r.Round) : [];
        var columns = new ModelColumns(armCount, blocks, rounds);
        var x = columns.DesignMatrix(records);
        var y = records.Select(r => r.Value).ToArray();
        var nig = prior.IsFlat ? NormalInverseGammaPrior.Flat(columns.Count) : ConjugatePrior(prior, columns);
        var posterior = ConjugateRegression.Update(nig, x, y);
        var plots = new int[armCount];
        foreach (var record in records) plots[record.Arm]++;
        return new AdjustedModelFit(adjustment, columns, posterior, plots);
    }

    private static int[] Levels(IReadOnlyList<PlotRecord> records, Func<PlotRecord, int> label) =>
        records.Select(label).Distinct().Order().ToArray();

    private static NormalInverseGammaPrior ConjugatePrior(AdjustedModelPrior prior, ModelColumns columns)
    {
        double g2 = prior.NoiseGuess * prior.NoiseGuess;
        var mean = new double[columns.Count];
        var precision = new double[columns.Count, columns.Count];
        for (int i = 0; i < columns.Arms; i++)
        {
            mean[i] = prior.Arms[i].Mean;
            precision[i, i] = g2 / (prior.Arms[i].Sd * prior.Arms[i].Sd);
        }
        SumToZeroPrecision(precision, columns.FirstBlockColumn, columns.Blocks.Count, prior.BlockEffectSd, g2);
        SumToZeroPrecision(precision, columns.FirstRoundColumn, columns.Rounds.Count, prior.RoundEffectSd, g2);
        double shape = 0.5 * prior.NoiseWorth;
        return NormalInverseGammaPrior.Proper(mean, precision, shape, shape * g2);
    }

    // The b − 1 free effects of an exchangeable sum-to-zero factor with per-effect prior sd s have covariance
    // (s²/g²)·(b/(b − 1))·(I − J/b) in units of σ², so precision (g²/s²)·((b − 1)/b)·(I + J).
    private static void SumToZeroPrecision(double[,] precision, int first, int levels, double sd, double g2)
    {
        if (levels < 2) return;
        double scale = g2 / (sd * sd) * (levels - 1) / levels;
        for (int i = 0; i < levels - 1; i++)
            for (int j = 0; j < levels - 1; j++)
                precision[first + i, first + j] = scale * (i == j ? 2 : 1);
    }
}
