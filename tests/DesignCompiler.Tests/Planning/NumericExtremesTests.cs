using System.Text;
using System.Text.Json;
using DesignCompiler.Planning;
using DesignCompiler.Rendering;
using DesignCompiler.Tests.Ledger;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Planning;

/// <summary>
/// Priors and data at the ends of what the language accepts, through the planner and all four round
/// files, and through the ledger and the status report: no NaN or infinity reaches any output, every
/// probability is in [0, 1] and they sum to 1 within <see cref="OutputInvariants.SumTolerance"/>.
/// Reference values: reference/extremes.py (mpmath 1.3.0), printed in reference/extremes.out.txt.
/// </summary>
public sealed class NumericExtremesTests
{
    private static string Bernoulli(string prior, int arms = 3, string policy = "thompson") =>
        $"trial \"Extremes\" {{\n  seed 11\n  rounds 3\n  outcome y: bernoulli\n  policy {policy}\n  default prior {prior}\n" +
        string.Concat(Enumerable.Range(0, arms).Select(i => $"  arm {(char)('A' + i)} \"Arm {(char)('A' + i)}\"\n")) +
        "  block one plots 12 layout 3 x 4\n  block two plots 12\n}\n";

    /// <summary>Plans the round after the recorded data and renders its files; asserts every invariant on both.</summary>
    private static RoundPlan PlanAndRender(string text, Action<TrialState> record)
    {
        var design = TestDesigns.FromText(text);
        var (planner, problem) = RoundPlanner.For(design);
        Assert.Null(problem);
        var state = new TrialState(design.Arms.Count);
        var first = planner!.Plan(state, 1);
        Assert.True(first.Plan is not null, string.Join("\n", first.Diagnostics.Select(d => d.Message)));
        Assert.Empty(OutputInvariants.PlanProblems(first.Plan!));
        state.Issue(first.Plan!);
        record(state);
        state.RoundsCompleted = 1;

        var result = planner.Plan(state, 2);
        Assert.True(result.Plan is not null, string.Join("\n", result.Diagnostics.Select(d => d.Message)) + result.StopReason);
        var plan = result.Plan!;
        Assert.Empty(OutputInvariants.PlanProblems(plan));
        foreach (var p in new[] { first.Plan!, plan })
        {
            var (files, problems) = RoundOutputs.Render(p, design, "extremes");
            Assert.Empty(problems);
            // CSV, HTML, JSON, Markdown, the round report and the workbook.
            Assert.Equal(6, files.Count);
            Assert.Empty(OutputInvariants.FileProblems(files));
        }
        return plan;
    }

    private static void RecordEach(TrialState state, int arm, int plots, Func<int, double> value)
    {
        for (var k = 0; k < plots; k++) state.Record(arm, value(k));
    }

    [Fact]
    public void A_beta_of_one_hundredth_prior_gives_finite_figures_and_the_reference_probability()
    {
        // Arm A: 3 successes in 5 plots; arms B and C nothing recorded, so still Beta(0.01, 0.01).
        var plan = PlanAndRender(Bernoulli("beta(0.01, 0.01)"), state => RecordEach(state, 0, 5, k => k < 3 ? 1 : 0));
        var a = plan.Arms[0];
        // Posterior mean (0.01 + 3) / (0.02 + 5): the beta-binomial conjugate update (Gelman et al., BDA, ch. 2; chapter from memory).
        Assert.Equal(3.01 / 5.02, a.PosteriorMean, 12);
        // B and C are identical, so P(best) is shared equally between them (symmetry; common practice).
        Assert.Equal(plan.Arms[1].ProbabilityBest, plan.Arms[2].ProbabilityBest, 12);
        // Beta(0.01, 0.01)'s 2.5 % quantile is 3.1115e-61 (extremes.py); the interval is not reversed or NaN.
        Assert.InRange(plan.Arms[1].CredibleLower, 0, 1e-50);
        Assert.InRange(plan.Arms[1].CredibleUpper, 1 - 1e-12, 1);
    }

    [Fact]
    public void Two_arms_under_a_beta_of_one_hundredth_prior_match_the_quadrature_reference()
    {
        var plan = PlanAndRender(Bernoulli("beta(0.01, 0.01)", arms: 2), state => RecordEach(state, 0, 5, k => k < 3 ? 1 : 0));
        // P(Beta(3.01, 2.01) > Beta(0.01, 0.01)) = 0.50244689932765379378 (extremes.py: mpmath quadrature of
        // f_X F_Y, Cook 2005). The tolerance is the planner's own stated error bound, or 1e-9.
        Assert.Equal(0.50244689932765379378, plan.Arms[0].ProbabilityBest, Math.Max(1e-9, plan.ProbabilityBestErrorBound));
        Assert.Equal(1, plan.Arms[0].ProbabilityBest + plan.Arms[1].ProbabilityBest, OutputInvariants.SumTolerance);
    }

    [Fact]
    public void A_beta_of_a_million_prior_gives_finite_figures_and_the_reference_probability()
    {
        // A: 10 successes in 10 plots; B: 10 failures in 10; C nothing. Prior Beta(1e6, 1e6).
        var plan = PlanAndRender(Bernoulli("beta(1000000, 1000000)"), state =>
        {
            RecordEach(state, 0, 10, _ => 1);
            RecordEach(state, 1, 10, _ => 0);
        });
        // Conjugate update: A is Beta(1e6 + 10, 1e6), mean (1e6 + 10) / (2e6 + 10).
        Assert.Equal((1e6 + 10) / (2e6 + 10), plan.Arms[0].PosteriorMean, 14);
        Assert.True(plan.Arms[0].CredibleLower < plan.Arms[0].PosteriorMean && plan.Arms[0].PosteriorMean < plan.Arms[0].CredibleUpper);
        // A ahead of C ahead of B, by a hair: the shift is 1/100 of a posterior sd.
        Assert.True(plan.Arms[0].ProbabilityBest > plan.Arms[2].ProbabilityBest && plan.Arms[2].ProbabilityBest > plan.Arms[1].ProbabilityBest);
    }

    [Fact]
    public void Two_arms_under_a_beta_of_a_million_prior_match_the_quadrature_reference()
    {
        var plan = PlanAndRender(Bernoulli("beta(1000000, 1000000)", arms: 2), state =>
        {
            RecordEach(state, 0, 10, _ => 1);
            RecordEach(state, 1, 10, _ => 0);
        });
        // P(Beta(1e6 + 10, 1e6) > Beta(1e6, 1e6 + 10)) from extremes.py (nested mpmath quadrature in logs).
        Assert.Equal(ReferenceHugePrior, plan.Arms[0].ProbabilityBest, Math.Max(1e-9, plan.ProbabilityBestErrorBound));
    }

    /// <summary>extremes.py, 'huge_prior P(A>B)' (15 digits).</summary>
    private const double ReferenceHugePrior = 0.503989347255809;

    [Theory]
    [InlineData(1e-6)]
    [InlineData(1e6)]
    public void Yields_of_a_millionth_and_a_million_give_finite_figures(double yield)
    {
        var text = File.ReadAllText(RepoPaths.Example("nitrogen-rates.trial"));
        // Every plot of round 1 the same yield: the sample spread is exactly zero.
        var plan = PlanAndRender(text, state =>
        {
            for (var arm = 0; arm < state.Statistics.Length; arm++) RecordEach(state, arm, state.PlotsIssued[arm], _ => yield);
        });
        // The posterior mean (kappa0 mu0 + n xbar) / (kappa0 + n) lies between the prior mean and the data mean
        // (Murphy 2007, eq. 86); the priors' means are 5.5 to 8.1.
        foreach (var arm in plan.Arms.Where(a => a.PlotsRecorded > 0))
            Assert.InRange(arm.PosteriorMean, Math.Min(yield, 5.5) - 1e-9, Math.Max(yield, 8.1) + 1e-9);
    }

    [Fact]
    public void Yields_of_a_millionth_beside_yields_of_a_million_make_the_million_arm_best()
    {
        var text = File.ReadAllText(RepoPaths.Example("nitrogen-rates.trial"));
        var plan = PlanAndRender(text, state =>
        {
            for (var arm = 0; arm < state.Statistics.Length; arm++)
                RecordEach(state, arm, state.PlotsIssued[arm], k => arm == 4 ? 1e6 + k : 1e-6 * (k + 1));
        });
        // The million arm leads. Its posterior is wide (the data sit a million prior sds from the prior mean,
        // and the unknown-noise posterior widens with that conflict: Murphy 2007, eq. 89's kappa0 n (xbar - mu0)^2
        // term), so its P(best) is near 1 but not 1 to the last digit.
        Assert.Equal(4, plan.Arms.MaxBy(a => a.ProbabilityBest)!.Index);
        Assert.InRange(plan.Arms[4].ProbabilityBest, 0.5, 1);
    }

    [Fact]
    public void Counts_of_zero_everywhere_through_the_ledger_give_finite_figures_on_every_output()
    {
        using var trial = new LedgerTrial("aphid-margins.trial");
        trial.Issue(1);
        var zeros = trial.Fill(1, 3, (string _, ref DesignCompiler.Randomness.Xoshiro256StarStar _) => "0");
        Assert.Equal(0, trial.Record(zeros).ExitCode);
        trial.Issue(2);

        AssertLedgerOutputsFinite(trial, 2);
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(trial.OutFolder(2), "aphid-margins-round2.json")));
        foreach (var arm in json.RootElement.GetProperty("arms").EnumerateArray())
        {
            // Gamma(2, 0.1) prior, n plots all 0: posterior Gamma(2, 0.1 + n), mean 2 / (0.1 + n) (gamma-Poisson conjugate; Gelman et al., BDA, ch. 2, chapter from memory).
            var n = arm.GetProperty("plotsRecorded").GetInt32();
            Assert.Equal(2 / (0.1 + n), arm.GetProperty("posteriorMean").GetDouble(), 12);
        }
    }

    [Fact]
    public void Two_thousand_recorded_plots_per_arm_through_the_ledger_give_the_reference_probability()
    {
        const string design = """
            trial "Two thousand a side" {
              seed 5
              rounds 2
              outcome stand: bernoulli
              policy equal
              default prior beta(1, 1)
              arm A "Alpha"
              arm B "Beta"
              plots 4000 per round
            }
            """;
        using var trial = new LedgerTrial("big.trial", design);
        trial.Issue(1);
        var seen = new Dictionary<string, int> { ["A"] = 0, ["B"] = 0 };
        // 240 successes of 2000 for A, 230 for B.
        var sheet = trial.Fill(1, 1, (string arm, ref DesignCompiler.Randomness.Xoshiro256StarStar _) =>
            seen[arm]++ < (arm == "A" ? 240 : 230) ? "1" : "0");
        var recorded = trial.Record(sheet);
        Assert.True(recorded.ExitCode == 0, recorded.Error);
        trial.Issue(2);

        AssertLedgerOutputsFinite(trial, 2);
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(trial.OutFolder(2), "big-round2.json")));
        var arms = json.RootElement.GetProperty("arms").EnumerateArray().ToList();
        Assert.Equal(2000, arms[0].GetProperty("plotsRecorded").GetInt32());
        // P(Beta(241, 1761) > Beta(231, 1771)) = 0.6881077236600087997003313: extremes.py, by mpmath quadrature
        // and exactly by Miller's (2015) finite sum in rational arithmetic; the two agree to 25 digits.
        Assert.Equal(0.6881077236600087997003313, arms[0].GetProperty("probabilityBest").GetDouble(), 1e-10);
        Assert.Equal(1, arms.Sum(a => a.GetProperty("probabilityBest").GetDouble()), OutputInvariants.SumTolerance);
    }

    /// <summary>The round's four files and the status report in every format: no NaN or infinity anywhere.</summary>
    private static void AssertLedgerOutputsFinite(LedgerTrial trial, int round)
    {
        var files = Directory.GetFiles(trial.OutFolder(round)).Select(f => (Path.GetFileName(f), File.ReadAllBytes(f))).ToList();
        // CSV, HTML, JSON, Markdown, the round report and the workbook.
        Assert.Equal(6, files.Count);
        foreach (var format in new[] { "json", "html", "text" })
        {
            var status = trial.Status(format);
            Assert.True(status.ExitCode == 0, status.Error);
            files.Add(("status." + format, Encoding.UTF8.GetBytes(status.Out)));
        }
        Assert.Empty(OutputInvariants.FileProblems(files));
    }
}
