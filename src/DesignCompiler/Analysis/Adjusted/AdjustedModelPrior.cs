namespace DesignCompiler.Analysis.Adjusted;

/// <summary>
/// The prior of the adjusted yield model in the trial's own terms: per arm a mean and sd, a guess of the plot-to-plot
/// noise sd worth some plots, and how far a block or a round may plausibly move every arm's yield. Or the flat reference prior.
/// </summary>
/// <remarks>
/// <para>The terms map to the conjugate prior β | σ² ~ N(m0, σ²V0), σ² ~ InvGamma(a0, b0) as the single-arm normal prior
/// does (<see cref="Binding.NormalPriorSpec.NormalInverseGamma"/>): noise guess g worth w plots gives a0 = w/2 and
/// b0 = a0·g²; a coefficient with prior sd s gets V0 = s²/g². The prior marginal of every coefficient is then a t
/// with w degrees of freedom and scale exactly s, whatever g is.</para>
/// <para>Block effects α_1..α_b (and round effects likewise) are exchangeable and sum to zero: the prior is that of b
/// independent N(0, τ²) effects conditioned on their sum being zero, τ² = s_B²·b/(b − 1), so each effect, the last
/// one included, has prior sd s_B and no block is special. On the b − 1 free effects that covariance is
/// τ²(I − J/b), whose inverse is (I + J)/τ² (Sherman–Morrison), the form <see cref="AdjustedModel"/> builds.</para>
/// </remarks>
public sealed class AdjustedModelPrior
{
    private readonly ArmPrior[] arms;

    private AdjustedModelPrior(ArmPrior[] arms, double noiseGuess, double noiseWorth, double blockEffectSd, double roundEffectSd, bool flat)
    {
        this.arms = arms;
        NoiseGuess = noiseGuess;
        NoiseWorth = noiseWorth;
        BlockEffectSd = blockEffectSd;
        RoundEffectSd = roundEffectSd;
        IsFlat = flat;
    }

    /// <summary>
    /// The reference prior p(β, σ²) ∝ 1/σ²: V0⁻¹ = 0 for arms and effects alike, b0 = 0 and a0 = −r/2 with r the
    /// number of coefficients the data identify. Arm estimates are then the least-squares arm means and the noise
    /// scale is the residual mean square; an arm the data cannot separate is reported as unidentified.
    /// </summary>
    public static AdjustedModelPrior Flat { get; } = new([], 0, 0, 0, 0, flat: true);

    /// <summary>
    /// A proper prior. Block and round effect sds default to the largest arm prior sd: a field or a season is taken to
    /// move yields about as much as we are unsure of an arm's mean. That is weak next to the data (the prior on one
    /// effect is worth g²/s² plots of that block or round), yet proper, so a block or round with few plots never makes
    /// the model singular, and an arm never observed keeps exactly its own prior.
    /// </summary>
    /// <param name="arms">one prior per arm, in design order; every sd positive.</param>
    /// <param name="noiseGuess">a guess g of the plot-to-plot sd, positive.</param>
    /// <param name="noiseWorth">how many plots' worth of data the guess is, positive (the language's default is 2).</param>
    public static AdjustedModelPrior Proper(IReadOnlyList<ArmPrior> arms, double noiseGuess, double noiseWorth,
        double? blockEffectSd = null, double? roundEffectSd = null)
    {
        ArgumentNullException.ThrowIfNull(arms);
        if (arms.Count == 0) throw new ArgumentException("At least one arm prior is needed.", nameof(arms));
        foreach (var arm in arms)
        {
            if (!double.IsFinite(arm.Mean)) throw new ArgumentException("Every arm prior mean must be finite.", nameof(arms));
            Positive(arm.Sd, nameof(arms));
        }
        Positive(noiseGuess, nameof(noiseGuess));
        Positive(noiseWorth, nameof(noiseWorth));
        double widest = arms.Max(a => a.Sd);
        double block = blockEffectSd ?? widest, round = roundEffectSd ?? widest;
        Positive(block, nameof(blockEffectSd));
        Positive(round, nameof(roundEffectSd));
        return new AdjustedModelPrior(arms.ToArray(), noiseGuess, noiseWorth, block, round, flat: false);
    }

    public bool IsFlat { get; }

    /// <summary>The arm priors in design order (empty for the flat prior).</summary>
    public IReadOnlyList<ArmPrior> Arms => arms;

    /// <summary>g, the guess of the plot-to-plot sd.</summary>
    public double NoiseGuess { get; }

    /// <summary>w, plots' worth of confidence in g.</summary>
    public double NoiseWorth { get; }

    /// <summary>s_B, the prior sd of one block's effect.</summary>
    public double BlockEffectSd { get; }

    /// <summary>s_R, the prior sd of one round's effect.</summary>
    public double RoundEffectSd { get; }

    private static void Positive(double value, string name)
    {
        if (!(value > 0) || !double.IsFinite(value)) throw new ArgumentOutOfRangeException(name, "Must be positive and finite.");
    }
}
