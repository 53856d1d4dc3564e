using System.Text.Json;
using DesignCompiler.Planning;
using DesignCompiler.Tests.Testing;
using Xunit.Abstractions;

namespace DesignCompiler.Tests.Simulation;

/// <summary>trialc simulate and merge as a user runs them: outputs, exit codes, messages.</summary>
public sealed class SimulateCliTests(ITestOutputHelper output)
{
    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        foreach (var file in Directory.GetFiles(RepoPaths.Examples, "*.trial").Order(StringComparer.Ordinal)) data.Add(Path.GetFileName(file));
        return data;
    }

    /// <summary>Null when the planner supports the example's policy, else the planner's reason.</summary>
    private static string? Unsupported(string example) =>
        RoundPlanner.For(TestDesigns.Example(example)).Problem?.Message;

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_shipped_example_simulates_or_says_clearly_why_not(string example)
    {
        var run = Trialc.Invoke("simulate", RepoPaths.Example(example), "--reps", "16");
        if (Unsupported(example) is { } reason)
        {
            // Not simulated: the planner does not run this policy yet. The command must say so and exit 1.
            output.WriteLine($"{example} not simulated: {reason}");
            Assert.Equal(1, run.ExitCode);
            Assert.Contains("TD3004", run.Error);
            return;
        }
        Assert.True(run.ExitCode == 0, run.Error);
        var design = TestDesigns.Example(example);
        foreach (var scenario in design.Scenarios) Assert.Contains($"Scenario \"{scenario.Name}\"", run.Out);
        Assert.Contains("expected regret", run.Out);
        Assert.DoesNotContain("Exception", run.Error);
    }

    [Fact]
    public void Html_report_has_regret_selection_and_per_arm_charts_readable_without_colour()
    {
        var file = SimulationFixtures.TempFile(".html");
        try
        {
            var run = Trialc.Invoke("simulate", RepoPaths.Example("cover-crops.trial"), "--reps", "16", "--format", "html", "--out", file);
            Assert.True(run.ExitCode == 0, run.Error);
            var html = File.ReadAllText(file);
            Assert.StartsWith("<!DOCTYPE html>", html);
            // Per scenario: regret, selection and one small chart per arm; then regret and selection against equal allocation.
            Assert.Equal(3 * (2 + 4) + 3 * 2, html.Split("<svg ").Length - 1);
            Assert.Contains("<h2>Against equal allocation</h2>", html);
            Assert.Contains("stroke-dasharray=\"7 4\"", html);
            Assert.Contains("Cumulative regret by round", html);
            Assert.Contains("false-positive rate", html);
            Assert.DoesNotContain("{{", html);
            // Lines are black; grey only fills bands. No colour carries meaning.
            Assert.DoesNotMatch("stroke=\"#(?!000|d0d0d0|fff)[0-9a-fA-F]{3,6}\"", html);
        }
        finally
        {
            File.Delete(file);
        }
    }

    [Fact]
    public void Json_report_names_the_false_positive_rate_only_where_all_arms_are_equal()
    {
        var run = Trialc.Invoke("simulate", RepoPaths.Example("cover-crops.trial"), "--reps", "16", "--format", "json");
        Assert.Equal(0, run.ExitCode);
        using var json = JsonDocument.Parse(run.Out);
        var scenarios = json.RootElement.GetProperty("scenarios").EnumerateArray().ToList();
        Assert.Equal(["no difference", "rye mix better", "drawn from prior"], scenarios.Select(s => s.GetProperty("name").GetString()));
        Assert.Equal([true, false, false], scenarios.Select(s => s.GetProperty("declaredWinner").GetProperty("isFalsePositiveRate").GetBoolean()));
        Assert.Equal(JsonValueKind.Array, scenarios[2].GetProperty("calibration").ValueKind);
        Assert.Equal(JsonValueKind.Null, scenarios[0].GetProperty("calibration").ValueKind);
        var arm = scenarios[1].GetProperty("arms")[1];
        Assert.Equal("RC", arm.GetProperty("code").GetString());
        Assert.True(arm.GetProperty("best").GetBoolean());
        Assert.Equal(4, arm.GetProperty("plotsByRound").GetArrayLength());
    }

    [Fact]
    public void An_unknown_scenario_is_an_input_error_with_a_suggestion()
    {
        var run = Trialc.Invoke("simulate", RepoPaths.Example("cover-crops.trial"), "--scenario", "rye mix beter");
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("TD3102", run.Error);
        Assert.Contains("did you mean 'rye mix better'?", run.Error);
    }

    [Fact]
    public void One_scenario_can_be_chosen_by_name()
    {
        var run = Trialc.Invoke("simulate", RepoPaths.Example("cover-crops.trial"), "--scenario", "rye mix better", "--reps", "8");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Scenario \"rye mix better\"", run.Out);
        Assert.DoesNotContain("Scenario \"no difference\"", run.Out);
    }

    [Fact]
    public void A_design_without_scenarios_is_a_clear_input_error()
    {
        var file = SimulationFixtures.TempFile(".trial");
        File.WriteAllText(file, SimulationFixtures.TwoArmReference.Replace("scenario \"reference\" { A 0.4 B 0.6 }", ""));
        try
        {
            var run = Trialc.Invoke("simulate", file);
            Assert.Equal(1, run.ExitCode);
            Assert.Contains("TD3101", run.Error);
            Assert.Contains("has no scenarios", run.Error);
            Assert.DoesNotContain("   at ", run.Error);
        }
        finally
        {
            File.Delete(file);
        }
    }

    [Theory]
    [InlineData("--reps", "0")]
    [InlineData("--threads", "0")]
    [InlineData("--format", "pdf")]
    [InlineData("--shard", "5/4")]
    [InlineData("--shard", "1/4")]
    [InlineData("--margin", "-1")]
    public void Bad_command_lines_exit_2(string option, string value)
    {
        var run = Trialc.Invoke("simulate", RepoPaths.Example("cover-crops.trial"), option, value);
        Assert.Equal(2, run.ExitCode);
    }

    [Fact]
    public void Merge_refuses_missing_shards_foreign_parts_and_other_files()
    {
        var path = RepoPaths.Example("cover-crops.trial");
        var p1 = SimulationFixtures.TempFile(".json");
        var p2 = SimulationFixtures.TempFile(".json");
        var other = SimulationFixtures.TempFile(".json");
        try
        {
            Assert.Equal(0, Trialc.Invoke("simulate", path, "--reps", "8", "--shard", "1/2", "--out", p1).ExitCode);
            Assert.Equal(0, Trialc.Invoke("simulate", path, "--reps", "8", "--shard", "2/2", "--seed", "5", "--out", p2).ExitCode);

            var missing = Trialc.Invoke("merge", p1);
            Assert.Equal(1, missing.ExitCode);
            Assert.Contains("shard 2/2 is missing", missing.Error);

            var foreign = Trialc.Invoke("merge", p1, p2);
            Assert.Equal(1, foreign.ExitCode);
            Assert.Contains("TD5102", foreign.Error);
            Assert.Contains("seed 5", foreign.Error);

            File.WriteAllText(other, "{ \"format\": \"something else\" }");
            var garbage = Trialc.Invoke("merge", other);
            Assert.Equal(1, garbage.ExitCode);
            Assert.Contains("TD5101", garbage.Error);
            Assert.DoesNotContain("   at ", garbage.Error);
        }
        finally
        {
            File.Delete(p1);
            File.Delete(p2);
            File.Delete(other);
        }
    }
}
