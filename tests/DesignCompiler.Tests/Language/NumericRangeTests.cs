using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Rendering;
using DesignCompiler.Tests.Testing;
using DesignCompiler.Text;

namespace DesignCompiler.Tests.Language;

/// <summary>
/// Numbers at the far ends of what a double holds, in priors, prices, costs and scenarios. Probing with
/// them found designs that checked clean and then crashed the planner (a prior sd of 1e-300, a mean of
/// 1e200 with sd 1, gamma(shape 1e300, rate 1e-300), a noise guess worth 0.01 plots). Each is now refused
/// at the number, naming the range (<see cref="DesignLimits"/> says why each range is what it is), and
/// designs at the very ends of every range plan two rounds with finite figures.
/// </summary>
public sealed class NumericRangeTests
{
    private static string Example(string name) => File.ReadAllText(RepoPaths.Example(name));

    public static TheoryData<string, string, string, string> Refused() => new()
    {
        // example, text to replace, replacement, the message expected at the replacement's first number
        { "aphid-margins.trial", "gamma(shape 2, rate 0.1)", "gamma(shape 1e300, rate 0.1)", "a gamma prior's shape must be between 1e-6 and 1e12, not 1e300" },
        { "aphid-margins.trial", "gamma(shape 2, rate 0.1)", "gamma(shape 2, rate 1e-300)", "a gamma prior's rate must be between 1e-6 and 1e12, not 1e-300" },
        { "cover-crops.trial", "beta(2, 2)", "beta(1e300, 2)", "a beta prior's a must be between 1e-6 and 1e12, not 1e300" },
        { "cover-crops.trial", "beta(2, 2)", "beta(2, 1e-300)", "a beta prior's b must be between 1e-6 and 1e12, not 1e-300" },
        { "nitrogen-rates.trial", "mean 8.1, sd 1.5", "mean 1e200, sd 1.5", "a normal prior's mean must be between -1e9 and 1e9, not 1e200" },
        { "nitrogen-rates.trial", "mean 8.1, sd 1.5", "mean 8.1, sd 1e-300", "a normal prior's sd must be between 1e-6 and 1e9, not 1e-300" },
        { "nitrogen-rates.trial", "sd 1.5, noise 0.8 worth 4 plots) cost 264", "sd 1.5, noise 1e300 worth 4 plots) cost 264", "a normal prior's noise guess must be between 1e-6 and 1e9, not 1e300" },
        { "nitrogen-rates.trial", "noise 0.8 worth 4 plots) cost 264", "noise 0.8 worth 0.01 plots) cost 264", "the plots' worth of a noise guess must be between 0.1 and 1e6, not 0.01" },
        { "nitrogen-rates.trial", "price 210", "price 1e300", "the price per outcome unit must be between 1e-6 and 1e6, not 1e300" },
        { "nitrogen-rates.trial", "cost 264", "cost 1e300", "an arm's cost must be between -1e12 and 1e12, not 1e300" },
        { "nitrogen-rates.trial", "N0 5.9", "N0 1e300", "is outside what a normal noise unknown outcome can take: a number between -1e9 and 1e9" },
        { "aphid-margins.trial", "BARE 22", "BARE 1e300", "is outside what a count outcome can take: a mean count from 0 to 1e9" },
    };

    [Theory]
    [MemberData(nameof(Refused))]
    public void A_number_past_its_range_is_refused_at_the_number(string example, string from, string to, string message)
    {
        var original = Example(example);
        Assert.Contains(from, original);
        var text = original.Replace(from, to, StringComparison.Ordinal);
        var source = new SourceText(example, text);

        var diagnostics = Checker.Diagnose(source);

        ParserRobustnessTests.AssertWellBehaved(text);
        var problem = Assert.Single(diagnostics, d => d.Message.Contains(message, StringComparison.Ordinal));
        Assert.Equal(Diagnostics.Severity.Error, problem.Severity);
        // It points at the offending number: somewhere inside the replaced text.
        var at = text.IndexOf(to, StringComparison.Ordinal);
        Assert.InRange(problem.Location.Span.Start, at, at + to.Length - 1);
    }

    public static TheoryData<string> AtTheEnds() =>
    [
        "outcome y: bernoulli\n  arm A \"a\" prior beta(0.000001, 0.000001)\n  arm B \"b\" prior beta(1000000000000, 1000000000000)\n  arm C \"c\" prior beta(0.000001, 1000000000000)",
        "outcome y: count\n  arm A \"a\" prior gamma(shape 0.000001, rate 0.000001)\n  arm B \"b\" prior gamma(shape 1e12, rate 1e12)\n  arm C \"c\" prior gamma(shape 1e12, rate 1e-6)",
        "outcome y: normal noise unknown\n  price 1e6 \"EUR\"\n  arm A \"a\" prior normal(mean 1e9, sd 1e-6, noise 1e-6 worth 0.1 plots) cost 1e12\n" +
            "  arm B \"b\" prior normal(mean -1e9, sd 1e9, noise 1e9 worth 1e6 plots) cost -1e12\n  arm C \"c\" prior normal(mean 0, sd 1e-6, noise 1e9 worth 0.1 plots)",
        "outcome y: normal noise sd 0.000001\n  arm A \"a\" prior normal(mean 1e9, sd 1e-6)\n  arm B \"b\" prior normal(mean 1e9, sd 1e9)\n  arm C \"c\" prior normal(mean -1e9, sd 1e-6)",
    ];

    [Theory]
    [MemberData(nameof(AtTheEnds))]
    public void Designs_at_the_ends_of_every_range_plan_two_rounds_with_finite_figures(string body)
    {
        var design = TestDesigns.FromText($"trial \"Ends\" {{\n  seed 3\n  rounds 3\n  policy thompson\n  {body}\n  plots 24 per round\n}}\n");
        var planner = RoundPlanner.For(design).Planner!;
        var state = new TrialState(design.Arms.Count);
        var first = planner.Plan(state, 1);
        Assert.True(first.Plan is not null, string.Join("\n", first.Diagnostics.Select(d => d.Message)));
        Assert.Empty(OutputInvariants.PlanProblems(first.Plan!));
        state.Issue(first.Plan!);
        // Every plot at the far end of what a sheet accepts for the family, alternating with its other end.
        var model = planner.Model;
        var (low, high) = design.Outcome.Family switch
        {
            OutcomeFamily.Bernoulli => (0.0, 1.0),
            OutcomeFamily.Count => (0.0, DesignLimits.MaxCount),
            _ => (-DesignLimits.MaxMagnitude, DesignLimits.MaxMagnitude),
        };
        Assert.True(model.Accepts(low).Ok && model.Accepts(high).Ok);
        for (var arm = 0; arm < design.Arms.Count; arm++)
            for (var k = 0; k < state.PlotsIssued[arm]; k++) state.Record(arm, (k + arm) % 2 == 0 ? high : low);
        state.RoundsCompleted = 1;

        var second = planner.Plan(state, 2);

        Assert.True(second.Plan is not null, string.Join("\n", second.Diagnostics.Select(d => d.Message)) + second.StopReason);
        Assert.Empty(OutputInvariants.PlanProblems(second.Plan!));
        var (files, problems) = RoundOutputs.Render(second.Plan!, design, "ends");
        Assert.Empty(problems);
        Assert.Empty(OutputInvariants.FileProblems(files));
    }
}
