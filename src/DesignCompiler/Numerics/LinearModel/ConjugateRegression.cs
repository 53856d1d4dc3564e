namespace DesignCompiler.Numerics.LinearModel;

/// <summary>
/// The closed-form posterior of the normal linear model under its conjugate normal–inverse-gamma prior.
/// </summary>
/// <remarks>
/// With Λ0 = V0⁻¹ (Wikipedia, "Bayesian linear regression", section "With conjugate priors", seen in a mirror copy;
/// the same result is in O'Hagan &amp; Forster, <i>Kendall's Advanced Theory of Statistics</i> 2B, from memory):
/// Λn = Λ0 + XᵀX, m_n = Λn⁻¹(Λ0·m0 + Xᵀy), V_n = Λn⁻¹, a_n = a0 + n/2 and
/// b_n = b0 + ½(yᵀy + m0ᵀΛ0m0 − m_nᵀΛn·m_n). The last is computed in the equivalent form
/// b0 + ½[(y − X·m_n)ᵀ(y − X·m_n) + (m_n − m0)ᵀΛ0(m_n − m0)], a sum of two non-negative terms, because the first
/// form subtracts numbers of the size of Σy² (about 10⁹ for yields in kg/ha) to leave one of the size of the residuals.
/// </remarks>
public static class ConjugateRegression
{
    // Under the flat prior, coefficient j is identified when no dependent column needs it: the coefficient
    // W[j, d] of column j in dependent column d, made scale-free by the two columns' lengths, is rounding noise.
    private const double IdentificationTolerance = 1e-8;

    private const double ExactFit = 1e-24;

    /// <summary>The posterior given the design matrix X (n × p) and the outcomes y (n).</summary>
    public static RegressionPosterior Update(NormalInverseGammaPrior prior, double[,] x, IReadOnlyList<double> y)
    {
        ArgumentNullException.ThrowIfNull(prior);
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        int n = x.GetLength(0), p = x.GetLength(1);
        if (p != prior.Coefficients) throw new ArgumentException("X must have one column per coefficient of the prior.", nameof(x));
        if (y.Count != n) throw new ArgumentException("y must have one entry per row of X.", nameof(y));
        var outcomes = y.ToArray();
        if (outcomes.Any(v => !double.IsFinite(v))) throw new ArgumentException("Every outcome must be finite.", nameof(y));

        var gram = DenseMatrix.Gram(x);
        var precision = new double[p, p];
        var priorPrecision = prior.PrecisionMatrix;
        for (int i = 0; i < p; i++)
            for (int j = 0; j < p; j++) precision[i, j] = priorPrecision[i, j] + gram[i, j];
        var rhs = DenseMatrix.TransposeTimes(x, outcomes);
        var priorPull = DenseMatrix.Times(priorPrecision, prior.MeanVector);
        for (int i = 0; i < p; i++) rhs[i] += priorPull[i];

        // A proper prior makes Λn positive definite however the data fall, so only the flat prior looks for dependent
        // columns; a prior precision many orders below the data's (an sd 10⁶ times the noise) must not count as none.
        var factor = Cholesky.Factor(precision, prior.IsFlat ? Cholesky.DependenceTolerance : 0);
        if (!prior.IsFlat && !factor.IsPositiveDefinite)
            throw new InvalidOperationException("Λ0 + XᵀX lost positive definiteness: the prior precision vanishes against the data's.");
        var mean = factor.Solve(rhs);
        var covariance = factor.Inverse();
        var estimable = prior.IsFlat ? Identified(factor, gram) : Enumerable.Repeat(true, p).ToArray();

        var fitted = DenseMatrix.Times(x, mean);
        double residualSquares = 0;
        for (int r = 0; r < n; r++) residualSquares += (outcomes[r] - fitted[r]) * (outcomes[r] - fitted[r]);
        // Under the flat prior an exact fit has no noise to estimate; what rounding leaves of its residuals (relative
        // 1e-32 of Σy²) must not pass for a tiny noise variance.
        if (prior.IsFlat && residualSquares <= ExactFit * outcomes.Sum(v => v * v)) residualSquares = 0;
        var shift = new double[p];
        for (int i = 0; i < p; i++) shift[i] = mean[i] - prior.Mean(i);
        double priorSquares = prior.IsFlat ? 0 : DenseMatrix.QuadraticForm(priorPrecision, shift);

        double shape0 = prior.IsFlat ? -0.5 * factor.Rank : prior.Shape;
        double shape = shape0 + 0.5 * n;
        double scale = prior.Scale + 0.5 * (residualSquares + priorSquares);
        // ln p(y) = −(n/2)ln 2π + ½ ln(det Λ0/det Λn) + a0 ln b0 − a_n ln b_n + ln Γ(a_n) − ln Γ(a0)
        // (the model evidence of the same article; formula from memory, checked in the tests against the
        // multivariate-t density of y, which is an independent route to the same number).
        double? logEvidence = prior.IsFlat
            ? null
            : -0.5 * n * Math.Log(2 * Math.PI)
              + 0.5 * (Cholesky.Factor(priorPrecision).LogDeterminant - factor.LogDeterminant)
              + prior.Shape * Math.Log(prior.Scale) - shape * Math.Log(scale)
              + SpecialFunctions.LogGamma(shape) - SpecialFunctions.LogGamma(prior.Shape);
        return new RegressionPosterior(n, factor.Rank, mean, covariance, estimable, shape, scale, residualSquares, logEvidence);
    }

    // e_j is estimable exactly when it is orthogonal to the null space of XᵀX. Each dependent column d gives one
    // null vector: 1 at d and −W[·, d] on the kept columns, with W[·, d] = (X_SᵀX_S)⁻¹X_SᵀX_d. So a dependent
    // coefficient is never identified, and a kept one is identified when every W[j, d] vanishes. This holds
    // whichever columns the factorisation happened to keep.
    private static bool[] Identified(Cholesky factor, double[,] gram)
    {
        int p = factor.Size;
        var identified = new bool[p];
        for (int j = 0; j < p; j++) identified[j] = !factor.IsDependent(j);
        var column = new double[p];
        for (int d = 0; d < p; d++)
        {
            if (!factor.IsDependent(d) || gram[d, d] == 0) continue;
            for (int i = 0; i < p; i++) column[i] = gram[i, d];
            var w = factor.Solve(column);
            for (int j = 0; j < p; j++)
                if (identified[j] && Math.Abs(w[j]) * Math.Sqrt(gram[j, j] / gram[d, d]) > IdentificationTolerance)
                    identified[j] = false;
        }
        return identified;
    }
}
