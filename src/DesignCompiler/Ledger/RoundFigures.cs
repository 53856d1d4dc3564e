using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Ledger;

/// <summary>
/// The figures a round report draws beside the plan: each arm's posterior density from what the
/// round was planned on, and P(best) before any result and after each recorded round.
/// </summary>
public sealed record RoundFigures(PosteriorCurves Curves, IReadOnlyList<RoundPoint> History)
{
    /// <summary>Round 1 from the design alone: the priors.</summary>
    public static RoundFigures FromDesign(CheckedDesign design)
    {
        var model = OutcomeModels.For(design.Outcome);
        var state = new TrialState(design.Arms.Count);
        return new RoundFigures(PosteriorCurves.Of(design, model, state), ProbabilityBestHistory.PriorOnly(design, model));
    }

    /// <summary>Round <paramref name="round"/> of a trial in its ledger: everything recorded in the rounds before it.</summary>
    public static LedgerResult<RoundFigures> FromLedger(CheckedDesign design, LedgerHistory history, int round)
    {
        var model = OutcomeModels.For(design.Outcome);
        var before = TrialReplay.Before(design, history, round);
        if (before.Value is null) return LedgerResult<RoundFigures>.Fail(before.Diagnostics);
        var points = ProbabilityBestHistory.Of(design, model, history, round - 1);
        if (points.Value is null) return LedgerResult<RoundFigures>.Fail(points.Diagnostics);
        return LedgerResult<RoundFigures>.Ok(new RoundFigures(PosteriorCurves.Of(design, model, before.Value), points.Value));
    }
}
