using DesignCompiler.Binding;
using DesignCompiler.Numerics;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Planning;

/// <summary>
/// Each arm's posterior density for its mean outcome on one grid shared by all arms, with its
/// mean and 95 % equal-tailed interval: what a round report draws. The grid runs from the
/// smallest 0.5 % quantile to the largest 99.5 % quantile over the arms, inside the support, so
/// every curve is drawn where it has mass, no density is evaluated at a pole, and the heavy tails
/// of a Student-t posterior (unknown noise, few plots) do not squeeze every curve into the middle.
/// </summary>
public sealed record PosteriorCurves(IReadOnlyList<double> Grid, IReadOnlyList<ArmCurve> Arms)
{
    public const int Points = 161;
    private const double Tail = 0.005;

    public static PosteriorCurves Of(CheckedDesign design, IOutcomeModel model, TrialState state)
    {
        var posteriors = ArmAssessment.Of(design, model, state).Posteriors;
        var low = posteriors.Min(p => Math.Max(p.LowerBound, p.Quantile(Tail)));
        var high = posteriors.Max(p => Math.Min(p.UpperBound, MarginalProfile.UpperQuantile(p, Tail)));
        if (!(high > low)) (low, high) = (low - 0.5, low + 0.5);
        var grid = Enumerable.Range(0, Points).Select(k => low + (high - low) * k / (Points - 1)).ToArray();
        var arms = posteriors.Select((p, i) =>
        {
            var interval = CredibleInterval.EqualTailed(p, 0.95);
            var density = grid.Select(x => Finite(p.Density(x))).ToArray();
            return new ArmCurve(i, density, p.Mean, interval.Lower, interval.Upper);
        }).ToList();
        return new PosteriorCurves(grid, arms);
    }

    private static double Finite(double density) => double.IsFinite(density) && density > 0 ? density : 0;
}

/// <summary>One arm's density at each grid point, and its posterior mean and 95 % interval.</summary>
public sealed record ArmCurve(int Arm, IReadOnlyList<double> Density, double Mean, double Lower, double Upper);
