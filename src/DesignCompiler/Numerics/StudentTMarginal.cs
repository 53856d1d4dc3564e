using System.Globalization;

namespace DesignCompiler.Numerics;

/// <summary>
/// Location-scale Student-t: the posterior of a mean when the variance is unknown too
/// (normal-gamma prior). df may be fractional and as small as you like; heavy tails are handled.
/// </summary>
public sealed class StudentTMarginal : IMarginal, IQuadratureProfile, IEquatable<StudentTMarginal>
{
    private readonly BetaKernel kernel;
    private readonly double logNormaliser;

    public StudentTMarginal(double df, double location, double scale)
    {
        if (!StudentT.ValidDf(df)) throw new ArgumentOutOfRangeException(nameof(df), "Degrees of freedom must be positive and finite.");
        if (!double.IsFinite(location)) throw new ArgumentOutOfRangeException(nameof(location), "The location must be finite.");
        if (!(scale > 0) || !double.IsFinite(scale)) throw new ArgumentOutOfRangeException(nameof(scale), "The scale must be positive and finite.");
        Df = df;
        Location = location;
        Scale = scale;
        kernel = new BetaKernel(0.5 * df, 0.5, tabulate: true);
        // 1 / (√df · B(df/2, ½)) · 1/scale
        logNormaliser = -SpecialFunctions.LogBeta(0.5 * df, 0.5) - 0.5 * Math.Log(df) - Math.Log(scale);
        StdDev = df > 2 ? scale * Math.Sqrt(df / (df - 2.0)) : double.PositiveInfinity;
    }

    public double Df { get; }

    public double Location { get; }

    public double Scale { get; }

    public double Mean => Location;

    public double StdDev { get; }

    public double LowerBound => double.NegativeInfinity;

    public double UpperBound => double.PositiveInfinity;

    public double LogDensity(double x)
    {
        double z = (x - Location) / Scale;
        double z2 = z * z;
        // ln(1 + z²/df), without overflowing z² for extreme z.
        double log1pRatio = double.IsInfinity(z2)
            ? 2.0 * Math.Log(Math.Abs(z)) - Math.Log(Df)
            : SpecialFunctions.Log1p(z2 / Df);
        return logNormaliser - 0.5 * (Df + 1.0) * log1pRatio;
    }

    public double Density(double x) => Math.Exp(LogDensity(x));

    public double Cdf(double x)
    {
        StudentT.Tails(kernel, Df, (x - Location) / Scale, out double lower, out _);
        return lower;
    }

    public double UpperTail(double x)
    {
        StudentT.Tails(kernel, Df, (x - Location) / Scale, out _, out double upper);
        return upper;
    }

    public double Quantile(double p) => Location + Scale * StudentT.Quantile(Df, p);

    double IQuadratureProfile.UpperQuantile(double q)
    {
        if (double.IsNaN(q) || q < 0 || q > 1) return double.NaN;
        double t = q <= 0.5
            ? StudentT.UpperHalfQuantile(Df, q, IncompleteBeta.FullPrecision)
            : -StudentT.UpperHalfQuantile(Df, 1.0 - q, IncompleteBeta.FullPrecision);
        return Location + Scale * t;
    }

    void IQuadratureProfile.Support(double tailMass, out double lo, out double hi, out double aboveLowerBound, out double belowUpperBound)
    {
        double t = StudentT.UpperHalfQuantile(Df, tailMass, 1e-3);
        lo = Location - Scale * t;
        hi = Location + Scale * t;
        aboveLowerBound = double.PositiveInfinity;
        belowUpperBound = double.PositiveInfinity;
    }

    // The density has poles at z = ±i√df. Panels keep their distance to them in proportion (so they grow
    // geometrically in the tails) and, for large df where the shape is nearly normal, stay within the
    // usual few standard deviations.
    double IQuadratureProfile.PanelWidth(double x, bool forward)
    {
        double z = (x - Location) / Scale;
        double factor = Math.Min(1.0, PanelRules.StdDevMultiple / Math.Sqrt(Df));
        double width = Scale * factor * Math.Sqrt(z * z + Df);
        bool towardsCentre = forward ? z < 0 : z > 0;
        return towardsCentre ? width / (1.0 + factor) : width;
    }

    void IQuadratureProfile.Evaluate(double x, out double density, out double cdf, out double upperTail)
    {
        density = Density(x);
        StudentT.Tails(kernel, Df, (x - Location) / Scale, out cdf, out upperTail);
    }

    void IQuadratureProfile.EvaluateMany(ReadOnlySpan<double> x, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        Span<double> t = x.Length <= 64 ? stackalloc double[x.Length] : new double[x.Length];
        for (int j = 0; j < x.Length; j++)
        {
            density[j] = Density(x[j]);
            t[j] = (x[j] - Location) / Scale;
        }
        StudentT.TailsMany(kernel, Df, t, cdf, upperTail);
    }

    public bool Equals(StudentTMarginal? other) =>
        other is not null && Df.Equals(other.Df) && Location.Equals(other.Location) && Scale.Equals(other.Scale);

    public override bool Equals(object? obj) => Equals(obj as StudentTMarginal);

    public override int GetHashCode() => HashCode.Combine(typeof(StudentTMarginal), Df, Location, Scale);

    public override string ToString() =>
        string.Create(CultureInfo.InvariantCulture, $"StudentT({Df:R}, {Location:R}, {Scale:R})");
}
