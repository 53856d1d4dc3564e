using DesignCompiler.Binding;
using DesignCompiler.Randomness;

namespace DesignCompiler.Simulation.Running;

/// <summary>
/// A scenario made ready to run: how to get each replication's true mean θ and plot-to-plot
/// sd σ for every arm. Fixed scenarios always give the same; <c>from prior</c> draws them
/// from each arm's prior. Immutable, shared by all threads.
/// </summary>
public sealed class ScenarioWorld
{
    private readonly CheckedDesign _design;
    private readonly double[]? _fixedMeans;
    private readonly double[]? _fixedNoise;

    public ScenarioWorld(CheckedDesign design, ScenarioSpec scenario, string? keyName = null)
    {
        _design = design;
        Effects = scenario.Effects;
        var arms = design.Arms.Count;
        if (!scenario.FromPrior)
        {
            _fixedMeans = scenario.TrueMeans.ToArray();
            _fixedNoise = new double[arms];
            for (var i = 0; i < arms; i++) _fixedNoise[i] = FixedNoise(design, scenario, i);
        }
        var values = _fixedMeans?.Select((theta, i) => ValueOf(design, i, theta)).ToList();
        Info = new ScenarioInfo(scenario.Name, keyName ?? scenario.Name, scenario.FromPrior, _fixedMeans, values,
            design.Outcome.Family == OutcomeFamily.Normal ? _fixedNoise : null);
        Key = SimulationStreams.Key(Info.KeyName);
    }

    public ScenarioInfo Info { get; }

    /// <summary>The scenario's season, block, missing-plot and dispersion departures.</summary>
    public FieldEffects Effects { get; }

    public ulong Key { get; }

    /// <summary>An arm's value in ranking units, larger is better: scale·θ − cost, as the planner ranks arms.</summary>
    public static double ValueOf(CheckedDesign design, int arm, double theta) =>
        design.Valuation.Scale * theta - design.Arms[arm].Cost;

    /// <summary>
    /// The true plot-to-plot sd of a fixed scenario: the scenario's <c>noise</c> when written (so a
    /// design that assumes one noise can be tried against another), else the design's known sd,
    /// else the arm's prior guess of the noise. Only normal outcomes use it.
    /// </summary>
    private static double FixedNoise(CheckedDesign design, ScenarioSpec scenario, int arm)
    {
        if (design.Outcome.Family != OutcomeFamily.Normal) return 0;
        if (scenario.NoiseSd is { } written) return written;
        if (design.Outcome.NoiseSd is { } known) return known;
        var prior = (NormalPriorSpec)design.Arms[arm].Prior;
        return prior.NoiseGuess ?? prior.Sd;
    }

    /// <summary>Fills θ and σ for one replication from its true-value stream.</summary>
    public void Draw(ref Xoshiro256StarStar rng, Span<double> theta, Span<double> sigma)
    {
        if (_fixedMeans is not null)
        {
            _fixedMeans.CopyTo(theta);
            _fixedNoise!.CopyTo(sigma);
            return;
        }
        for (var i = 0; i < _design.Arms.Count; i++)
            (theta[i], sigma[i]) = DrawFromPrior(ref rng, _design.Arms[i].Prior);
    }

    /// <summary>
    /// One arm's θ (and σ) from its prior: beta as is; gamma(shape, rate) as Gamma(shape)/rate;
    /// normal with known noise as N(m, s²) with the design's σ; normal with unknown noise from
    /// the normal–inverse-gamma prior the planner uses, σ² ~ IG(α0, β0) as β0/Gamma(α0), then
    /// θ | σ² ~ N(μ0, σ²/κ0) (K. P. Murphy 2007, §3).
    /// </summary>
    private (double Theta, double Sigma) DrawFromPrior(ref Xoshiro256StarStar rng, PriorSpec prior)
    {
        switch (prior)
        {
            case BetaPriorSpec beta:
                return (Samplers.Beta(ref rng, beta.A, beta.B), 0);
            case GammaPriorSpec gamma:
                return (Samplers.Gamma(ref rng, gamma.Shape) / gamma.Rate, 0);
            case NormalPriorSpec normal when _design.Outcome.NoiseSd is { } known:
                return (Samplers.Normal(ref rng, normal.Mean, normal.Sd), known);
            case NormalPriorSpec normal:
                var (mu0, kappa0, alpha0, beta0) = normal.NormalInverseGamma;
                var variance = beta0 / Samplers.Gamma(ref rng, alpha0);
                return (Samplers.Normal(ref rng, mu0, Math.Sqrt(variance / kappa0)), Math.Sqrt(variance));
            default:
                throw new InvalidOperationException("a prior kind the simulator does not know: " + prior.GetType().Name);
        }
    }
}
