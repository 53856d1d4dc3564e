using DesignCompiler.Text;

namespace DesignCompiler.Binding;

public enum OutcomeFamily
{
    Bernoulli,
    Binomial,
    Normal,
    Count,
}

/// <summary>
/// What is measured on each plot. For <see cref="OutcomeFamily.Binomial"/> each plot gives
/// successes out of <see cref="Trials"/>; for a normal outcome <see cref="NoiseSd"/> is the
/// known plot-to-plot sd, or null when the noise is unknown and learned from the data.
/// </summary>
public sealed record OutcomeSpec(string Name, string? Unit, OutcomeFamily Family, int Trials, double? NoiseSd, TextSpan Span)
{
    public bool HasUnknownNoise => Family == OutcomeFamily.Normal && NoiseSd is null;

    /// <summary>The family as a user writes it, for messages.</summary>
    public string FamilyText => Family switch
    {
        OutcomeFamily.Bernoulli => "bernoulli",
        OutcomeFamily.Binomial => $"binomial of {Trials}",
        OutcomeFamily.Normal => NoiseSd is null ? "normal noise unknown" : "normal",
        _ => "count",
    };
}
