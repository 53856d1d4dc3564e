using System.Globalization;

namespace DesignCompiler.Rendering.Models;

/// <summary>
/// Numbers as text for people and for machines. Always the invariant culture: a decimal
/// point never turns into a comma, whatever the machine's language.
/// </summary>
public static class NumberText
{
    /// <summary>Shortest text that reads back to the same double, for JSON.</summary>
    public static string Exact(double value) =>
        double.IsFinite(value) ? value.ToString("R", CultureInfo.InvariantCulture) : "null";

    /// <summary>A fixed number of decimals, for sheets.</summary>
    public static string Fixed(double value, int decimals) =>
        double.IsFinite(value) ? value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : "-";

    /// <summary>A probability for people: "0.412", with "<0.001" and ">0.999" at the ends.</summary>
    public static string Probability(double value) =>
        value <= 0 ? "0" : value >= 1 ? "1" : value < 0.0005 ? "<0.001" : value > 0.9995 ? ">0.999" : Fixed(value, 3);

    /// <summary>A percentage share for people: "41.2 %".</summary>
    public static string Percent(double share) => Fixed(100 * share, 1) + " %";

    /// <summary>Four significant digits, for posterior means in any unit.</summary>
    public static string Significant(double value) =>
        !double.IsFinite(value) ? "-" : value.ToString("G4", CultureInfo.InvariantCulture);

    public static string Whole(long value) => value.ToString(CultureInfo.InvariantCulture);
}
