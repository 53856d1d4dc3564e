namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// P(lower ≤ X ≤ upper) for X multivariate normal N(μ, Σ) or multivariate t (μ + Z/√(χ²_ν/ν), Z ~ N(0, Σ)),
/// by Genz's separation of variables with prioritised variable order, integrated by a randomised Richtmyer
/// rule until three standard errors over the shifts are within the accuracy asked (or the point budget ends).
/// </summary>
/// <remarks>
/// Methods: A. Genz (1992), "Numerical computation of multivariate normal probabilities", J. Comput. Graph.
/// Statist. 1:141–149; A. Genz and F. Bretz (2002), "Comparison of methods for the computation of multivariate
/// t probabilities", J. Comput. Graph. Statist. 11:950–971; A. Genz and F. Bretz (2009), Computation of
/// Multivariate Normal and t Probabilities, Springer. The t's chi variable is mapped as <see cref="ChiScale"/>
/// explains. Deterministic: the same arguments give the same bits (see <see cref="RichtmyerPoints"/> for the seed).
/// </remarks>
public static class RectangleProbability
{
    public static LatticeEstimate Compute(
        IReadOnlyList<double> location, double[,] scale, double degreesOfFreedom,
        IReadOnlyList<double> lower, IReadOnlyList<double> upper, LatticeSettings? settings = null)
    {
        ArgumentNullException.ThrowIfNull(location);
        ArgumentNullException.ThrowIfNull(lower);
        ArgumentNullException.ThrowIfNull(upper);
        settings ??= LatticeSettings.Default;
        settings.Validate();
        int m = location.Count;
        if (m == 0) throw new ArgumentException("At least one variable is needed.", nameof(location));
        if (lower.Count != m || upper.Count != m) throw new ArgumentException("The limits need one entry per variable.");
        ScaleMatrix.Validate(scale, m, nameof(scale));
        ScaleMatrix.SemidefiniteFactor(scale, nameof(scale));
        DegreesOfFreedom.Validate(degreesOfFreedom, nameof(degreesOfFreedom));
        var a = new double[m];
        var b = new double[m];
        for (int j = 0; j < m; j++)
        {
            if (!double.IsFinite(location[j])) throw new ArgumentException($"Location {j} is not finite.", nameof(location));
            if (double.IsNaN(lower[j]) || double.IsNaN(upper[j])) throw new ArgumentException($"Limit {j} is NaN.");
            if (lower[j] > upper[j]) return new LatticeEstimate(0.0, 0.0, 0, true);
            a[j] = lower[j] - location[j];
            b[j] = upper[j] - location[j];
        }
        var problem = PrioritisedCholesky.Factor(scale, a, b, []);
        var chi = LatticeRun.NeedsChi(problem, degreesOfFreedom) ? ChiScale.For(degreesOfFreedom) : null;
        var run = new LatticeRun(problem, degreesOfFreedom, chi, settings);
        Refine(run, settings);
        double error = run.ProbabilityError;
        return new LatticeEstimate(Math.Clamp(run.Probability, 0.0, 1.0), error, run.PointsPerShift, error <= settings.Accuracy);
    }

    /// <summary>Doubles the points per shift until the error estimate is within the accuracy or the budget is spent.</summary>
    internal static void Refine(LatticeRun run, LatticeSettings settings)
    {
        if (run.IsExact) return;
        long n = Math.Max(run.PointsPerShift, settings.FirstPointsPerShift);
        run.ExtendTo(n);
        while (run.ProbabilityError > settings.Accuracy && n < settings.MaxPointsPerShift)
        {
            n = Math.Min(2 * n, settings.MaxPointsPerShift);
            run.ExtendTo(n);
        }
    }
}
