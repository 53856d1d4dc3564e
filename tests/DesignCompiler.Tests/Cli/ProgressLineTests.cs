using DesignCompiler.Cli.Commands;

namespace DesignCompiler.Tests.Cli;

/// <summary>
/// The terminal's progress line for a long simulation: the time left is the time so far scaled by the trials
/// left over the trials done (a constant pace, the usual estimate), rounded up so that "about" errs long.
/// </summary>
public sealed class ProgressLineTests
{
    [Fact]
    public void EstimatesTheTimeLeftFromThePaceSoFar()
    {
        // 448 of 8,000 in 10 s: 7,552 / 44.8 per s = 168.6 s left, rounded up to 170 s.
        var line = ProgressLine.Text(448, 8000, TimeSpan.FromSeconds(10));
        Assert.Equal("simulating: 448 of 8000 trials, about 2 min 50 s left", line.TrimEnd());
        Assert.Equal(ProgressLine.Width, line.Length);
    }

    [Theory]
    [InlineData(0, 8000, 30.0)]   // nothing done yet: no pace to go on
    [InlineData(100, 8000, 1.5)]  // under two seconds: mostly start-up
    [InlineData(8000, 8000, 40)]  // finished
    public void GivesNoEstimateWithoutAPaceToGoOn(long done, long total, double seconds)
    {
        var line = ProgressLine.Text(done, total, TimeSpan.FromSeconds(seconds));
        Assert.Equal($"simulating: {done} of {total} trials", line.TrimEnd());
    }

    [Theory]
    [InlineData(0.4, "5 s")]
    [InlineData(41, "45 s")]
    [InlineData(60, "1 min")]
    [InlineData(61, "1 min 10 s")]
    [InlineData(359.5, "6 min")]
    [InlineData(3600, "1 h")]
    [InlineData(5421, "1 h 31 min")]
    public void RoundsUpToAUsefulUnit(double seconds, string expected) =>
        Assert.Equal(expected, ProgressLine.Duration(seconds));

    [Fact]
    public void ALongTrialCountStillFitsTheLine()
    {
        var line = ProgressLine.Text(123_456_789, 999_999_999, TimeSpan.FromSeconds(1000));
        Assert.Equal(ProgressLine.Width, line.Length);
        Assert.EndsWith("left", line.TrimEnd());
    }
}
