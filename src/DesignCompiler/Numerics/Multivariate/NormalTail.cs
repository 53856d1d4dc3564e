namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// The standard normal tail 1 − Φ(z) and its inverse, fast enough for the inner loop of the lattice rules,
/// where every point of a k-arm orthant needs k − 2 of each. <see cref="StandardNormal"/> is the accurate
/// general-purpose version (series and continued fractions); these are short Chebyshev series on fixed pieces,
/// several times faster, with relative error about 1e-15 wherever the tail is a normal double (z up to 37.5).
/// </summary>
/// <remarks>
/// Coefficients come from tests/DesignCompiler.Tests/Numerics/Multivariate/reference/fit_normal_tail.py and
/// fit_normal_quantile.py (mpmath, Chebyshev interpolation at 40 digits; each series cut where its coefficients
/// fall below 2e-18, or 1e-17 · max(1, z) for the quantile). The scripts print exactly the numbers below.
/// </remarks>
internal static partial class NormalTail
{
    private const double Shift = 4.0;

    // Past this the tail is below the smallest normal double (1e-308); returning 0 there loses nothing a
    // probability of the lattice rules could see.
    private const double Underflow = 37.5;

    // √(2 ln 2): t = √(−2 ln q) at q = ½, where the quantile's first piece starts.
    private const double CentreT = 1.1774100225154747;

    /// <summary>1 − Φ(z), to full relative accuracy in the right tail.</summary>
    public static double Upper(double z)
    {
        if (double.IsNaN(z)) return z;
        if (z < 0) return 1.0 - Upper(-z);
        if (z > Underflow) return 0.0;
        return UpperGivenDensity(z, Density(z));
    }

    private const double InvSqrtTwoPi = 0.39894228040143267793994605993438;

    /// <summary>
    /// φ(z) as <see cref="StandardNormal.Pdf"/> forms it (e^(−z²/2) with z² split into its rounded value and the
    /// rounding error), but with <see cref="RepeatableMath.Exp(double)"/>, which has a lane form with the same bits:
    /// the lattice rules evaluate eight points at once and need every lane to be the scalar value.
    /// </summary>
    internal static double Density(double z)
    {
        double hi = z * z;
        if (double.IsInfinity(hi)) return 0.0;
        double lo = Math.FusedMultiplyAdd(z, z, -hi);
        return InvSqrtTwoPi * (RepeatableMath.Exp(-0.5 * hi) * (1.0 - 0.5 * lo));
    }

    /// <summary><see cref="Upper"/> for z ≥ 0 when φ(z) is already known (exactly <see cref="StandardNormal.Pdf"/>'s value).</summary>
    internal static double UpperGivenDensity(double z, double density)
    {
        if (z > Underflow) return 0.0;
        return density * MillsTimesShift(z) / (z + Shift);
    }

    /// <summary>Φ(z), to full relative accuracy in the left tail.</summary>
    public static double Lower(double z) => Upper(-z);

    /// <summary>
    /// P(lower &lt; Z &lt; upper), formed from the two tails on the side away from the centre so that a
    /// narrow interval far out keeps its relative accuracy.
    /// </summary>
    public static double Between(double lower, double upper)
    {
        if (lower >= upper) return 0.0;
        if (lower >= 0) return Upper(lower) - Upper(upper);
        if (upper <= 0) return Upper(-upper) - Upper(-lower);
        return 1.0 - Upper(upper) - Upper(-lower);
    }

    /// <summary>
    /// The z with 1 − Φ(z) = q for 0 &lt; q ≤ ½ (z ≥ 0): with t = √(−2 ln q), z is a smooth function of t
    /// (near q = ½ it is proportional to t² − 2 ln 2), a Chebyshev series on eight pieces of t.
    /// </summary>
    public static double UpperQuantile(double q)
    {
        if (!(q > 0)) return double.PositiveInfinity;
        if (q >= 0.5) return 0.0;
        double t = Math.Sqrt(-2.0 * RepeatableMath.Log(q));
        if (t <= 2.0) return Math.Max(Chebyshev(Quantile0, t, CentreT, 2.0), 0.0);
        if (t <= 3.0) return Chebyshev(Quantile1, t, 2.0, 3.0);
        if (t <= 4.5) return Chebyshev(Quantile2, t, 3.0, 4.5);
        if (t <= 6.0) return Chebyshev(Quantile3, t, 4.5, 6.0);
        if (t <= 9.0) return Chebyshev(Quantile4, t, 6.0, 9.0);
        if (t <= 12.0) return Chebyshev(Quantile5, t, 9.0, 12.0);
        if (t <= 20.0) return Chebyshev(Quantile6, t, 12.0, 20.0);
        return Chebyshev(Quantile7, t, 20.0, 39.0);
    }

    // g(u) = (z + 4)(1 − Φ(z))/φ(z) with u = 4/(z + 4) ∈ (0, 1], on the four quarters of u.
    private static double MillsTimesShift(double z)
    {
        double u = Shift / (z + Shift);
        if (u <= 0.25) return Chebyshev(Mills0, u, 0.0, 0.25);
        if (u <= 0.5) return Chebyshev(Mills1, u, 0.25, 0.5);
        if (u <= 0.75) return Chebyshev(Mills2, u, 0.5, 0.75);
        return Chebyshev(Mills3, u, 0.75, 1.0);
    }

    // The series on [a, b] at t, by Clenshaw's recurrence in x = (2t − a − b)/(b − a), clamped into [−1, 1].
    private static double Chebyshev(ReadOnlySpan<double> c, double t, double a, double b)
    {
        double x = Math.Clamp((2.0 * t - a - b) / (b - a), -1.0, 1.0);
        double b1 = 0, b2 = 0, twoX = 2.0 * x;
        for (int j = c.Length - 1; j >= 1; j--)
        {
            double b0 = Math.FusedMultiplyAdd(twoX, b1, c[j] - b2);
            b2 = b1;
            b1 = b0;
        }
        return Math.FusedMultiplyAdd(x, b1, c[0] - b2);
    }

    // Mills pieces: u in [0, ¼], [¼, ½], [½, ¾], [¾, 1].
    private static ReadOnlySpan<double> Mills0 =>
    [
        1.1517379294116357, 0.1615331177917554, 0.01036263440080879, 0.0005959781299920538,
        2.969649972297098e-05, 1.1961784645353395e-06, 3.1763477478889235e-08, -8.591656943088382e-11,
        -6.467005193417375e-11, -3.349762481975958e-12, -2.177365033250377e-14, 7.778134906474763e-15,
        4.461365549925694e-16, -3.375287873847733e-18,
    ];

    private static ReadOnlySpan<double> Mills1 =>
    [
        1.5874068198658873, 0.2831800551248388, 0.021273603203483125, 0.0012975877046022073,
        5.941444473601921e-05, 1.6001542022365715e-06, -1.37606591313926e-08, -3.3450968723883135e-09,
        -8.857463133192411e-11, 4.749084628455181e-12, 3.244063995384097e-13, -6.216262694678629e-15,
        -9.87584451613973e-16, 8.877694898695413e-18, 3.13476561499723e-18,
    ];

    private static ReadOnlySpan<double> Mills2 =>
    [
        2.3860966443411895, 0.5339571811200254, 0.04345136818243001, 0.0024514024957889187,
        7.978942878460735e-05, 4.743186201751102e-08, -1.098443419478276e-07, -2.0873790021033925e-09,
        1.6554006477421897e-10, 4.491743908012314e-12, -3.352860034466887e-13, -6.81261246399418e-15,
        8.173654666484886e-16,
    ];

    private static ReadOnlySpan<double> Mills3 =>
    [
        3.9095243018448973, 1.0200284957515593, 0.08006920212337311, 0.00358425251384037,
        5.30197718166994e-05, -2.637479485618914e-06, -8.859238864456772e-08, 3.2319261305962077e-09,
        1.0238243752917482e-10, -5.8751550512045145e-12, -5.5083673338362756e-14, 1.0466021052089598e-14,
        -1.7815772233361556e-16, -1.2477648816590878e-17,
    ];

    // Quantile pieces: t in [√(2 ln 2), 2], [2, 3], [3, 4.5], [4.5, 6], [6, 9], [9, 12], [12, 20], [20, 39].
    private static ReadOnlySpan<double> Quantile0 =>
    [
        0.5623261949368686, 0.5497013588232277, -0.01146277110319853, 0.0010477807005669383,
        -0.00010246552949677763, 1.0548344355679947e-05, -1.129765045826757e-06, 1.2473597078230725e-07,
        -1.4097585128992096e-08, 1.6225463014676446e-09, -1.8945806008014869e-10, 2.2381937285615273e-11,
        -2.6697013735261744e-12, 3.210208949693285e-13, -3.886739772512687e-14, 4.733737044090987e-15,
        -5.795020495738026e-16, 7.126310848464227e-17,
    ];

    private static ReadOnlySpan<double> Quantile1 =>
    [
        1.7004320752614828, 0.5920786475495746, -0.006325412006683785, 0.0004687503869495419,
        -3.6434420210168504e-05, 2.9360139114476502e-06, -2.4368167597302355e-07, 2.0729245183090802e-08,
        -1.7998799257128193e-09, 1.5894848755630493e-10, -1.4233947126733921e-11, 1.2894262285897677e-12,
        -1.179320376710351e-13, 1.0873543500566792e-14, -1.0094706527617773e-15, 9.427257391351561e-17,
    ];

    private static ReadOnlySpan<double> Quantile2 =>
    [
        3.1210556319797194, 0.8282477561646886, -0.005704811802988059, 0.0004436653171229312,
        -3.581741007712783e-05, 2.9682707462744954e-06, -2.5113613743092544e-07, 2.1624383860282464e-08,
        -1.8908389944143435e-09, 1.6759352086481568e-10, -1.5032941499848772e-11, 1.3625786631325404e-12,
        -1.2462792396892796e-13, 1.148887005234106e-14, -1.06632654311883e-15, 9.955560816898362e-17,
    ];

    private static ReadOnlySpan<double> Quantile3 =>
    [
        4.743951978751398, 0.7972347080001372, -0.0025526228708213365, 0.00014626881113038632,
        -8.659616339351585e-06, 5.238448154225372e-07, -3.2198275842332933e-08, 2.004683437689364e-09,
        -1.261945567216858e-10, 8.022142229045904e-12, -5.145220553952154e-13, 3.3270039660482103e-14,
        -2.1673915872165927e-15, 1.421570541853098e-16,
    ];

    private static ReadOnlySpan<double> Quantile4 =>
    [
        7.098726084012477, 1.5552102833487234, -0.004348380769402332, 0.0003613590821369518,
        -3.0933071486619545e-05, 2.698983911917814e-06, -2.387041421328057e-07, 2.1330576907371887e-08,
        -1.922062321328361e-09, 1.7442300728626675e-10, -1.592745451417709e-11, 1.4626569505145084e-12,
        -1.3502253968245712e-13, 1.2525361595975203e-14, -1.167259498566968e-15, 1.092497236419276e-16,
    ];

    private static ReadOnlySpan<double> Quantile5 =>
    [
        10.183995526748022, 1.5321060039673273, -0.0018492823432981944, 0.00011191686049595528,
        -6.960408044687104e-06, 4.405381953760917e-07, -2.8227536474685844e-08, 1.8253374538947289e-09,
        -1.1888318271328634e-10, 7.7878475842011e-12, -5.126576139935847e-13, 3.38893009248161e-14,
        -2.2486209519189397e-15, 1.497053917048761e-16,
    ];

    private static ReadOnlySpan<double> Quantile6 =>
    [
        15.763695822832235, 4.044142604768055, -0.004624662680247363, 0.0005066954867276076,
        -5.690120299176154e-05, 6.4921128846311655e-06, -7.490265173086925e-07, 8.714046753347313e-08,
        -1.0203429177045697e-08, 1.2009291843835121e-09, -1.419488475442325e-10, 1.6838064722061163e-11,
        -2.0034265739081258e-12, 2.390027478302639e-13, -2.857895294704104e-14, 3.4245099510431156e-15,
        -4.111271628838742e-16,
    ];

    private static ReadOnlySpan<double> Quantile7 =>
    [
        29.348578076870123, 9.538542987550155, -0.005429951977362576, 0.0007954056468114657,
        -0.000119024684761913, 1.805605686304319e-05, -2.7655836825022458e-06, 4.266507584004123e-07,
        -6.618977451348438e-08, 1.0314887090384992e-08, -1.6134191785995957e-09, 2.5315086071727256e-10,
        -3.982544803403584e-11, 6.279613026031933e-12, -9.921308916318641e-13, 1.5702372325036998e-13,
        -2.4890643722529482e-14, 3.95102739906776e-15, -6.279524942454876e-16,
    ];
}
