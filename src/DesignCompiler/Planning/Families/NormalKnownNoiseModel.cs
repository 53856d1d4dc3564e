using DesignCompiler.Binding;
using DesignCompiler.Numerics;

namespace DesignCompiler.Planning.Families;

/// <summary>
/// Normal outcomes with known plot-to-plot sd σ and a normal prior N(μ0, σ0²) on the mean:
/// precisions add, 1/σn² = 1/σ0² + n/σ², μn = σn²(μ0/σ0² + n·x̄/σ²) (K. P. Murphy 2007, §2).
/// </summary>
public sealed class NormalKnownNoiseModel(double noiseSd) : IOutcomeModel
{
    public double NoiseSd { get; } = noiseSd;

    public OutcomeFamily Family => OutcomeFamily.Normal;

    public IMarginal Posterior(PriorSpec prior, ArmStatistics data)
    {
        var normal = (NormalPriorSpec)prior;
        var priorPrecision = 1 / (normal.Sd * normal.Sd);
        var dataPrecision = data.Count / (NoiseSd * NoiseSd);
        var variance = 1 / (priorPrecision + dataPrecision);
        var mean = variance * (normal.Mean * priorPrecision + data.Sum / (NoiseSd * NoiseSd));
        return new NormalMarginal(mean, Math.Sqrt(variance));
    }

    public (bool Ok, string Rule) Accepts(double value) => NormalValues.Accepts(value);
}
