using DesignCompiler.Binding;
using DesignCompiler.Numerics;
using DesignCompiler.Randomness;

namespace DesignCompiler.Simulation.Running;

/// <summary>
/// The field effects of a robustness scenario for one simulated trial: a shift per block for the
/// whole trial, a season shift shared by every arm and an interaction shift per arm, both new each
/// round, lost plots, and gamma mixing of count means. Shifts act on the family's natural scale
/// (identity for normal, log for counts, logit for bernoulli and binomial), so a shifted θ always
/// stays in the family's support. The true θ that ranks arms (and defines regret) is not shifted:
/// the shifts are the weather and the soil, not the treatments. Draws come in a fixed order from
/// the trial's own field stream, so two designs compared on a scenario see the same seasons and fields.
/// </summary>
public sealed class FieldShifts
{
    private readonly CheckedDesign _design;
    private readonly double[] _block;
    private readonly double[] _arm;
    private readonly Xoshiro256StarStar[] _missing;
    private FieldEffects _effects = FieldEffects.None;
    private Xoshiro256StarStar _field;
    private double _season;

    public FieldShifts(CheckedDesign design)
    {
        _design = design;
        _block = new double[design.Blocks.Count];
        _arm = new double[design.Arms.Count];
        _missing = new Xoshiro256StarStar[design.Arms.Count];
    }

    public bool Active => _effects.Any;

    /// <summary>Draws the block shifts and readies the streams for one simulated trial.</summary>
    public void BeginTrial(FieldEffects effects, ulong seed, long replication, ulong scenarioKey)
    {
        _effects = effects;
        Array.Clear(_block);
        Array.Clear(_arm);
        _season = 0;
        if (!effects.Any) return;
        _field = SimulationStreams.Field(seed, replication, scenarioKey);
        for (var j = 0; j < _block.Length; j++) _block[j] = effects.BlockSd * Samplers.StandardNormal(ref _field);
        for (var i = 0; i < _missing.Length; i++)
            _missing[i] = SimulationStreams.Missing(seed, replication, scenarioKey, _design.Arms[i].Code);
    }

    /// <summary>Draws the round's season shift and each arm's interaction shift (always both, so the order never changes).</summary>
    public void BeginRound()
    {
        if (!_effects.Any) return;
        _season = _effects.SeasonSd * Samplers.StandardNormal(ref _field);
        for (var i = 0; i < _arm.Length; i++) _arm[i] = _effects.InteractionSd * Samplers.StandardNormal(ref _field);
    }

    /// <summary>θ of arm <paramref name="arm"/> on a plot of block <paramref name="block"/> this round.</summary>
    public double Theta(int arm, int block, double theta)
    {
        if (!_effects.Any) return theta;
        var shift = _season + _arm[arm] + _block[block];
        if (shift == 0) return theta;
        return _design.Outcome.Family switch
        {
            OutcomeFamily.Normal => theta + shift,
            OutcomeFamily.Count => theta * Math.Exp(shift),
            _ => Logistic(Logit(theta) + shift),
        };
    }

    /// <summary>A count plot's Poisson mean after gamma mixing (mean kept, variance μ + μ²/k).</summary>
    public double MixCount(int arm, double mean, ref Xoshiro256StarStar rng) =>
        _effects.Dispersion is { } k ? mean * Samplers.Gamma(ref rng, k) / k : mean;

    /// <summary>True when this plot of the arm is lost before harvest (one draw per sown plot, from the arm's own stream).</summary>
    public bool IsLost(int arm)
    {
        var share = _effects.MissingFor(arm);
        return share > 0 && _missing[arm].NextDouble() < share;
    }

    private static double Logit(double p) => Math.Log(p) - SpecialFunctions.Log1p(-p);

    private static double Logistic(double x) => x >= 0 ? 1 / (1 + Math.Exp(-x)) : Math.Exp(x) / (1 + Math.Exp(x));
}
