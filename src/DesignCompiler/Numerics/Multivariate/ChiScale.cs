namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// The extra variable of the multivariate t (Genz and Bretz 2002, J. Comput. Graph. Statist. 11:950–971,
/// §2): X = Z / s with Z multivariate normal and s = √(χ²_ν/ν), so a t probability is the normal one with
/// every limit multiplied by s, averaged over s. This maps one lattice coordinate w ∈ (0, 1) to s and a weight.
/// Built once per ν and shared by every orthant of a computation; immutable.
/// </summary>
/// <remarks>
/// <para>For 0.5 ≤ ν ≤ 1e7, as Genz and Bretz do, s is the inverse chi CDF at w (weight 1). Inverting per point
/// would cost 5–70 µs here, more than the rest of the integrand, so the inverse is tabulated: u = ln s as a
/// function of t = ln(w/(1 − w)) is smooth (linear in the far left tail, slowly varying in the right), and is held
/// as Chebyshev series on 24 pieces of t ∈ [−42, 42] (which covers every w the lattice produces), interpolated at
/// 16 nodes per piece from <see cref="IncompleteGamma"/>'s inverse with both tails given (384 inversions, a few
/// milliseconds). The relative error in s is at most 3.3e-10 (at ν = 0.5; 1e-11 from ν = 1, 2e-15 at ν = 1e7,
/// measured against the inverse itself on 4001 points); the bias that puts into a probability is of the same order,
/// far under any accuracy asked.</para>
/// <para>Outside that range (ν &lt; 0.5, where the smallest nodes underflow, or ν &gt; 1e7, where the inversions
/// slow down), u is instead drawn from a logistic density (location 0, the mode of ln s; scale σ) by
/// u = σ ln(w/(1 − w)), and the point carries the weight f(u)/g(u), the exact density of ln s over the logistic's:
/// importance sampling on one coordinate, exact in expectation. ln f(u) = ln 2 + a ln a − ln Γ(a) + 2au − a e^{2u},
/// a = ν/2 (from the χ² density). σ = 1/(2√ν) matches the curvature of ln f at its mode; below ν = 4 it is 1/ν so
/// that the logistic's left tail is no lighter than f's. The weight then stays below 2.8 (checked numerically for
/// ν from 0.3 to 1e8), but it is less smooth near w = 0 than the inverse, which costs the lattice rule a factor of
/// 2–4 in error at moderate ν; at ν &gt; 1e7 the weight is within 13 % of 1 and smooth.</para>
/// </remarks>
internal sealed partial class ChiScale
{
    private const double TabulatedMin = 0.5;
    private const double TabulatedMax = 1e7;
    private const double Reach = 42.0;
    private const int Pieces = 24;
    private const int Nodes = 16;

    private readonly double halfDf;
    private readonly double[][]? pieces;
    private readonly double logisticScale;
    private readonly double logConstant;

    /// <summary>Tables already built, by degrees of freedom; a simulation meets the same few ν in every trial.</summary>
    private static readonly System.Collections.Concurrent.ConcurrentDictionary<double, ChiScale> Built = new();

    /// <summary>Enough for every ν of a long trial's rounds and designs side by side; past it, tables are built and not kept.</summary>
    private const int MaxKept = 256;

    /// <summary>
    /// The chi variable for ν, shared: a table is 24 pieces of 16 exact gamma quantiles, which cost more than
    /// the lattice points of a small problem. A shared one is immutable and gives the bits a new one would.
    /// </summary>
    public static ChiScale For(double degreesOfFreedom)
    {
        if (Built.TryGetValue(degreesOfFreedom, out var kept)) return kept;
        var built = new ChiScale(degreesOfFreedom);
        return Built.Count < MaxKept ? Built.GetOrAdd(degreesOfFreedom, built) : built;
    }

    public ChiScale(double degreesOfFreedom)
    {
        halfDf = 0.5 * degreesOfFreedom;
        if (degreesOfFreedom >= TabulatedMin && degreesOfFreedom <= TabulatedMax)
        {
            pieces = Tabulate(degreesOfFreedom);
            termsByLane = TermsByLane(pieces);
            return;
        }
        logisticScale = degreesOfFreedom >= 4 ? 0.5 / Math.Sqrt(degreesOfFreedom) : 1.0 / degreesOfFreedom;
        double a = halfDf;
        // ln 2 + a ln a − a − ln Γ(a) + ln σ, with the large terms of a ln a and ln Γ(a) cancelled analytically
        // (Stirling) for large a so that huge ν keeps its digits.
        double constant = a >= SpecialFunctions.StirlingThreshold
            ? Math.Log(2.0) + 0.5 * Math.Log(a) - SpecialFunctions.HalfLogTwoPi - StirlingSeries.Correction(a)
            : Math.Log(2.0) + a * Math.Log(a) - a - SpecialFunctions.LogGamma(a);
        logConstant = constant + Math.Log(logisticScale);
    }

    /// <summary>True when s is the tabulated inverse chi CDF (weight 1); false for the weighted logistic map.</summary>
    public bool IsInverse => pieces is not null;

    /// <summary>s and the weight for the lattice coordinate w (clamped into the open interval).</summary>
    public void Map(double w, out double scale, out double weight)
    {
        w = Math.Clamp(w, RichtmyerPoints.Epsilon, 1.0 - RichtmyerPoints.Epsilon);
        double oneMinusW = 1.0 - w;
        if (pieces is not null)
        {
            // The repeatable log and exp: their lane forms (MapLanes) have the same bits.
            double logit = RepeatableMath.Log(w / oneMinusW);
            double position = (Math.Clamp(logit, -Reach, Reach) + Reach) / (2 * Reach) * Pieces;
            int piece = Math.Min((int)position, Pieces - 1);
            scale = RepeatableMath.Exp(Clenshaw(pieces[piece], 2.0 * (position - piece) - 1.0));
            weight = 1.0;
            return;
        }
        double t = Math.Log(w / oneMinusW);
        double u = logisticScale * t;
        scale = Math.Exp(u);
        // a (e^{2u} − 1 − 2u), with e^{2u} − 1 from expm1 so that large ν (tiny u) does not cancel.
        double curvature = halfDf * (SpecialFunctions.Expm1(2.0 * u) - 2.0 * u);
        weight = Math.Exp(logConstant - curvature - Math.Log(w * oneMinusW));
    }

    // Chebyshev coefficients of u(t) on each piece, from the exact inverse at the Chebyshev nodes.
    private static double[][] Tabulate(double degreesOfFreedom)
    {
        var kernel = new GammaKernel(0.5 * degreesOfFreedom);
        double logHalfDf = Math.Log(0.5 * degreesOfFreedom);
        var table = new double[Pieces][];
        var values = new double[Nodes];
        double width = 2 * Reach / Pieces;
        for (int p = 0; p < Pieces; p++)
        {
            double centre = -Reach + (p + 0.5) * width;
            for (int k = 0; k < Nodes; k++)
            {
                double t = centre + 0.5 * width * Math.Cos(Math.PI * (k + 0.5) / Nodes);
                // w = 1/(1 + e^−t) and 1 − w = 1/(1 + e^t), each formed directly so neither is a rounded complement.
                double lower = 1.0 / (1.0 + Math.Exp(-t)), upper = 1.0 / (1.0 + Math.Exp(t));
                double x = IncompleteGamma.Quantile(kernel, lower, upper, IncompleteBeta.FullPrecision);
                // χ² = 2x for x ~ Gamma(ν/2), so s² = 2x/ν = x/(ν/2).
                values[k] = 0.5 * (Math.Log(x) - logHalfDf);
            }
            var coefficients = new double[Nodes];
            for (int j = 0; j < Nodes; j++)
            {
                double sum = 0;
                for (int k = 0; k < Nodes; k++) sum += values[k] * Math.Cos(Math.PI * j * (k + 0.5) / Nodes);
                coefficients[j] = 2.0 * sum / Nodes;
            }
            coefficients[0] *= 0.5;
            table[p] = coefficients;
        }
        return table;
    }

    private static double Clenshaw(double[] c, double x)
    {
        double b1 = 0, b2 = 0, twoX = 2.0 * x;
        for (int j = c.Length - 1; j >= 1; j--)
        {
            double b0 = Math.FusedMultiplyAdd(twoX, b1, c[j] - b2);
            b2 = b1;
            b1 = b0;
        }
        return Math.FusedMultiplyAdd(x, b1, c[0] - b2);
    }
}
