namespace DesignCompiler.Randomness;

/// <summary>
/// ln(k!) for the acceptance tests of the discrete samplers. The base library has no
/// log-gamma, and the samplers only need integer arguments.
/// </summary>
internal static class LogFactorial
{
    private const double HalfLogTwoPi = 0.91893853320467274178032973640562;

    /// <summary>
    /// Exact product (then one logarithm) up to 20!, which a double holds exactly; above that the
    /// Stirling series for ln Γ(k+1) with terms to z^-7. The first omitted term is below
    /// 1/(1188 z^9), under 1e-15 for z ≥ 22, which is finer than the rounding of the leading
    /// terms themselves.
    /// </summary>
    public static double Of(int k)
    {
        if (k < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(k), k, "Factorials of negative numbers are undefined.");
        }

        if (k <= 20)
        {
            double product = 1.0;
            for (int i = 2; i <= k; i++)
            {
                product *= i;
            }

            return Math.Log(product);
        }

        double z = k + 1.0;
        double inverse = 1.0 / z;
        double inverseSquared = inverse * inverse;
        double series = inverse * (1.0 / 12.0 - inverseSquared * (1.0 / 360.0 - inverseSquared * (1.0 / 1260.0 - inverseSquared * (1.0 / 1680.0))));
        return (z - 0.5) * Math.Log(z) - z + HalfLogTwoPi + series;
    }
}
