using System.Globalization;
using DesignCompiler.Ledger;
using DesignCompiler.Rendering.Charts;
using DesignCompiler.Rendering.Models;

namespace DesignCompiler.Rendering.Status;

/// <summary>Formats a <see cref="TrialStatus"/> into the model the status templates see. Formatting only.</summary>
public static class StatusModelBuilder
{
    public static StatusModel Build(TrialStatus status, string toolVersion)
    {
        var arms = status.Arms.Select(a => new StatusArmModel(
            a.Code, a.Label, a.IsControl, StatusText(a), a.PlotsIssued, a.PlotsRecorded, a.PlotsMissing,
            NumberText.Exact(a.PosteriorMean), NumberText.Significant(a.PosteriorMean),
            NumberText.Exact(a.CredibleLower), NumberText.Exact(a.CredibleUpper),
            NumberText.Significant(a.CredibleLower) + " to " + NumberText.Significant(a.CredibleUpper),
            NumberText.Exact(a.ProbabilityBest), NumberText.Probability(a.ProbabilityBest),
            NumberText.Exact(a.ExpectedLoss), NumberText.Significant(a.ExpectedLoss))).ToList();

        var rules = status.Rules.Select(r => new StatusRuleModel(
            r.Kind == RuleKind.Stop ? "stop" : "drop", r.Rule, r.InForce, r.Holds, r.Arms, r.Finding)).ToList();
        var stocks = status.Stocks.Select(s => new StatusStockModel(s.Arm, s.Stock, s.Used, s.Left)).ToList();
        var history = status.History.Select(HistoryRow).ToList();
        var amendments = status.Amendments.Select(a => new StatusAmendmentModel(
            a.Entry.Seq.ToString(CultureInfo.InvariantCulture), a.Entry.At, a.Entry.User, a.OldHash[..12], a.NewHash[..12], a.Reason)).ToList();

        return new StatusModel(
            status.Trial, status.DesignHash, status.DesignHash[..12], status.HeadHash[..12], status.Seed.ToString(CultureInfo.InvariantCulture), toolVersion,
            status.Rounds, status.RoundsIssued, status.RoundsRecorded, status.PlotsIssued, status.PlotsRecorded, status.PlotsMissing,
            status.OutcomeName, status.OutcomeUnit ?? "", status.OutcomeFamily, status.ValueUnit ?? "", status.Minimize ? "minimize" : "maximize",
            arms, rules, stocks, history, amendments,
            NextKindText(status.Next.Kind), status.Next.Round.ToString(CultureInfo.InvariantCulture), status.Next.Text,
            ProbabilityBestChartLayout.Layout(status.Rounds, status.Arms.Select(a => a.Code).ToList(), status.History));
    }

    /// <summary>One point of the P(best) history: "prior", or "after round k", with every arm's P(best) exact and rounded.</summary>
    public static StatusRoundModel HistoryRow(RoundPoint point) => new(
        point.RoundsRecorded,
        point.RoundsRecorded == 0 ? "prior" : "after round " + point.RoundsRecorded.ToString(CultureInfo.InvariantCulture),
        point.ProbabilityBest.Select(NumberText.Exact).ToList(),
        point.ProbabilityBest.Select(NumberText.Probability).ToList());

    private static string StatusText(ArmStanding arm) =>
        arm.Dropped ? "dropped"
        : arm.LastStatus is { } last ? SheetModelBuilder.StatusText(last)
        : "not yet sown";

    private static string NextKindText(NextStepKind kind) => kind switch
    {
        NextStepKind.CompileNext => "compile-next",
        NextStepKind.AwaitResults => "await-results",
        NextStepKind.Stopped => "stopped",
        NextStepKind.Complete => "complete",
        _ => "blocked",
    };
}
