namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// A problem with one column is a univariate one, solved exactly by the normal or Student-t CDF (two arms, or
/// any number of arms that all move together). With y the column's variable and T = y/s its t version,
/// P = P(lo ≤ T ≤ hi), and the moment E[T · 1{lo ≤ T ≤ hi}] = G(lo) − G(hi) with G = φ for the normal and
/// G(t) = (ν + t²)/(ν − 1) · f_ν(t) for the t (integrate t f_ν(t); the identity follows from
/// d/dt (1 + t²/ν)^{−(ν−1)/2} = −((ν−1)/ν) t (1 + t²/ν)^{−(ν+1)/2}). The moment exists only for ν &gt; 1.
/// </summary>
internal static class RankOneExact
{
    public static double Probability(SeparatedProblem problem, double degreesOfFreedom, out double moment)
    {
        problem.Interval(0, [], 1.0, out double lo, out double hi);
        moment = 0;
        if (!(lo < hi)) return 0.0;
        double m = problem.Moment is double[] coefficients ? coefficients[0] : 0.0;
        if (double.IsPositiveInfinity(degreesOfFreedom))
        {
            if (m != 0) moment = m * (StandardNormal.Pdf(lo) - StandardNormal.Pdf(hi));
            return Between(lo, hi, StandardNormal.UpperTail);
        }
        double df = degreesOfFreedom;
        if (m != 0) moment = m * (PartialMean(df, lo) - PartialMean(df, hi));
        return Between(lo, hi, t => StudentT.UpperTail(df, t));
    }

    // Differences of the tails on the side away from the centre, as in TruncatedNormal.
    private static double Between(double lo, double hi, Func<double, double> upperTail)
    {
        if (lo >= 0) return upperTail(lo) - upperTail(hi);
        if (hi <= 0) return upperTail(-hi) - upperTail(-lo);
        return 1.0 - upperTail(hi) - upperTail(-lo);
    }

    private static double PartialMean(double df, double t)
    {
        if (double.IsInfinity(t)) return df > 1 ? 0.0 : double.PositiveInfinity;
        if (df <= 1) return double.PositiveInfinity;
        double density = new StudentTMarginal(df, 0.0, 1.0).Density(t);
        return (df + t * t) / (df - 1.0) * density;
    }
}
