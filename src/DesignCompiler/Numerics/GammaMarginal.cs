using System.Globalization;

namespace DesignCompiler.Numerics;

/// <summary>Gamma(shape, rate), the posterior of a Poisson rate.</summary>
public sealed class GammaMarginal : IMarginal, IQuadratureProfile, IEquatable<GammaMarginal>
{
    private readonly GammaKernel kernel;

    public GammaMarginal(double shape, double rate)
    {
        if (!IncompleteGamma.ValidShape(shape)) throw new ArgumentOutOfRangeException(nameof(shape), "The shape must be positive and finite.");
        if (!(rate > 0) || !double.IsFinite(rate)) throw new ArgumentOutOfRangeException(nameof(rate), "The rate must be positive and finite.");
        Shape = shape;
        Rate = rate;
        kernel = new GammaKernel(shape);
        Mean = shape / rate;
        StdDev = Math.Sqrt(shape) / rate;
    }

    public double Shape { get; }

    public double Rate { get; }

    public double Mean { get; }

    public double StdDev { get; }

    public double LowerBound => 0.0;

    public double UpperBound => double.PositiveInfinity;

    public double LogDensity(double x)
    {
        if (double.IsNaN(x)) return x;
        if (x < 0 || double.IsPositiveInfinity(x)) return double.NegativeInfinity;
        if (x == 0) return Shape < 1 ? double.PositiveInfinity : Shape == 1 ? Math.Log(Rate) : double.NegativeInfinity;
        // f(x) = rate·g(rate·x) with g the standard density g(t) = prefactor(t)/t, so f(x) = prefactor(rate·x)/x.
        return kernel.LogPrefactor(Rate * x) - Math.Log(x);
    }

    public double Density(double x) => Math.Exp(LogDensity(x));

    public double Cdf(double x)
    {
        if (double.IsNaN(x)) return x;
        kernel.Tails(Rate * x, out double lower, out _);
        return lower;
    }

    public double UpperTail(double x)
    {
        if (double.IsNaN(x)) return x;
        kernel.Tails(Rate * x, out _, out double upper);
        return upper;
    }

    public double Quantile(double p)
    {
        if (double.IsNaN(p) || p < 0 || p > 1) return double.NaN;
        return IncompleteGamma.Quantile(kernel, p, 1.0 - p, IncompleteBeta.FullPrecision) / Rate;
    }

    double IQuadratureProfile.UpperQuantile(double q)
    {
        if (double.IsNaN(q) || q < 0 || q > 1) return double.NaN;
        return IncompleteGamma.Quantile(kernel, 1.0 - q, q, IncompleteBeta.FullPrecision) / Rate;
    }

    void IQuadratureProfile.Support(double tailMass, out double lo, out double hi, out double aboveLowerBound, out double belowUpperBound)
    {
        const double coarse = 1e-3;
        lo = Math.Max(IncompleteGamma.Quantile(kernel, tailMass, 1.0 - tailMass, coarse) / Rate, 1e-300);
        hi = IncompleteGamma.Quantile(kernel, 1.0 - tailMass, tailMass, coarse) / Rate;
        aboveLowerBound = lo;
        belowUpperBound = double.PositiveInfinity;
    }

    double IQuadratureProfile.PanelWidth(double x, bool forward)
    {
        double w = PanelRules.StdDevMultiple * StdDev;
        if (!PanelRules.IsInteger(Shape)) w = Math.Min(w, PanelRules.NearBranchPoint(x, awayFromIt: forward));
        return w;
    }

    void IQuadratureProfile.Evaluate(double x, out double density, out double cdf, out double upperTail)
    {
        kernel.Evaluate(Rate * x, out double standardDensity, out cdf, out upperTail);
        density = Rate * standardDensity;
    }

    void IQuadratureProfile.EvaluateMany(ReadOnlySpan<double> x, Span<double> density, Span<double> cdf, Span<double> upperTail)
    {
        Span<double> standard = x.Length <= 64 ? stackalloc double[x.Length] : new double[x.Length];
        for (int j = 0; j < x.Length; j++) standard[j] = Rate * x[j];
        kernel.EvaluateMany(standard, density, cdf, upperTail);
        for (int j = 0; j < x.Length; j++) density[j] = Rate * density[j];
    }

    public bool Equals(GammaMarginal? other) => other is not null && Shape.Equals(other.Shape) && Rate.Equals(other.Rate);

    public override bool Equals(object? obj) => Equals(obj as GammaMarginal);

    public override int GetHashCode() => HashCode.Combine(typeof(GammaMarginal), Shape, Rate);

    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"Gamma({Shape:R}, {Rate:R})");
}
