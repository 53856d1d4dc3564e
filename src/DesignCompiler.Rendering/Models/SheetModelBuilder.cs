using DesignCompiler.Binding;
using DesignCompiler.Ledger;
using DesignCompiler.Planning;
using DesignCompiler.Rendering.Charts;
using DesignCompiler.Rendering.Status;

namespace DesignCompiler.Rendering.Models;

/// <summary>Formats a round plan into the model templates see. Formatting only: no figure is computed here.</summary>
public static class SheetModelBuilder
{
    /// <summary>Printed on every sheet: field work involves agrochemicals and machinery.</summary>
    public const string Caution =
        "Caution: apply every treatment following its product label, local regulations and qualified agronomic advice. " +
        "Wear the protective equipment the label requires, and keep people and animals out of treated plots for the time it states.";

    /// <summary>The model of a round; <paramref name="figures"/> (the report's charts) may be left out only for the plan JSON.</summary>
    public static SheetModel Build(RoundPlan plan, CheckedDesign design, string toolVersion, string? dateIssued = null, RoundFigures? figures = null)
    {
        var arms = plan.Arms.Select(Arm).ToList();
        var blocks = plan.Blocks.Select((b, j) => Block(plan, b, j, design)).ToList();
        var codes = plan.Arms.Select(a => a.Code).ToList();
        var history = figures?.History.Select(StatusModelBuilder.HistoryRow).ToList() ?? [];
        return new SheetModel(
            plan.Trial, plan.Round, plan.Rounds, plan.DesignHash, plan.DesignHash[..12],
            plan.Seed.ToString(System.Globalization.CultureInfo.InvariantCulture), toolVersion, plan.Policy,
            plan.OutcomeName, plan.OutcomeUnit ?? "", plan.OutcomeFamily, OutcomeValues(design.Outcome), plan.ValueUnit ?? "",
            dateIssued ?? "", plan.Plots, plan.PlotsRecorded, NumberText.Exact(plan.ProbabilityBestErrorBound), AccuracyText(plan.ProbabilityBestErrorBound), Caution, arms, blocks,
            history,
            figures is null ? null : ProbabilityBestChartLayout.Layout(plan.Rounds, codes, figures.History),
            figures is null ? null : DensityChartLayout.Layout(figures.Curves, arms, DensityAxis(design.Outcome)));
    }

    /// <summary>What the density chart's x axis measures: the arm's mean outcome, in the outcome's words.</summary>
    public static string DensityAxis(OutcomeSpec outcome) => outcome.Family switch
    {
        OutcomeFamily.Bernoulli => $"{outcome.Name}: chance per plot",
        OutcomeFamily.Binomial => FormattableString.Invariant($"{outcome.Name}: chance for each of the {outcome.Trials} per plot"),
        _ => "mean " + outcome.Name + " per plot" + (outcome.Unit is null ? "" : " (" + outcome.Unit + ")"),
    };

    /// <summary>What a crew may write in the outcome column, in words.</summary>
    public static string OutcomeValues(OutcomeSpec outcome) => outcome.Family switch
    {
        OutcomeFamily.Bernoulli => "1 (yes) or 0 (no)",
        OutcomeFamily.Binomial => FormattableString.Invariant($"a whole number from 0 to {outcome.Trials}"),
        OutcomeFamily.Count => "a whole count, 0 or more",
        _ => "a number" + (outcome.Unit is null ? "" : " in " + outcome.Unit),
    } + "; or 'missing: reason'";

    private static ArmModel Arm(ArmPlan arm) => new(
        arm.Code, arm.Label, arm.IsControl, StatusText(arm.Status), arm.Plots, arm.PlotsRecorded,
        NumberText.Exact(arm.TargetShare), NumberText.Percent(arm.TargetShare),
        NumberText.Exact(arm.ProbabilityBest), NumberText.Probability(arm.ProbabilityBest),
        NumberText.Exact(arm.PosteriorMean), NumberText.Significant(arm.PosteriorMean),
        NumberText.Exact(arm.CredibleLower), NumberText.Exact(arm.CredibleUpper),
        NumberText.Significant(arm.CredibleLower) + " to " + NumberText.Significant(arm.CredibleUpper),
        NumberText.Exact(arm.ExpectedLoss), NumberText.Significant(arm.ExpectedLoss));

    public static string StatusText(ArmStatus status) => status switch
    {
        ArmStatus.InPlay => "in play",
        ArmStatus.NotYetAvailable => "not yet available",
        ArmStatus.NoLongerAvailable => "no longer available",
        ArmStatus.OutOfStock => "out of stock",
        _ => "dropped",
    };

    private static BlockModel Block(RoundPlan plan, BlockPlan block, int index, CheckedDesign design)
    {
        var plots = plan.Assignments.Where(a => a.BlockIndex == index)
            .Select(a => new PlotModel(a.Block, a.PlotId, a.PlotIndex + 1, Text(a.Row), Text(a.Column), a.ArmCode, design.Arms[a.Arm].Label))
            .ToList();
        var counts = plan.Arms.Select(a => new CountModel(a.Code, a.Label, block.Counts[a.Index])).ToList();
        var hasLayout = block.Rows is not null && block.Columns is not null;
        var map = hasLayout
            ? Enumerable.Range(0, block.Rows!.Value)
                .Select(r => new MapRowModel(r + 1, plots.Skip(r * block.Columns!.Value).Take(block.Columns.Value).ToList()))
                .ToList()
            : [];
        return new BlockModel(block.Name, block.Plots, hasLayout, block.Rows ?? 0, block.Columns ?? 0, counts, plots, map);
    }

    private static string Text(int? value) => value?.ToString(System.Globalization.CultureInfo.InvariantCulture) ?? "";

    /// <summary>
    /// How exact the printed P(best) figures are: independent arms are integrated to about 1e-12;
    /// an adjusted model's correlated arms by a lattice rule whose error estimate is stated.
    /// </summary>
    public static string AccuracyText(double bound) =>
        !double.IsFinite(bound) ? "P(best) figures carry no error bound"
        : bound <= 1e-9 ? "P(best) figures are exact to the digits shown"
        : "P(best) figures are computed to within ±" + RoundedUp(bound) + " (estimated numerical error)";

    /// <summary>The bound rounded up to one significant digit, in plain decimals: 5.121e-5 reads "0.00006".</summary>
    private static string RoundedUp(double bound)
    {
        var exponent = (int)Math.Floor(Math.Log10(bound));
        var step = Math.Pow(10, exponent);
        var value = Math.Ceiling(bound / step * (1 - 1e-12)) * step;
        return NumberText.Fixed(value, Math.Max(0, -exponent));
    }
}
