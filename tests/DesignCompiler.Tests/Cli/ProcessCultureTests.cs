using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Cli;

/// <summary>The real program under a German locale writes the same bytes: decimal points stay points.</summary>
public sealed class ProcessCultureTests
{
    [Theory]
    [InlineData("nitrogen-rates.trial")]
    [InlineData("germination.trial")]
    public void Json_plan_is_identical_under_LC_ALL_de_DE(string example)
    {
        var design = RepoPaths.Example(example);
        var plain = TrialcProcess.Invoke(new Dictionary<string, string> { ["LC_ALL"] = "C.UTF-8", ["LANG"] = "C.UTF-8" }, "compile", design, "--format", "json");
        var german = TrialcProcess.Invoke(new Dictionary<string, string> { ["LC_ALL"] = "de_DE.UTF-8", ["LANG"] = "de_DE.UTF-8" }, "compile", design, "--format", "json");
        Assert.Equal(0, plain.ExitCode);
        Assert.Equal(0, german.ExitCode);
        Assert.Equal(plain.Out, german.Out);
        Assert.Contains("\"posteriorMean\": ", german.Out);
        Assert.DoesNotMatch(@"""posteriorMean"": -?\d+,\d", german.Out);
    }

    [Fact]
    public void Bad_input_in_a_real_process_gives_no_stack_trace()
    {
        var run = TrialcProcess.Invoke(new Dictionary<string, string>(), "check", Path.Combine(RepoPaths.Root, "tests", "Cases", "001-syntax"));
        Assert.Equal(1, run.ExitCode);
        Assert.DoesNotContain("   at ", run.Error);
        Assert.DoesNotContain("Exception", run.Error);
    }
}
