using System.Globalization;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Simulation.Accumulators;

namespace DesignCompiler.Rendering.Simulation;

/// <summary>Simulation figures as text, invariant culture throughout.</summary>
public static class FigureText
{
    public static EstimateModel Model(Estimate estimate) =>
        new(NumberText.Exact(estimate.Mean), NumberText.Exact(estimate.StandardError), WithError(estimate));

    /// <summary>
    /// "1.3371 ± 0.0034": the mean to the decimals that show two significant digits of its
    /// standard error, since digits below that are noise (common practice for reporting Monte
    /// Carlo results). A figure that never varied shows "± 0".
    /// </summary>
    public static string WithError(Estimate estimate)
    {
        var (mean, se) = (estimate.Mean, estimate.StandardError);
        if (!double.IsFinite(mean)) return "-";
        if (!double.IsFinite(se)) return Significant(mean);
        if (se == 0) return Significant(mean) + " ± 0";
        var decimals = Math.Clamp(1 - (int)Math.Floor(Math.Log10(se)), 0, 8);
        return Fixed(mean, decimals) + " ± " + Fixed(se, decimals);
    }

    /// <summary>A difference with its sign, at the precision its standard error supports.</summary>
    public static string Signed(double value, double se)
    {
        if (!double.IsFinite(value)) return "-";
        var text = double.IsFinite(se) && se > 0
            ? Fixed(value, Math.Clamp(1 - (int)Math.Floor(Math.Log10(se)), 0, 8))
            : Significant(value);
        return value > 0 ? "+" + text : text;
    }

    /// <summary>At the precision of a standard error, without the sign.</summary>
    public static string AtPrecision(double value, double se) =>
        !double.IsFinite(value) ? "-"
        : double.IsFinite(se) && se > 0 ? Fixed(value, Math.Clamp(1 - (int)Math.Floor(Math.Log10(se)), 0, 8))
        : Significant(value);

    public static string Significant(double value) =>
        !double.IsFinite(value) ? "-" : value == 0 ? "0" : value.ToString("G4", CultureInfo.InvariantCulture);

    public static string Fixed(double value, int decimals)
    {
        var text = NumberText.Fixed(value, decimals);
        // "-0.000" reads as a sign that is not there.
        return text.StartsWith('-') && text.Trim('-', '0', '.').Length == 0 ? text[1..] : text;
    }

    public static string Whole(long value) => NumberText.Whole(value);

    public static string Optional(int? value) => value?.ToString(CultureInfo.InvariantCulture) ?? "null";

    public static string OptionalText(int? value) => value?.ToString(CultureInfo.InvariantCulture) ?? "-";

    public static string Share(long part, long whole) => whole == 0 ? "-" : NumberText.Percent((double)part / whole);
}
