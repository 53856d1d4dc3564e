using System.Text.Json;
using System.Text.RegularExpressions;
using DesignCompiler.Tests.Ledger;

namespace DesignCompiler.Tests.Sheets;

/// <summary>The round report: the allocation, each arm's posterior as a curve, and P(best) round by round, readable in black and white.</summary>
public sealed class RoundReportTests
{
    private static readonly string[] BlackAndWhite = ["#000", "#777", "#ddd", "black", "white", "none"];

    [Fact]
    public void Round_one_draws_every_arm_from_its_prior_and_a_single_prior_point_of_p_best()
    {
        using var round = new CompiledRound("cover-crops.trial");
        var html = round.ReportText;
        var arms = round.Plan.GetProperty("arms").EnumerateArray().Select(a => a.GetProperty("code").GetString()!).ToList();

        foreach (var code in arms) Assert.Contains($"<g aria-label=\"arm {code}\">", html);
        Assert.Equal(arms.Count, Regex.Matches(html, "<polygon points=").Count);
        // P(best) chart: one line per arm, each through the prior alone.
        var lines = Regex.Matches(html, "<polyline points=\"([^\"]*)\" fill=\"none\" stroke=\"#000\" stroke-width=\"1.6\"").Select(m => m.Groups[1].Value).ToList();
        Assert.Equal(arms.Count, lines.Count);
        Assert.All(lines, l => Assert.Single(l.Split(' ')));
        Assert.Single(Regex.Matches(html, "<tr><th>prior</th>"));
        Assert.Contains("from its prior alone, before any result", html);
        Assert.Contains("established: chance per plot", html);
        AssertBlackAndWhite(html);
    }

    [Fact]
    public void A_later_round_charts_p_best_after_each_recorded_round_as_status_computes_it()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        var rates = new Dictionary<string, double> { ["OV"] = 0.55, ["RC"] = 0.8, ["MP"] = 0.3, ["BP"] = 0.6 };
        for (var r = 1; r <= 2; r++)
        {
            trial.Issue(r);
            Assert.Equal(0, trial.Record(trial.FillBernoulli(r, 500 + (ulong)r, rates)).ExitCode);
        }
        trial.Issue(3);
        var html = File.ReadAllText(Path.Combine(trial.OutFolder(3), "cover-crops-round3-report.html"));
        var status = JsonDocument.Parse(trial.Status().Out).RootElement;

        var rows = Regex.Matches(html, "<tr><th>(prior|after round \\d)</th>((?:<td class=\"num\">[^<]*</td>)+)</tr>").ToList();
        Assert.Equal(["prior", "after round 1", "after round 2"], rows.Select(m => m.Groups[1].Value));
        // The report's history and status's come from the same replay of the ledger: the same figures to the digit shown.
        var history = status.GetProperty("probabilityBestByRound").EnumerateArray().ToList();
        for (var k = 0; k < rows.Count; k++)
        {
            var shown = Regex.Matches(rows[k].Groups[2].Value, "<td class=\"num\">([^<]*)</td>").Select(m => m.Groups[1].Value).ToList();
            var exact = history[k].GetProperty("probabilityBest").EnumerateObject().Select(p => p.Value.GetDouble()).ToList();
            Assert.Equal(exact.Select(DesignCompiler.Rendering.Models.NumberText.Probability), shown);
        }
        var lines = Regex.Matches(html, "<polyline points=\"([^\"]*)\" fill=\"none\" stroke=\"#000\" stroke-width=\"1.6\"").Select(m => m.Groups[1].Value).ToList();
        Assert.All(lines, l => Assert.Equal(3, l.Split(' ').Length));
        Assert.Contains("the 72 plots recorded so far", html);

        // The density row's mean is the posterior mean status reports: (a + successes) / (a + b + plots) for a beta prior.
        foreach (var arm in status.GetProperty("arms").EnumerateArray())
            Assert.Contains(">mean " + DesignCompiler.Rendering.Models.NumberText.Significant(arm.GetProperty("posteriorMean").GetDouble()) + "<", html);
        AssertBlackAndWhite(html);
    }

    [Theory]
    [InlineData("nitrogen-rates.trial", "mean yield per plot (t/ha)")]
    [InlineData("aphid-margins.trial", "mean aphids per plot (aphids per 20 tillers)")]
    [InlineData("germination.trial", "emerged: chance for each of the 50 per plot")]
    public void The_density_axis_names_the_outcome_in_its_unit(string example, string axis)
    {
        using var round = new CompiledRound(example);
        var html = round.ReportText;
        Assert.Contains(">" + axis + "</text>", html);
        Assert.DoesNotContain("NaN", html);
        Assert.DoesNotContain("{{", html);
    }

    /// <summary>Lines differ by dash, marker and label and rows by place and name, never by colour: every stroke and fill is black, white or grey.</summary>
    private static void AssertBlackAndWhite(string html)
    {
        var colours = Regex.Matches(html, "(?:stroke|fill)=\"(#[0-9a-f]+|[a-z]+)\"").Select(m => m.Groups[1].Value).Distinct().ToList();
        Assert.All(colours, c => Assert.Contains(c, BlackAndWhite));
        Assert.Contains("product label, local regulations and qualified agronomic advice", html);
    }
}
