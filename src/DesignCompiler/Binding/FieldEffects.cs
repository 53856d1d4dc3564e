namespace DesignCompiler.Binding;

/// <summary>
/// How a simulated field departs from the plain scenario (robustness scenarios). The sds are on
/// the family's natural scale: outcome units for normal, log for counts, logit for bernoulli and
/// binomial. Everything is zero (or null) when the scenario writes none.
/// </summary>
/// <param name="SeasonSd">Every arm shifts by one N(0, sd²) amount per round.</param>
/// <param name="InteractionSd">Each arm shifts by its own N(0, sd²) amount per round.</param>
/// <param name="BlockSd">Each block shifts every arm by one N(0, sd²) amount for the whole trial.</param>
/// <param name="MissingShare">Share of plots of every arm lost before harvest, at random.</param>
/// <param name="MissingShareByArm">Per arm, design order: the share lost for that arm (the larger of its own and the general share).</param>
/// <param name="Dispersion">Counts only: a plot's Poisson mean is multiplied by Gamma(k, rate k), so the counts are negative binomial with size k.</param>
public sealed record FieldEffects(
    double SeasonSd, double InteractionSd, double BlockSd, double MissingShare,
    IReadOnlyList<double> MissingShareByArm, double? Dispersion)
{
    public static FieldEffects None { get; } = new(0, 0, 0, 0, [], null);

    public bool Any => SeasonSd > 0 || InteractionSd > 0 || BlockSd > 0 || MissingShare > 0
        || MissingShareByArm.Any(s => s > 0) || Dispersion is not null;

    /// <summary>The chance that a plot of this arm is lost.</summary>
    public double MissingFor(int arm) => MissingShareByArm.Count > arm ? MissingShareByArm[arm] : MissingShare;
}
