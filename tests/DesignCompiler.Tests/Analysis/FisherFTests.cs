using DesignCompiler.Numerics;
using DesignCompiler.Tests.Numerics;

namespace DesignCompiler.Tests.Analysis;

public sealed class FisherFTests
{
    // Expected values: mpmath 1.3.0, P(F > f) = betainc(d2/2, d1/2, 0, d2/(d2 + d1·f)) at 40 digits
    // (reference/analysis_reference_values.py, "FisherFTests").
    [Theory]
    [InlineData(5, 15, 2.16777868149536238109226726506, 0.112809412634841053100493597276)]
    [InlineData(5, 15, 2.9, 0.0500690658765632609815186511874)]
    [InlineData(2, 3, 27.5625, 0.0117256636747781122302729511269)]
    [InlineData(1, 10, 4.5, 0.0598903244255594197452407314532)]
    [InlineData(10, 1000, 0.5, 0.890678891273700024393974886455)]
    [InlineData(3, 7, 1e6, 4.51790251794047692592791284277e-20)]
    public void Upper_tail_matches_mpmath(double d1, double d2, double f, double expected) =>
        NumericAssert.Relative(expected, FisherF.UpperTail(d1, d2, f), 1e-12, $"P(F({d1},{d2}) > {f})");

    [Fact]
    public void Upper_tail_with_two_numerator_df_has_its_closed_form()
    {
        // Elementary: for d1 = 2, P(F > f) = (1 + 2f/d2)^(−d2/2).
        foreach (var (d2, f) in new[] { (3.0, 27.5625), (8.0, 1.3), (40.0, 0.2) })
            NumericAssert.Relative(Math.Pow(1 + 2 * f / d2, -d2 / 2), FisherF.UpperTail(2, d2, f), 1e-13, $"d2 = {d2}, f = {f}");
    }

    [Fact]
    public void Five_percent_point_agrees_with_the_printed_F_table()
    {
        // Printed F tables (e.g. NIST/SEMATECH e-Handbook §1.3.6.7.3, from memory) give F(0.05; 5, 15) = 2.90;
        // mpmath by root-finding gives 2.901294536236158. The tail must cross 5 % between the table's rounding limits.
        Assert.True(FisherF.UpperTail(5, 15, 2.895) > 0.05);
        Assert.True(FisherF.UpperTail(5, 15, 2.905) < 0.05);
        NumericAssert.Relative(0.05, FisherF.UpperTail(5, 15, 2.90129453623615812440448593017), 1e-12, "at the mpmath root");
    }

    [Fact]
    public void Edges_are_exact()
    {
        Assert.Equal(1.0, FisherF.UpperTail(3, 9, 0));
        Assert.Equal(0.0, FisherF.UpperTail(3, 9, double.PositiveInfinity));
        Assert.True(double.IsNaN(FisherF.UpperTail(0, 9, 1)));
    }
}
