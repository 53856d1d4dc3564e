using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Planning.Families;

namespace DesignCompiler.Ledger;

/// <summary>P(best) of every arm before any result and after each of the first recorded rounds, replayed from the ledger.</summary>
public static class ProbabilityBestHistory
{
    public static LedgerResult<IReadOnlyList<RoundPoint>> Of(CheckedDesign design, IOutcomeModel model, LedgerHistory history, int recordedRounds)
    {
        var points = new List<RoundPoint>();
        for (var k = 0; k <= recordedRounds; k++)
        {
            var after = TrialReplay.AfterRecorded(design, history, k);
            if (after.Value is null) return LedgerResult<IReadOnlyList<RoundPoint>>.Fail(after.Diagnostics);
            points.Add(new RoundPoint(k, ArmAssessment.Of(design, model, after.Value).Summary.ProbabilityBest.ToList()));
        }
        return LedgerResult<IReadOnlyList<RoundPoint>>.Ok(points);
    }

    /// <summary>Round 1 from the design alone: only the prior.</summary>
    public static IReadOnlyList<RoundPoint> PriorOnly(CheckedDesign design, IOutcomeModel model) =>
        [new RoundPoint(0, ArmAssessment.Of(design, model, new TrialState(design.Arms.Count)).Summary.ProbabilityBest.ToList())];
}
