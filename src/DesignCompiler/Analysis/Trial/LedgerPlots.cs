using DesignCompiler.Binding;
using DesignCompiler.Ledger;

namespace DesignCompiler.Analysis.Trial;

/// <summary>The plots of every recorded round of a ledger, matched to the design by arm code and block name.</summary>
public static class LedgerPlots
{
    /// <summary>Plots of rounds that have results; a plot recorded as missing has a null value. Arms or blocks the design does not name are listed in <c>Unknown</c>.</summary>
    public static (IReadOnlyList<AnalysisPlot> Plots, IReadOnlyList<string> Unknown) Of(CheckedDesign design, LedgerHistory history)
    {
        var arms = design.Arms.ToDictionary(a => a.Code, a => a.Index, StringComparer.Ordinal);
        var blocks = design.Blocks.Select((b, j) => (b.Name, j)).ToDictionary(x => x.Name, x => x.j, StringComparer.Ordinal);
        var plots = new List<AnalysisPlot>();
        var unknown = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var round in history.Rounds.Where(r => r.Recording is not null))
        {
            var outcomes = round.Recording!.Outcomes.ToDictionary(o => o.Ordinal);
            for (var k = 0; k < round.Plots.Count; k++)
            {
                var plot = round.Plots[k];
                if (!arms.TryGetValue(plot.ArmCode, out var arm)) { unknown.Add("arm " + plot.ArmCode); continue; }
                if (!blocks.TryGetValue(plot.Block, out var block)) { unknown.Add("block " + plot.Block); continue; }
                plots.Add(new AnalysisPlot(round.Round, block, arm, outcomes.TryGetValue(k, out var o) ? o.Value : null));
            }
        }
        return (plots, unknown.ToList());
    }
}
