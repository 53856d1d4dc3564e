using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Cli;

/// <summary>
/// trialc compile refuses a design whose limits cannot hold together, exits 1, and names the
/// clashing rules with their positions and the numbers involved; nothing is written.
/// </summary>
public sealed class InfeasibleCompileTests
{
    public static TheoryData<string, string, string[]> Designs() => new()
    {
        // file, diagnostic id, texts the message and its notes must hold (positions are line:col)
        { "008-feasibility/minimums-exceed-block.trial", "TD2042", ["minimums need"] },
        { "008-feasibility/minimums-exceed-round.trial", "TD2042", ["minimums need"] },
        { "008-feasibility/minimums-exceed-some-rounds.trial", "TD2042", ["round"] },
        { "008-feasibility/maximums-below-round.trial", "TD2043", ["maximums allow only"] },
        { "008-feasibility/minimum-above-maximum.trial", "TD2041", ["at least", "at most"] },
        { "008-feasibility/stock-below-minimums.trial", "TD2044", ["stock of"] },
        { "008-feasibility/stock-below-minimums-window.trial", "TD2044", ["stock of"] },
        { "005-limits/window-outside-trial.trial", "TD2045", ["outside the trial"] },
        { "005-limits/window-empty.trial", "TD2045", ["is empty"] },
        { "005-limits/share-over-100.trial", "TD2004", ["between 0% and 100%"] },
    };

    [Theory]
    [MemberData(nameof(Designs))]
    public void Compile_names_the_clash_and_writes_nothing(string file, string id, string[] texts)
    {
        var path = Path.Combine(RepoPaths.Root, "tests", "Cases", file);
        var output = Path.Combine(Path.GetTempPath(), "trialc-infeasible-" + Guid.NewGuid().ToString("N"));
        var run = Trialc.Invoke("compile", path, "--out", output);
        Assert.Equal(1, run.ExitCode);
        Assert.Matches(System.Text.RegularExpressions.Regex.Escape(path) + @":\d+:\d+: error " + id + ":", run.Error);
        foreach (var text in texts) Assert.Contains(text, run.Error);
        Assert.False(Directory.Exists(output));
    }

    [Fact]
    public void A_clash_between_two_limits_points_at_both_lines()
    {
        var path = Path.Combine(RepoPaths.Root, "tests", "Cases", "008-feasibility", "minimum-above-maximum.trial");
        var run = Trialc.Invoke("check", path);
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("note: the maximum is set here", run.Error);
    }
}
