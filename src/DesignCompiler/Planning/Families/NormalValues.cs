using DesignCompiler.Binding;

namespace DesignCompiler.Planning.Families;

/// <summary>
/// The values a normal outcome takes on a sheet: finite and within <see cref="DesignLimits.MaxMagnitude"/>,
/// so that a mistyped exponent (1e200 for 12.00) is refused at its line instead of breaking every later round.
/// </summary>
internal static class NormalValues
{
    public static (bool Ok, string Rule) Accepts(double value) =>
        (Math.Abs(value) <= DesignLimits.MaxMagnitude,
            $"a number between -{DesignLimits.Text(DesignLimits.MaxMagnitude)} and {DesignLimits.Text(DesignLimits.MaxMagnitude)}");
}
