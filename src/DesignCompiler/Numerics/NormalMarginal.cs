using System.Globalization;
using DesignCompiler.Numerics.Multivariate;

namespace DesignCompiler.Numerics;

/// <summary>Normal(mean, sd), the posterior of a mean with known variance.</summary>
public sealed partial class NormalMarginal : IMarginal, IQuadratureProfile, IEquatable<NormalMarginal>
{
    public NormalMarginal(double mean, double sd)
    {
        if (!double.IsFinite(mean)) throw new ArgumentOutOfRangeException(nameof(mean), "The mean must be finite.");
        if (!(sd > 0) || !double.IsFinite(sd)) throw new ArgumentOutOfRangeException(nameof(sd), "The standard deviation must be positive and finite.");
        Mean = mean;
        StdDev = sd;
    }

    public double Mean { get; }

    public double StdDev { get; }

    public double LowerBound => double.NegativeInfinity;

    public double UpperBound => double.PositiveInfinity;

    public double LogDensity(double x) => StandardNormal.LogPdf((x - Mean) / StdDev) - Math.Log(StdDev);

    public double Density(double x) => StandardNormal.Pdf((x - Mean) / StdDev) / StdDev;

    public double Cdf(double x) => StandardNormal.Cdf((x - Mean) / StdDev);

    public double UpperTail(double x) => StandardNormal.UpperTail((x - Mean) / StdDev);

    public double Quantile(double p) => Mean + StdDev * StandardNormal.Quantile(p);

    double IQuadratureProfile.UpperQuantile(double q) => Mean + StdDev * StandardNormal.UpperQuantile(q);

    void IQuadratureProfile.Support(double tailMass, out double lo, out double hi, out double aboveLowerBound, out double belowUpperBound)
    {
        double z = StandardNormal.UpperQuantile(tailMass);
        lo = Mean - z * StdDev;
        hi = Mean + z * StdDev;
        aboveLowerBound = double.PositiveInfinity;
        belowUpperBound = double.PositiveInfinity;
    }

    double IQuadratureProfile.PanelWidth(double x, bool forward) => PanelRules.StdDevMultiple * StdDev;

    void IQuadratureProfile.Evaluate(double x, out double density, out double cdf, out double upperTail)
    {
        // The tail beyond z from the short Chebyshev series the lattice rules use (5e-15 relative; P(best) asks
        // for 1e-12), the other tail as its complement: the general CDF computes both, each by a continued
        // fraction, which was two thirds of a normal simulation's time. φ uses the repeatable exp, whose lane
        // form has the same bits (NormalMarginal.Lanes.cs).
        double z = (x - Mean) / StdDev;
        double pdf = NormalTail.Density(z);
        density = pdf / StdDev;
        if (z >= 0)
        {
            upperTail = NormalTail.UpperGivenDensity(z, pdf);
            cdf = 1.0 - upperTail;
        }
        else
        {
            cdf = NormalTail.UpperGivenDensity(-z, pdf);
            upperTail = 1.0 - cdf;
        }
    }

    public bool Equals(NormalMarginal? other) => other is not null && Mean.Equals(other.Mean) && StdDev.Equals(other.StdDev);

    public override bool Equals(object? obj) => Equals(obj as NormalMarginal);

    public override int GetHashCode() => HashCode.Combine(typeof(NormalMarginal), Mean, StdDev);

    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"Normal({Mean:R}, {StdDev:R})");
}
