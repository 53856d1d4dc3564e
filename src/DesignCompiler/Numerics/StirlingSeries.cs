namespace DesignCompiler.Numerics;

/// <summary>
/// The remainder δ(x) = ln Γ(x) − [(x − ½) ln x − x + ½ ln 2π] for x ≥ 10. Keeping it separate lets
/// log-beta and the incomplete-function prefactors cancel the large Stirling terms analytically.
/// </summary>
internal static class StirlingSeries
{
    // B_{2k} / (2k(2k−1)) for k = 1..10 (DLMF 5.11.1). Ten terms are below 1e-18 relative at x = 10.
    internal static double Correction(double x)
    {
        double r = 1.0 / x, r2 = r * r;
        double sum = -174611.0 / 125400.0;
        sum = sum * r2 + 43867.0 / 244188.0;
        sum = sum * r2 - 3617.0 / 122400.0;
        sum = sum * r2 + 1.0 / 156.0;
        sum = sum * r2 - 691.0 / 360360.0;
        sum = sum * r2 + 1.0 / 1188.0;
        sum = sum * r2 - 1.0 / 1680.0;
        sum = sum * r2 + 1.0 / 1260.0;
        sum = sum * r2 - 1.0 / 360.0;
        sum = sum * r2 + 1.0 / 12.0;
        return sum * r;
    }
}
