using DesignCompiler.Analysis.Rcbd;
using DesignCompiler.Binding;
using DesignCompiler.Syntax;

namespace DesignCompiler.Analysis.Trial;

/// <summary>
/// The classical randomized complete block analysis of a balanced trial: equal allocation and
/// complete blocks (every block of every round holds each arm exactly once). Each (round, block)
/// is a replicate; lost plots are estimated by Yates's missing-plot method (<see cref="RcbdAnalysis"/>).
/// An adaptive allocation is never balanced, so the section then says why it is left out.
/// </summary>
public static class RcbdFromTrial
{
    public static RcbdSection Of(CheckedDesign design, IReadOnlyList<AnalysisPlot> plots)
    {
        if (design.Policy.Kind != PolicyKind.Equal)
            return new RcbdSection(null, $"the allocation was adaptive ({design.Policy.Name}); the classical table assumes every arm in every block", []);
        var arms = design.Arms.Count;
        var replicates = plots.Select(p => (p.Round, p.Block)).Distinct().Order().ToList();
        if (replicates.Count < 2)
            return new RcbdSection(null, "there is only one block with plots; the table needs at least two replicates", []);
        var values = new double?[arms, replicates.Count];
        var seen = new int[arms, replicates.Count];
        for (var r = 0; r < replicates.Count; r++)
        {
            foreach (var p in plots.Where(p => (p.Round, p.Block) == replicates[r]))
            {
                seen[p.Arm, r]++;
                values[p.Arm, r] = p.Value;
            }
        }
        for (var r = 0; r < replicates.Count; r++)
            for (var a = 0; a < arms; a++)
                if (seen[a, r] != 1)
                    return new RcbdSection(null, FormattableString.Invariant(
                        $"block {design.Blocks[replicates[r].Block].Name} of round {replicates[r].Round} holds {design.Arms[a].Code} {seen[a, r]} times; complete blocks hold each arm once"), []);

        var result = RcbdAnalysis.Analyse(new RcbdTable(values));
        var names = replicates.Select(r => FormattableString.Invariant($"round {r.Round} {design.Blocks[r.Block].Name}")).ToList();
        return result.Value is { } anova
            ? new RcbdSection(anova, null, names)
            : new RcbdSection(null, result.Problem!.Message + " (" + result.Problem.Hint + ")", names);
    }
}
