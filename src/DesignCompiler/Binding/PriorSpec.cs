using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>A checked prior on an arm's mean outcome. Which kind fits which family is the binder's rule.</summary>
public abstract record PriorSpec(TextSpan Span)
{
    public abstract string Describe();
}

public sealed record BetaPriorSpec(double A, double B, TextSpan Span) : PriorSpec(Span)
{
    public override string Describe() => FormattableString.Invariant($"beta({A}, {B})");
}

/// <summary>
/// A normal prior on the mean. For an outcome with unknown noise the user's terms map to a
/// normal–inverse-gamma prior (see <see cref="NormalInverseGamma"/>).
/// </summary>
public sealed record NormalPriorSpec(double Mean, double Sd, double? NoiseGuess, double? Worth, TextSpan Span) : PriorSpec(Span)
{
    /// <summary>Plots' worth of confidence in the noise guess when none is written.</summary>
    public const double DefaultWorth = 2;

    public override string Describe() => FormattableString.Invariant($"normal(mean {Mean}, sd {Sd})");

    /// <summary>
    /// The four parameters (μ0, κ0, α0, β0) of μ | σ² ~ N(μ0, σ²/κ0), σ² ~ IG(α0, β0) from the
    /// user's terms: noise guess g (defaults to the prior sd) worth w plots:
    /// α0 = w/2 and β0 = α0·g², so E[1/σ²] = 1/g²; κ0 = g²/s², so that the prior marginal of μ
    /// is a Student-t with w degrees of freedom, centre m and scale exactly s.
    /// </summary>
    public (double Mu0, double Kappa0, double Alpha0, double Beta0) NormalInverseGamma
    {
        get
        {
            var g = NoiseGuess ?? Sd;
            var w = Worth ?? DefaultWorth;
            var alpha = w / 2;
            return (Mean, g * g / (Sd * Sd), alpha, alpha * g * g);
        }
    }
}

public sealed record GammaPriorSpec(double Shape, double Rate, TextSpan Span) : PriorSpec(Span)
{
    public override string Describe() => FormattableString.Invariant($"gamma(shape {Shape}, rate {Rate})");
}
