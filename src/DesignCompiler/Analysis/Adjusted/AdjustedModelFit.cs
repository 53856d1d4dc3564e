using DesignCompiler.Numerics;
using DesignCompiler.Numerics.LinearModel;

namespace DesignCompiler.Analysis.Adjusted;

/// <summary>
/// The fitted adjusted model: per arm the posterior of its mean at the average block and round, and the arms' joint
/// multivariate t (ν = 2a_n, location m_n[arms], scale (b_n/a_n)·V_n[arms, arms]) for probability-of-best calculations.
/// </summary>
public sealed class AdjustedModelFit
{
    private readonly int[] plots;

    internal AdjustedModelFit(ModelAdjustment adjustment, ModelColumns columns, RegressionPosterior posterior, int[] plots)
    {
        Adjustment = adjustment;
        Columns = columns;
        Posterior = posterior;
        this.plots = plots;
        IdentifiedArms = Enumerable.Range(0, columns.Arms).Where(posterior.IsEstimable).ToArray();
    }

    public ModelAdjustment Adjustment { get; }

    public ModelColumns Columns { get; }

    /// <summary>The closed-form posterior over all coefficients (arms first, then block and round effects).</summary>
    public RegressionPosterior Posterior { get; }

    public int ArmCount => Columns.Arms;

    /// <summary>The arms with a posterior of their own, ascending.</summary>
    public IReadOnlyList<int> IdentifiedArms { get; }

    /// <summary>Recorded plots of the arm.</summary>
    public int Plots(int arm) => plots[arm];

    /// <summary>
    /// Whether the data (with the prior) pin down the arm's mean. Always true under a proper prior; under the flat prior
    /// false for an arm never observed, or one whose plots cannot be told apart from a block or round effect.
    /// </summary>
    public bool IsIdentified(int arm) => Posterior.IsEstimable(arm);

    /// <summary>The posterior mean of the arm at the average block and round, or null when it is not identified.</summary>
    public double? ArmMean(int arm) => IsIdentified(arm) ? Posterior.Mean(arm) : null;

    /// <summary>The arm's marginal t, or null when it is not identified.</summary>
    public StudentTMarginal? ArmMarginal(int arm) => Posterior.Marginal(arm);

    /// <summary>The joint multivariate t of <see cref="IdentifiedArms"/>, in that order; null when no arm is identified.</summary>
    public MultivariateT? ArmsJoint => Posterior.Joint(IdentifiedArms);

    /// <summary>The posterior mean of one block's effect (deviation from the average block), or null if the model has none for that label.</summary>
    public double? BlockEffect(int block) => Effect(block: true, block);

    /// <summary>The posterior mean of one round's effect (deviation from the average round), or null if the model has none for that label.</summary>
    public double? RoundEffect(int round) => Effect(block: false, round);

    private double? Effect(bool block, int label)
    {
        if (!Columns.HasLevel(block, label)) return null;
        var terms = Columns.EffectOf(block, label).ToArray();
        // A factor with a single level has no free effect: that level is the average.
        if (terms.Length == 0) return 0;
        if (terms.Any(t => Posterior.Mean(t.Column) is null)) return null;
        return terms.Sum(t => t.Weight * Posterior.Mean(t.Column)!.Value);
    }
}
