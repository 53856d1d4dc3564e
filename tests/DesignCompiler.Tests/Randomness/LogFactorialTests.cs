using DesignCompiler.Randomness;

namespace DesignCompiler.Tests.Randomness;

/// <summary>ln(k!) used by the rejection samplers, against mpmath 1.3.0 loggamma(k + 1) at 25 digits.</summary>
public class LogFactorialTests
{
    [Theory]
    [InlineData(0, 0.0)]
    [InlineData(1, 0.0)]
    [InlineData(20, 42.33561646075348502965988)]
    [InlineData(21, 45.38013889847690802616047)]
    [InlineData(50, 148.4777669517730320675372)]
    [InlineData(100, 363.73937555556349014408)]
    [InlineData(1000, 5912.128178488163348878131)]
    [InlineData(1000000, 12815518.38465816962425108)]
    public void MatchesMpmath(int k, double expected)
    {
        Assert.True(Math.Abs(LogFactorial.Of(k) - expected) <= 2e-15 * Math.Max(1.0, expected), $"ln({k}!) = {LogFactorial.Of(k):R}");
    }

    [Fact]
    public void ContinuousAcrossTheSwitchToStirling()
    {
        // ln(k!) − ln((k−1)!) = ln k exactly (definition).
        for (int k = 15; k <= 30; k++)
        {
            Assert.Equal(Math.Log(k), LogFactorial.Of(k) - LogFactorial.Of(k - 1), 1e-13);
        }
    }
}
