using DesignCompiler.Numerics;

namespace DesignCompiler.Tests.Numerics;

/// <summary>
/// The exact finite sum for P(X &gt; Y), X ~ Beta(a,b), Y ~ Beta(c,d) with integer parameters: an oracle for
/// the two-arm case that shares no code path with the quadrature.
/// </summary>
/// <remarks>
/// E. Miller (2015), "Formulas for Bayesian A/B testing": P(p_B &gt; p_A) = Σ_{i=0}^{α_B−1} B(α_A+i, β_A+β_B) /
/// [(β_B+i) B(1+i, β_B) B(α_A, β_A)]; equivalent to J. D. Cook (2005), "Exact calculation of beta
/// inequalities", UT M. D. Anderson Tech. Rep. UTMDABTR-005-05. The symmetries g(a,b,c,d) = 1 − g(c,d,a,b)
/// = g(d,c,b,a) (W. R. Thompson 1933, via Cook) put the smallest parameter in the summation slot
/// (REFERENCES.md §2). Terms are formed from log-Beta values because Γ overflows at these counts.
/// </remarks>
internal static class BetaInequality
{
    public static double ProbabilityGreater(int a, int b, int c, int d)
    {
        int smallest = Math.Min(Math.Min(a, b), Math.Min(c, d));
        if (smallest == a) return MillerSum(a, b, c, d);
        if (smallest == c) return 1.0 - MillerSum(c, d, a, b);
        if (smallest == d) return MillerSum(d, c, b, a);
        return 1.0 - MillerSum(b, a, d, c);
    }

    // P(Beta(a,b) > Beta(c,d)) as a sum of a positive terms.
    private static double MillerSum(int a, int b, int c, int d)
    {
        double sum = 0, compensation = 0;
        double logDenominatorConstant = SpecialFunctions.LogBeta(c, d);
        for (int i = 0; i < a; i++)
        {
            double logTerm = SpecialFunctions.LogBeta(c + i, b + d) - Math.Log(b + i)
                - SpecialFunctions.LogBeta(1 + i, b) - logDenominatorConstant;
            // Kahan summation: thousands of terms of mixed size.
            double y = Math.Exp(logTerm) - compensation;
            double t = sum + y;
            compensation = (t - sum) - y;
            sum = t;
        }
        return sum;
    }
}
