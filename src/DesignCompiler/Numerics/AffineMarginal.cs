using System.Globalization;

namespace DesignCompiler.Numerics;

/// <summary>
/// The distribution of u = scale·x + shift for x from another marginal. A negative scale turns a
/// "smaller is better" goal into a maximisation, and price·θ − cost ranks arms by net value.
/// </summary>
public sealed class AffineMarginal : IMarginal, IQuadratureProfile, IBoundedProfile, IEquatable<AffineMarginal>
{
    public AffineMarginal(IMarginal inner, double scale, double shift)
    {
        ArgumentNullException.ThrowIfNull(inner);
        if (scale == 0 || !double.IsFinite(scale)) throw new ArgumentOutOfRangeException(nameof(scale), "The scale must be finite and non-zero.");
        if (!double.IsFinite(shift)) throw new ArgumentOutOfRangeException(nameof(shift), "The shift must be finite.");
        Inner = inner;
        Scale = scale;
        Shift = shift;
        isIdentity = scale == 1 && shift == 0;
    }

    // Most arms are valued as they are measured; the quadrature then evaluates the inner marginal directly,
    // which gives the same bits without copying every panel through the transform.
    private readonly bool isIdentity;

    /// <summary>u = x: the quadrature may evaluate the inner marginal in its place.</summary>
    internal bool IsIdentity => isIdentity;

    public IMarginal Inner { get; }

    public double Scale { get; }

    public double Shift { get; }

    public double Mean => Scale * Inner.Mean + Shift;

    public double StdDev => Math.Abs(Scale) * Inner.StdDev;

    public double LowerBound => Scale > 0 ? Map(Inner.LowerBound) : Map(Inner.UpperBound);

    public double UpperBound => Scale > 0 ? Map(Inner.UpperBound) : Map(Inner.LowerBound);

    public double LogDensity(double u) => Inner.LogDensity(Unmap(u)) - Math.Log(Math.Abs(Scale));

    public double Density(double u) => Inner.Density(Unmap(u)) / Math.Abs(Scale);

    public double Cdf(double u) => Scale > 0 ? Inner.Cdf(Unmap(u)) : Inner.UpperTail(Unmap(u));

    public double UpperTail(double u) => Scale > 0 ? Inner.UpperTail(Unmap(u)) : Inner.Cdf(Unmap(u));

    public double Quantile(double p) =>
        Scale > 0 ? Map(Inner.Quantile(p)) : Map(MarginalProfile.UpperQuantile(Inner, p));

    double IQuadratureProfile.UpperQuantile(double q) =>
        Scale > 0 ? Map(MarginalProfile.UpperQuantile(Inner, q)) : Map(Inner.Quantile(q));

    void IQuadratureProfile.Support(double tailMass, out double lo, out double hi, out double aboveLowerBound, out double belowUpperBound)
    {
        MarginalProfile.Support(Inner, tailMass, out double innerLo, out double innerHi, out double innerAbove, out double innerBelow);
        double size = Math.Abs(Scale);
        lo = Scale > 0 ? Map(innerLo) : Map(innerHi);
        hi = Scale > 0 ? Map(innerHi) : Map(innerLo);
        // A negative scale turns the inner variable's upper bound into this one's lower bound and back.
        aboveLowerBound = size * (Scale > 0 ? innerAbove : innerBelow);
        belowUpperBound = size * (Scale > 0 ? innerBelow : innerAbove);
    }

    bool IQuadratureProfile.WideSupport(double tailMass, out double lo, out double hi)
    {
        bool known = MarginalProfile.WideSupport(Inner, tailMass, out double innerLo, out double innerHi);
        // One rounding of Map either way is covered by the bounds' own margin, which is far wider.
        lo = Scale > 0 ? Map(innerLo) : Map(innerHi);
        hi = Scale > 0 ? Map(innerHi) : Map(innerLo);
        return known;
    }

    double IQuadratureProfile.PanelWidth(double u, bool forward) =>
        Math.Abs(Scale) * MarginalProfile.PanelWidth(Inner, Unmap(u), forward == Scale > 0);

    void IQuadratureProfile.Evaluate(double u, out double density, out double cdf, out double upperTail)
    {
        MarginalProfile.Evaluate(Inner, Unmap(u), out double innerDensity, out double innerCdf, out double innerUpper);
        Orient(innerDensity, innerCdf, innerUpper, out density, out cdf, out upperTail);
    }

    void IBoundedProfile.EvaluateNearBound(bool upper, double distance, out double density, out double cdf, out double upperTail)
    {
        MarginalProfile.EvaluateNearBound(
            Inner, upper == Scale > 0, distance / Math.Abs(Scale), out double innerDensity, out double innerCdf, out double innerUpper);
        Orient(innerDensity, innerCdf, innerUpper, out density, out cdf, out upperTail);
    }

    void IQuadratureProfile.EvaluateMany(ReadOnlySpan<double> u, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        if (isIdentity)
        {
            MarginalProfile.EvaluateMany(Inner, u, density, cdf, upperTail);
            return;
        }
        Span<double> x = stackalloc double[u.Length];
        for (int j = 0; j < u.Length; j++) x[j] = Unmap(u[j]);
        MarginalProfile.EvaluateMany(Inner, x, density, cdf, upperTail);
        OrientMany(density, cdf, upperTail);
    }

    void IBoundedProfile.EvaluateNearBoundMany(bool upper, ReadOnlySpan<double> distance, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        if (isIdentity)
        {
            MarginalProfile.EvaluateNearBoundMany(Inner, upper, distance, density, cdf, upperTail);
            return;
        }
        Span<double> inner = stackalloc double[distance.Length];
        for (int j = 0; j < distance.Length; j++) inner[j] = distance[j] / Math.Abs(Scale);
        MarginalProfile.EvaluateNearBoundMany(Inner, upper == Scale > 0, inner, density, cdf, upperTail);
        OrientMany(density, cdf, upperTail);
    }

    double IBoundedProfile.PanelWidthNearBound(bool upper, double distance, bool awayFromBound) =>
        Math.Abs(Scale) * MarginalProfile.PanelWidthNearBound(Inner, upper == Scale > 0, distance / Math.Abs(Scale), awayFromBound);

    public bool Equals(AffineMarginal? other) =>
        other is not null && Scale.Equals(other.Scale) && Shift.Equals(other.Shift) && Inner.Equals(other.Inner);

    public override bool Equals(object? obj) => Equals(obj as AffineMarginal);

    public override int GetHashCode() => HashCode.Combine(typeof(AffineMarginal), Inner, Scale, Shift);

    public override string ToString() =>
        string.Create(CultureInfo.InvariantCulture, $"{Scale:R}·{Inner} + {Shift:R}");

    private void Orient(double innerDensity, double innerCdf, double innerUpper, out double density, out double cdf, out double upperTail)
    {
        density = innerDensity / Math.Abs(Scale);
        cdf = Scale > 0 ? innerCdf : innerUpper;
        upperTail = Scale > 0 ? innerUpper : innerCdf;
    }

    private void OrientMany(Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        for (int j = 0; j < density.Length; j++)
        {
            Orient(density[j], cdf[j], upperTail[j], out density[j], out double lower, out double upper);
            cdf[j] = lower;
            upperTail[j] = upper;
        }
    }

    private double Map(double x) => Scale * x + Shift;

    private double Unmap(double u) => (u - Shift) / Scale;
}
