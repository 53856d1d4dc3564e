using DesignCompiler.Analysis;
using DesignCompiler.Analysis.Adjusted;
using DesignCompiler.Binding;
using DesignCompiler.Numerics;

namespace DesignCompiler.Planning;

/// <summary>
/// The belief under <c>model adjusts for …</c>: every recorded plot of a normal outcome enters one
/// conjugate linear model y = arm + block + round + noise (<see cref="AdjustedModel"/>), and the
/// arms' values are jointly multivariate t. Arms sown more in a good season or on a better field
/// are then not mistaken for better arms.
/// </summary>
/// <remarks>
/// The prior comes from the design: each arm's normal(mean m, sd s); one noise sd for the whole
/// field, the root mean square of the arms' noise guesses (each defaulting to its prior sd), worth
/// the smallest of their 'worth W plots' (2 when none is written); block and round effects with
/// prior sd equal to the widest arm sd (<see cref="AdjustedModelPrior.Proper"/>). A known noise sd
/// (<c>normal noise sd S</c>) is the limit of a guess worth very many plots: here 10⁶, which
/// moves every figure by less than one part in a million.
/// </remarks>
internal static class AdjustedBelief
{
    /// <summary>Plots' worth that stands in for a known noise sd.</summary>
    private const double KnownNoiseWorth = 1e6;

    public static (IMarginal[] Posteriors, Joint Values) Fit(CheckedDesign design, TrialState state)
    {
        var arms = design.Arms.Count;
        var records = new PlotRecord[state.Observations.Count];
        for (var k = 0; k < records.Length; k++)
        {
            var o = state.Observations[k];
            records[k] = new PlotRecord(o.Arm, o.Block, o.Round, o.Value);
        }
        var fit = AdjustedModel.Fit(records, arms, Adjustment(design.Model), Prior(design));
        var joint = fit.ArmsJoint ?? throw new InvalidOperationException("a proper prior identifies every arm");
        var posteriors = new IMarginal[arms];
        var scale = design.Valuation.Scale;
        var location = new double[arms];
        var matrix = new double[arms, arms];
        for (var i = 0; i < arms; i++)
        {
            posteriors[i] = joint.Marginal(i);
            location[i] = scale * joint.Location(i) - design.Arms[i].Cost;
            for (var j = 0; j < arms; j++) matrix[i, j] = scale * scale * joint.Scale(i, j);
        }
        return (posteriors, new Joint(location, matrix, joint.Df));
    }

    private static ModelAdjustment Adjustment(ModelSpec model) => (model.AdjustsForBlock, model.AdjustsForRound) switch
    {
        (true, true) => ModelAdjustment.BlockAndRound,
        (true, false) => ModelAdjustment.Block,
        (false, true) => ModelAdjustment.Round,
        _ => ModelAdjustment.None,
    };

    internal static AdjustedModelPrior Prior(CheckedDesign design)
    {
        var priors = design.Arms.Select(a => (NormalPriorSpec)a.Prior).ToList();
        var guess = design.Outcome.NoiseSd ?? Math.Sqrt(priors.Average(p => Math.Pow(p.NoiseGuess ?? p.Sd, 2)));
        var worth = design.Outcome.NoiseSd is null ? priors.Min(p => p.Worth ?? NormalPriorSpec.DefaultWorth) : KnownNoiseWorth;
        return AdjustedModelPrior.Proper(priors.Select(p => new ArmPrior(p.Mean, p.Sd)).ToList(), guess, worth);
    }
}

/// <summary>Arms' values, jointly multivariate t (ν = ∞: normal): location, scale matrix, degrees of freedom; design order.</summary>
public sealed record Joint(IReadOnlyList<double> Location, double[,] Scale, double Df);
