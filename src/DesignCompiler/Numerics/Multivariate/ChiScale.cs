namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// The extra variable of the multivariate t (Genz and Bretz 2002, J. Comput. Graph. Statist. 11:950–971,
/// §2): X = Z / s with Z multivariate normal and s = √(χ²_ν/ν), so a t probability is the normal one with
/// every limit multiplied by s, averaged over s. This maps one lattice coordinate w ∈ (0, 1) to s and a weight.
/// </summary>
/// <remarks>
/// Genz and Bretz put s = χ_ν⁻¹(w)/√ν. Inverting the chi distribution costs 5–400 µs a point here (more as ν
/// grows), far more than the rest of the integrand, so instead u = ln s is drawn from a logistic density
/// (location 0, the mode of ln s; scale σ) by u = σ ln(w/(1 − w)), and the point carries the weight
/// f(u)/g(u): the exact density of ln s over the logistic one. E[weight · F(s)] = E[F(s)] exactly, so nothing
/// is approximated; it is importance sampling on one coordinate, smooth in w and zero at both ends.
/// ln f(u) = ln 2 + a ln a − ln Γ(a) + 2au − a e^{2u}, a = ν/2 (from the χ² density). σ = 1/(2√ν) matches the
/// curvature of ln f at its mode; below ν = 4 it is 1/ν so that the logistic's left tail (rate 1/σ) is no
/// lighter than f's (rate ν). Then the weight stays below 2.8 for every ν (checked numerically for ν from 0.3
/// to 1e8; E[weight] under f, the factor by which this coordinate's share of the variance can grow, stays below 1.9).
/// </remarks>
internal readonly struct ChiScale
{
    private readonly double halfDf;
    private readonly double logisticScale;

    // ln 2 + a ln a − a − ln Γ(a) + ln σ: the constant part of ln(f/g), with the huge terms of a ln a and
    // ln Γ(a) cancelled analytically (Stirling) for large a so that ν up to 1e300 keeps its digits.
    private readonly double logConstant;

    public ChiScale(double degreesOfFreedom)
    {
        halfDf = 0.5 * degreesOfFreedom;
        logisticScale = degreesOfFreedom >= 4 ? 0.5 / Math.Sqrt(degreesOfFreedom) : 1.0 / degreesOfFreedom;
        double a = halfDf;
        double constant = a >= SpecialFunctions.StirlingThreshold
            ? Math.Log(2.0) + 0.5 * Math.Log(a) - SpecialFunctions.HalfLogTwoPi - StirlingSeries.Correction(a)
            : Math.Log(2.0) + a * Math.Log(a) - a - SpecialFunctions.LogGamma(a);
        logConstant = constant + Math.Log(logisticScale);
    }

    /// <summary>s and the weight f/g for the lattice coordinate w (clamped into the open interval).</summary>
    public void Map(double w, out double scale, out double weight)
    {
        w = Math.Clamp(w, RichtmyerPoints.Epsilon, 1.0 - RichtmyerPoints.Epsilon);
        double oneMinusW = 1.0 - w;
        double u = logisticScale * Math.Log(w / oneMinusW);
        scale = Math.Exp(u);
        // a (e^{2u} − 1 − 2u), with e^{2u} − 1 from expm1 so that large ν (tiny u) does not cancel.
        double curvature = halfDf * (SpecialFunctions.Expm1(2.0 * u) - 2.0 * u);
        weight = Math.Exp(logConstant - curvature - Math.Log(w * oneMinusW));
    }
}
