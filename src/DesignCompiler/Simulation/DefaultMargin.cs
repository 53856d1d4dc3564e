using System.Globalization;
using DesignCompiler.Binding;

namespace DesignCompiler.Simulation;

/// <summary>
/// The margin of "selected an arm within the margin of the best", in value units, when the
/// user gives none. Two percentage points of the success probability for bernoulli and
/// binomial outcomes; otherwise 2 % of the average prior mean outcome, so the margin scales
/// with yields in t/ha or counts of aphids alike. Both are converted to value units (times
/// the price when there is one).
/// </summary>
public static class DefaultMargin
{
    public const double Fraction = 0.02;

    public static (double Margin, string Rule) For(CheckedDesign design)
    {
        var scale = Math.Abs(design.Valuation.Scale);
        var unit = ValueUnit(design);
        if (design.Outcome.Family is OutcomeFamily.Bernoulli or OutcomeFamily.Binomial)
        {
            var margin = Fraction * scale;
            return (margin, Describe(margin, unit) + ": two percentage points of the success probability" + PriceNote(design));
        }
        var typical = design.Arms.Average(a => Math.Abs(PriorMean(a.Prior)));
        if (!(typical > 0)) typical = 1;
        var value = Fraction * scale * typical;
        return (value, Describe(value, unit) + ": 2 % of the average prior mean outcome" + PriceNote(design));
    }

    public static string Given(double margin, CheckedDesign design) => Describe(margin, ValueUnit(design)) + ": set with --margin";

    private static string PriceNote(CheckedDesign design) => design.Valuation.HasPrice ? ", times the price" : "";

    private static string? ValueUnit(CheckedDesign design) => SetupBuilder.ValueUnit(design);

    private static string Describe(double margin, string? unit) =>
        margin.ToString("G6", CultureInfo.InvariantCulture) + (unit is null ? "" : " " + unit);

    private static double PriorMean(PriorSpec prior) => prior switch
    {
        BetaPriorSpec b => b.A / (b.A + b.B),
        NormalPriorSpec n => n.Mean,
        GammaPriorSpec g => g.Shape / g.Rate,
        _ => 1,
    };
}
