namespace DesignCompiler.Analysis.Rcbd;

/// <summary>
/// The analysis of variance of a randomized complete block design (Gomez &amp; Gomez 1984, §2.2.3), with the
/// summary figures a field report carries.
/// </summary>
/// <param name="Replication">blocks, b − 1 df. With missing plots: blocks ignoring treatments, from the recorded plots.</param>
/// <param name="Treatment">t − 1 df, F = MS_treatment/MS_error and its upper-tail P. With missing plots: adjusted for blocks.</param>
/// <param name="Error">(t − 1)(b − 1) − m df, m the number of missing plots.</param>
/// <param name="Total">tb − 1 − m df, about the mean of the recorded plots; the three lines above add up to it.</param>
/// <param name="GrandMean">the mean of the recorded plots.</param>
/// <param name="CvPercent">100·√MS_error / grand mean; null when the grand mean is zero.</param>
/// <param name="RelativeEfficiency">of the blocks against a completely randomized design, [(b − 1)E_b + b(t − 1)E_e]/[(tb − 1)E_e] with E_b and E_e the replication and error mean squares; null with missing plots.</param>
/// <param name="RelativeEfficiencyDfAdjusted">the same times k = [(b−1)(t−1)+1][t(b−1)+3] / ([(b−1)(t−1)+3][t(b−1)+1]), the precision adjustment for few error df (Gomez &amp; Gomez apply it when error df &lt; 20).</param>
/// <param name="TreatmentMeans">least-squares treatment means: the row means, with missing plots at their estimates.</param>
/// <param name="Missing">the estimated plots and the treatment-SS bias, or null for a complete table.</param>
public sealed record RcbdAnova(
    int Treatments,
    int Blocks,
    AnovaLine Replication,
    AnovaLine Treatment,
    AnovaLine Error,
    AnovaLine Total,
    double GrandMean,
    double? CvPercent,
    double? RelativeEfficiency,
    double? RelativeEfficiencyDfAdjusted,
    IReadOnlyList<double> TreatmentMeans,
    MissingPlotEstimates? Missing);

/// <summary>One missing plot's estimate.</summary>
public readonly record struct EstimatedPlot(int Treatment, int Block, double Value);

/// <summary>
/// The missing plots' estimates, the upward bias they put into the treatment sum of squares of the completed table
/// (already taken out of <see cref="RcbdAnova.Treatment"/>), and how many sweeps Yates's iteration needed (0 for one plot).
/// </summary>
public sealed record MissingPlotEstimates(IReadOnlyList<EstimatedPlot> Plots, double TreatmentBias, int Sweeps, RcbdTable Completed);
