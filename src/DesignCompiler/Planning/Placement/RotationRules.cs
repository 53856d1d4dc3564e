using DesignCompiler.Binding;

namespace DesignCompiler.Planning.Placement;

/// <summary>
/// Which arms each plot may not grow this round, from the rotation rules and the arms the
/// plot grew in earlier rounds. Plots are numbered in design order (block by block).
/// </summary>
public sealed class RotationRules
{
    private readonly bool[,] _forbidden;

    private RotationRules(bool[,] forbidden, string?[,] reasons)
    {
        _forbidden = forbidden;
        Reasons = reasons;
    }

    /// <summary>Why a plot may not grow an arm, in words for messages (null where it may).</summary>
    public string?[,] Reasons { get; }

    public bool IsForbidden(int plot, int arm) => _forbidden[plot, arm];

    public bool Any { get; private init; }

    // Rules that forbid nothing: what every round of a design without rotation rules gets, without allocating.
    private static readonly RotationRules None = new(new bool[0, 0], new string?[0, 0]) { Any = false };

    public static RotationRules For(CheckedDesign design, int round, IReadOnlyList<int[]> history)
    {
        if (design.RestRules.Count == 0 && design.AfterRules.Count == 0) return None;
        var plots = design.PlotsPerRound;
        var arms = design.Arms.Count;
        var forbidden = new bool[plots, arms];
        var reasons = new string?[plots, arms];
        var any = false;

        foreach (var rule in design.RestRules)
        {
            // Rounds round−1 … round−r are the ones whose arm must rest now.
            for (var back = 1; back <= rule.Rounds && back <= history.Count && back < round; back++)
            {
                var past = history[round - 1 - back];
                for (var plot = 0; plot < plots && plot < past.Length; plot++)
                {
                    var arm = past[plot];
                    if (!rule.Arms.Contains(arm) || forbidden[plot, arm]) continue;
                    forbidden[plot, arm] = true;
                    reasons[plot, arm] = FormattableString.Invariant($"grew {design.Arms[arm].Code} in round {round - back}");
                    any = true;
                }
            }
        }

        if (round >= 2 && history.Count >= round - 1)
        {
            var last = history[round - 2];
            foreach (var rule in design.AfterRules)
            {
                for (var plot = 0; plot < plots && plot < last.Length; plot++)
                {
                    if (last[plot] != rule.Previous || forbidden[plot, rule.Arm]) continue;
                    forbidden[plot, rule.Arm] = true;
                    reasons[plot, rule.Arm] = FormattableString.Invariant($"grew {design.Arms[rule.Previous].Code} in round {round - 1}");
                    any = true;
                }
            }
        }
        return new RotationRules(forbidden, reasons) { Any = any };
    }

    /// <summary>How many plots of each block may grow each arm: caps for the arms × blocks table.</summary>
    public int[,] AllowedPlots(CheckedDesign design)
    {
        var allowed = new int[design.Arms.Count, design.Blocks.Count];
        var plot = 0;
        foreach (var block in design.Blocks)
        {
            for (var k = 0; k < block.Plots; k++, plot++)
                for (var arm = 0; arm < design.Arms.Count; arm++)
                    if (!_forbidden[plot, arm]) allowed[arm, block.Index]++;
        }
        return allowed;
    }
}
