using DesignCompiler.Binding;

namespace DesignCompiler.Planning.Families;

/// <summary>The conjugate model for each outcome family.</summary>
public static class OutcomeModels
{
    public static IOutcomeModel For(OutcomeSpec outcome) => outcome.Family switch
    {
        OutcomeFamily.Bernoulli => new BetaBinomialModel(1),
        OutcomeFamily.Binomial => new BetaBinomialModel(outcome.Trials),
        OutcomeFamily.Normal when outcome.NoiseSd is { } sd => new NormalKnownNoiseModel(sd),
        OutcomeFamily.Normal => new NormalUnknownNoiseModel(),
        _ => new GammaPoissonModel(),
    };
}
