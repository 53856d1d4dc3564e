using System.Globalization;

namespace DesignCompiler.Numerics;

/// <summary>An equal-tailed credible interval: each tail outside it holds (1 − level)/2 of the posterior.</summary>
public readonly record struct CredibleInterval(double Lower, double Upper)
{
    public static CredibleInterval EqualTailed(IMarginal marginal, double level = 0.95)
    {
        ArgumentNullException.ThrowIfNull(marginal);
        if (!(level > 0 && level < 1)) throw new ArgumentOutOfRangeException(nameof(level), "The level must lie strictly between 0 and 1.");
        // ½ − level/2 equals 1 − (½ + level/2) exactly, so the two tails are mirror images to the last bit.
        double tail = 0.5 - 0.5 * level;
        return new CredibleInterval(marginal.Quantile(tail), MarginalProfile.UpperQuantile(marginal, tail));
    }

    public double Width => Upper - Lower;

    public bool Contains(double x) => x >= Lower && x <= Upper;

    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"[{Lower:R}, {Upper:R}]");
}
