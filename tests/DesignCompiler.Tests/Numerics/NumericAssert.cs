namespace DesignCompiler.Tests.Numerics;

/// <summary>Assertions on floating-point results with the tolerance stated as relative or absolute.</summary>
internal static class NumericAssert
{
    public static void Relative(double expected, double actual, double tolerance, string? what = null)
    {
        double error = expected == 0 ? Math.Abs(actual) : Math.Abs(actual - expected) / Math.Abs(expected);
        Assert.True(
            error <= tolerance,
            FormattableString.Invariant($"{what} expected {expected:R}, got {actual:R}: relative error {error:E2} > {tolerance:E1}"));
    }

    public static void Absolute(double expected, double actual, double tolerance, string? what = null)
    {
        double error = Math.Abs(actual - expected);
        Assert.True(
            error <= tolerance,
            FormattableString.Invariant($"{what} expected {expected:R}, got {actual:R}: absolute error {error:E2} > {tolerance:E1}"));
    }
}
