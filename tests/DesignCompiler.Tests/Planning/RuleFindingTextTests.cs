using System.Globalization;
using DesignCompiler.Binding;
using DesignCompiler.Syntax;

namespace DesignCompiler.Tests.Planning;

/// <summary>
/// The number a stop or drop finding prints never contradicts the verdict beside it: read back, it falls on the
/// same side of the rule's threshold as the value itself (common practice in reporting a test against a cut-off:
/// "0.9999 … not met" for a rule 'best &gt;= 0.9999' is a misprint to the reader).
/// </summary>
public sealed class RuleFindingTextTests
{
    [Theory]
    // Four decimals would round each of these onto the threshold and print the wrong side.
    [InlineData(Comparison.AtLeast, 0.9999, 0.99986, "0.99986")]
    [InlineData(Comparison.Below, 0.01, 0.0099996, "0.0099996")]
    [InlineData(Comparison.AtMost, 10.0, 10.00004, "10.00004")]
    [InlineData(Comparison.Above, 0.5, 0.50000004, "0.50000004")]
    // Where four decimals already agree with the verdict they are kept.
    [InlineData(Comparison.AtLeast, 0.9999, 0.99994, "0.9999")]
    [InlineData(Comparison.AtLeast, 0.95, 0.99661234, "0.9966")]
    [InlineData(Comparison.Below, 0.01, 0.5, "0.5")]
    [InlineData(Comparison.AtMost, 10.0, 3.9e-7, "0")]
    public void PrintsTheValueOnTheSideOfTheThresholdItIsOn(Comparison comparison, double threshold, double value, string expected)
    {
        var criterion = new Criterion(CriterionMetric.Best, comparison, threshold);
        Assert.Equal(expected, criterion.Show(value));
    }

    [Fact]
    public void ReadBackAlwaysGivesTheSameVerdict()
    {
        // Values scattered around thresholds of every size a design uses, down to the last bits of a double.
        var random = new Random(20261202);
        foreach (var comparison in Enum.GetValues<Comparison>())
        {
            foreach (var threshold in new[] { 0.001, 0.01, 0.05, 0.5, 0.95, 0.99, 0.9999, 1.0, 10.0, 250.0 })
            {
                for (var i = 0; i < 2000; i++)
                {
                    var offset = Math.Pow(10, -random.Next(1, 17)) * (random.NextDouble() - 0.5);
                    var value = threshold * (1 + offset);
                    var criterion = new Criterion(CriterionMetric.Best, comparison, threshold);
                    var text = criterion.Show(value);
                    Assert.Equal(criterion.Holds(value), criterion.Holds(double.Parse(text, CultureInfo.InvariantCulture)));
                }
            }
        }
    }

    [Fact]
    public void UsesAPointWhateverTheCulture()
    {
        var before = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo("de-DE");
            Assert.Equal("0.99986", new Criterion(CriterionMetric.Best, Comparison.AtLeast, 0.9999).Show(0.99986));
        }
        finally
        {
            CultureInfo.CurrentCulture = before;
        }
    }
}
