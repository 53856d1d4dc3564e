using DesignCompiler.Binding;
using DesignCompiler.Randomness;

namespace DesignCompiler.Simulation.Running;

/// <summary>One plot's simulated outcome, from the design's outcome family and the arm's true θ and σ.</summary>
public static class OutcomeDraw
{
    public static double Draw(OutcomeSpec outcome, ref Xoshiro256StarStar rng, double theta, double sigma) => outcome.Family switch
    {
        OutcomeFamily.Bernoulli => rng.NextBernoulli(theta) ? 1 : 0,
        OutcomeFamily.Binomial => Samplers.Binomial(ref rng, outcome.Trials, theta),
        OutcomeFamily.Normal => Samplers.Normal(ref rng, theta, sigma),
        // A mean drawn from a wide gamma prior can, very rarely, exceed what the sampler takes.
        _ => Samplers.Poisson(ref rng, Math.Min(theta, Samplers.MaximumPoissonMean)),
    };
}
