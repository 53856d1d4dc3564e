using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Cli;

/// <summary>trialc check: exit codes and what the user sees.</summary>
public sealed class CheckCommandTests
{
    [Theory]
    [InlineData("cover-crops.trial")]
    [InlineData("nitrogen-rates.trial")]
    [InlineData("germination.trial")]
    [InlineData("aphid-margins.trial")]
    public void Shipped_examples_check_clean(string example)
    {
        var run = Trialc.Invoke("check", RepoPaths.Example(example));
        Assert.Equal(0, run.ExitCode);
        Assert.Contains(": ok:", run.Out);
    }

    [Fact]
    public void A_design_with_several_mistakes_lists_them_all_with_positions_and_exits_1()
    {
        var path = Path.Combine(Path.GetTempPath(), "trialc-check-" + Guid.NewGuid().ToString("N") + ".trial");
        File.WriteAllText(path, """
            trial "Broken" {
              seed 12
              rounds 0
              outcome established: bernoulli
              polcy thompson
              arm OV "Oat + vetch" prior beta(2, 2)
              arm RC "Rye" prior beta(1, 1)
              control RX
              block north plots 20 layout 4 x 4
            }
            """);
        try
        {
            var run = Trialc.Invoke("check", path);
            Assert.Equal(1, run.ExitCode);
            Assert.Contains(path + ":3:10: error TD2004:", run.Error);
            Assert.Contains(path + ":5:3: error TD1002: 'polcy' does not begin a statement", run.Error);
            Assert.Contains("did you mean 'policy'?", run.Error);
            Assert.Contains(path + ":8:11: error TD2011: there is no arm 'RX'", run.Error);
            Assert.Contains(path + ":9:31: error TD2016:", run.Error);
            Assert.Contains("4 errors, 0 warnings", run.Error);
            Assert.DoesNotContain("   at ", run.Error);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void A_missing_file_gets_one_clear_line()
    {
        var run = Trialc.Invoke("check", "/nonexistent/design.trial");
        Assert.Equal(1, run.ExitCode);
        Assert.Equal("/nonexistent/design.trial: error TD5001: cannot read the file: no such file\n1 error, 0 warnings\n", run.Error);
    }

    [Fact]
    public void A_directory_is_not_a_design()
    {
        var run = Trialc.Invoke("check", RepoPaths.Examples);
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("it is a directory, not a file", run.Error);
    }

    [Fact]
    public void Bad_command_line_use_exits_2()
    {
        Assert.Equal(2, Trialc.Invoke("check").ExitCode);
        Assert.Equal(2, Trialc.Invoke("frobnicate").ExitCode);
        Assert.Equal(2, Trialc.Invoke("compile", RepoPaths.Example("cover-crops.trial")).ExitCode);
        Assert.Equal(2, Trialc.Invoke("compile", RepoPaths.Example("cover-crops.trial"), "--format", "pdf").ExitCode);
    }
}
