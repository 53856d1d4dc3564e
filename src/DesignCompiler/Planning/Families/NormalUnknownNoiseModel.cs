using DesignCompiler.Binding;
using DesignCompiler.Numerics;

namespace DesignCompiler.Planning.Families;

/// <summary>
/// Normal outcomes with unknown noise: normal–inverse-gamma prior μ | σ² ~ N(μ0, σ²/κ0),
/// σ² ~ IG(α0, β0), mapped from the user's terms by <see cref="NormalPriorSpec.NormalInverseGamma"/>.
/// Update (K. P. Murphy 2007, §3.3, eqs. 86–89): κn = κ0 + n, μn = (κ0μ0 + n·x̄)/κn,
/// αn = α0 + n/2, βn = β0 + ½Σ(x − x̄)² + κ0·n·(x̄ − μ0)²/(2κn). The marginal posterior of
/// μ is Student-t with 2αn degrees of freedom, centre μn and scale √(βn/(αn·κn)).
/// </summary>
public sealed class NormalUnknownNoiseModel : IOutcomeModel
{
    public OutcomeFamily Family => OutcomeFamily.Normal;

    public IMarginal Posterior(PriorSpec prior, ArmStatistics data)
    {
        var (kappa, mu, alpha, beta) = Update((NormalPriorSpec)prior, data);
        return new StudentTMarginal(2 * alpha, mu, Math.Sqrt(beta / (alpha * kappa)));
    }

    /// <summary>The posterior's four parameters (κn, μn, αn, βn).</summary>
    public static (double Kappa, double Mu, double Alpha, double Beta) Update(NormalPriorSpec prior, ArmStatistics data)
    {
        var (mu0, kappa0, alpha0, beta0) = prior.NormalInverseGamma;
        var n = data.Count;
        if (n == 0) return (kappa0, mu0, alpha0, beta0);
        var mean = data.Mean;
        var kappa = kappa0 + n;
        var mu = (kappa0 * mu0 + n * mean) / kappa;
        var alpha = alpha0 + n / 2.0;
        var beta = beta0 + 0.5 * data.SumOfSquares + kappa0 * n * (mean - mu0) * (mean - mu0) / (2 * kappa);
        return (kappa, mu, alpha, beta);
    }

    public (bool Ok, string Rule) Accepts(double value) => NormalValues.Accepts(value);
}
