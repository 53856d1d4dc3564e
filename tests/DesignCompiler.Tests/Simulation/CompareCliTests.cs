using System.Text.Json;
using DesignCompiler.Planning;
using DesignCompiler.Tests.Testing;
using Xunit.Abstractions;

namespace DesignCompiler.Tests.Simulation;

/// <summary>trialc compare: common random numbers, paired differences, verdicts, formats.</summary>
public sealed class CompareCliTests(ITestOutputHelper output)
{
    [Theory]
    [MemberData(nameof(SimulateCliTests.Examples), MemberType = typeof(SimulateCliTests))]
    public void A_design_compared_with_itself_differs_by_exactly_nothing(string example)
    {
        // Common random numbers (common practice): the same design on the same streams makes the
        // same decisions, so every paired difference is 0 with standard error 0, and no verdict is given.
        var path = RepoPaths.Example(example);
        var run = Trialc.Invoke("compare", path, path, "--reps", "12", "--format", "json");
        if (RoundPlanner.For(TestDesigns.Example(example)).Problem is { } problem)
        {
            output.WriteLine($"{example} not compared: {problem.Message}");
            Assert.Equal(1, run.ExitCode);
            Assert.Contains("TD3004", run.Error);
            return;
        }
        Assert.True(run.ExitCode == 0, run.Error);
        using var json = JsonDocument.Parse(run.Out);
        var scenarios = json.RootElement.GetProperty("scenarios").EnumerateArray().ToList();
        Assert.Equal(TestDesigns.Example(example).Scenarios.Count, scenarios.Count);
        foreach (var figure in scenarios.SelectMany(s => s.GetProperty("figures").EnumerateArray()))
        {
            var difference = figure.GetProperty("difference");
            Assert.Equal(0.0, difference.GetProperty("mean").GetDouble());
            Assert.Equal(0.0, difference.GetProperty("se").GetDouble());
            Assert.False(figure.GetProperty("clear").GetBoolean());
            Assert.Equal(JsonValueKind.Null, figure.GetProperty("verdict").ValueKind);
        }
    }

    private const string ThreeLines = """
        trial "Three lines" {
          seed 2718
          rounds 4
          outcome ok: bernoulli
          goal maximize
          policy thompson
          default prior beta(1, 1)
          arm A "a"
          arm B "b"
          arm C "c"
          plots 20 per round
          scenario "spread" { A 0.3 B 0.5 C 0.7 }
          scenario "even" { every arm 0.5 }
        }
        """;

    [Fact]
    public void Equal_allocation_against_thompson_gives_paired_intervals_and_a_verdict_only_where_clear()
    {
        var a = SimulationFixtures.TempFile(".trial");
        var b = SimulationFixtures.TempFile(".trial");
        File.WriteAllText(a, ThreeLines);
        File.WriteAllText(b, ThreeLines.Replace("policy thompson", "policy equal"));
        try
        {
            var run = Trialc.Invoke("compare", a, b, "--reps", "200", "--format", "json");
            Assert.True(run.ExitCode == 0, run.Error);
            using var json = JsonDocument.Parse(run.Out);
            var scenarios = json.RootElement.GetProperty("scenarios").EnumerateArray().ToList();
            Assert.Equal(["spread", "even"], scenarios.Select(s => s.GetProperty("name").GetString()));
            foreach (var figure in scenarios.SelectMany(s => s.GetProperty("figures").EnumerateArray()))
            {
                var d = figure.GetProperty("difference");
                var lower = d.GetProperty("lower95");
                var upper = d.GetProperty("upper95");
                var clear = figure.GetProperty("clear").GetBoolean();
                if (lower.ValueKind == JsonValueKind.Number)
                    Assert.Equal(lower.GetDouble() > 0 || upper.GetDouble() < 0, clear);
                Assert.Equal(clear, figure.GetProperty("verdict").ValueKind == JsonValueKind.String);
            }
            var regret = scenarios[0].GetProperty("figures").EnumerateArray().Single(f => f.GetProperty("figure").GetString() == "regret");
            // Equal allocation keeps sowing the worse lines, so B's regret is higher: the reason to
            // allocate adaptively at all (common practice).
            Assert.True(regret.GetProperty("clear").GetBoolean());
            Assert.StartsWith("B has higher expected regret than A", regret.GetProperty("verdict").GetString());
            // With every arm equal, regret is 0 in both and nothing is claimed.
            var even = scenarios[1].GetProperty("figures").EnumerateArray().Single(f => f.GetProperty("figure").GetString() == "regret");
            Assert.False(even.GetProperty("clear").GetBoolean());

            var text = Trialc.Invoke("compare", a, b, "--reps", "200", "--scenario", "spread");
            Assert.Contains("B has higher expected regret than A", text.Out);
            Assert.Contains("95 % interval", text.Out);
            Assert.DoesNotContain("Scenario \"even\"", text.Out);
        }
        finally
        {
            File.Delete(a);
            File.Delete(b);
        }
    }

    [Fact]
    public void Html_comparison_overlays_both_designs_in_each_chart()
    {
        var a = RepoPaths.Example("aphid-margins.trial");
        var file = SimulationFixtures.TempFile(".html");
        try
        {
            var run = Trialc.Invoke("compare", a, a, "--reps", "8", "--format", "html", "--out", file);
            Assert.True(run.ExitCode == 0, run.Error);
            var html = File.ReadAllText(file);
            // Per scenario: regret, selection, and one chart per arm (4 arms), each with A and B.
            Assert.Equal(2 * (2 + 4), html.Split("<svg ").Length - 1);
            Assert.Contains(">A</text>", html);
            Assert.Contains(">B</text>", html);
            Assert.DoesNotContain("{{", html);
        }
        finally
        {
            File.Delete(file);
        }
    }

    [Fact]
    public void From_prior_is_compared_only_when_the_priors_are_identical()
    {
        var a = RepoPaths.Example("cover-crops.trial");
        var b = SimulationFixtures.TempFile(".trial");
        File.WriteAllText(b, File.ReadAllText(a).Replace("prior beta(2, 2)", "prior beta(3, 3)"));
        try
        {
            var run = Trialc.Invoke("compare", a, b, "--reps", "8");
            Assert.True(run.ExitCode == 0, run.Error);
            Assert.Contains("'from prior' is not compared: the designs' priors differ (arm OV: beta(2, 2) against beta(3, 3))", run.Out);
            Assert.DoesNotContain("Scenario \"drawn from prior\"", run.Out);
            Assert.Contains("Scenario \"rye mix better\"", run.Out);
        }
        finally
        {
            File.Delete(b);
        }
    }
}
