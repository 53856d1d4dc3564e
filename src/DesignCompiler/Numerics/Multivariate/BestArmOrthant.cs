namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// The event "arm i is best" as an orthant: D_j = θ_i − θ_j &gt; 0 for every rival j. With the contrast matrix A
/// (row j: +1 at i, −1 at j) D has location A μ and scale A Σ Aᵀ, entry (j, l) = Σ_ii − Σ_il − Σ_ji + Σ_jl,
/// so P(i best) = P(D − Aμ &gt; −Aμ). The free variable is θ_i − μ_i, with Cov(θ_i, D_j) = Σ_ii − Σ_ij, so the
/// same points give E[(θ_i − μ_i) · 1{i best}].
/// </summary>
internal static class BestArmOrthant
{
    public static SeparatedProblem Build(IReadOnlyList<double> location, double[,] scale, int arm, IReadOnlyList<int> rivals, bool withMoment)
    {
        int m = rivals.Count;
        var covariance = new double[m, m];
        var lower = new double[m];
        var upper = new double[m];
        var moment = withMoment ? new double[m] : [];
        double own = scale[arm, arm];
        for (int a = 0; a < m; a++)
        {
            int j = rivals[a];
            lower[a] = -(location[arm] - location[j]);
            upper[a] = double.PositiveInfinity;
            if (withMoment) moment[a] = own - scale[arm, j];
            for (int b = 0; b < m; b++)
            {
                int l = rivals[b];
                covariance[a, b] = own - scale[arm, l] - scale[j, arm] + scale[j, l];
            }
        }
        return PrioritisedCholesky.Factor(covariance, lower, upper, moment);
    }
}
