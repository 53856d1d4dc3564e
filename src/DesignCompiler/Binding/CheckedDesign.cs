using DesignCompiler.Diagnostics;
using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>
/// A design that passed every check: immutable, with every default filled in, safe to
/// share between threads. Everything that came from text keeps its span so later stages
/// can point back at the line that caused a problem.
/// </summary>
public sealed class CheckedDesign
{
    internal CheckedDesign(
        SourceText source, string name, ulong seed, int rounds, OutcomeSpec outcome, Valuation valuation,
        PolicySpec policy, IReadOnlyList<ArmSpec> arms, int? control, IReadOnlyList<BlockSpec> blocks,
        IReadOnlyList<BoundLimit> bounds, IReadOnlyList<StockLimit> stocks, IReadOnlyList<WindowLimit> windows,
        IReadOnlyList<RestRule> restRules, IReadOnlyList<AfterRule> afterRules,
        IReadOnlyList<StopRule> stopRules, IReadOnlyList<DropRule> dropRules, IReadOnlyList<ScenarioSpec> scenarios)
    {
        Source = source;
        Name = name;
        Seed = seed;
        Rounds = rounds;
        Outcome = outcome;
        Valuation = valuation;
        Policy = policy;
        Arms = arms;
        Control = control;
        Blocks = blocks;
        Bounds = bounds;
        Stocks = stocks;
        Windows = windows;
        RestRules = restRules;
        AfterRules = afterRules;
        StopRules = stopRules;
        DropRules = dropRules;
        Scenarios = scenarios;
        Hash = DesignHash.Of(source.Content);
    }

    public SourceText Source { get; }
    public string Name { get; }

    /// <summary>SHA-256 of the design text, lower-case hex; printed short on every sheet.</summary>
    public string Hash { get; }

    public string ShortHash => Hash[..12];
    public ulong Seed { get; }
    public int Rounds { get; }
    public OutcomeSpec Outcome { get; }
    public Valuation Valuation { get; }
    public PolicySpec Policy { get; }
    public IReadOnlyList<ArmSpec> Arms { get; }

    /// <summary>Index of the control arm, if one is named.</summary>
    public int? Control { get; }

    public IReadOnlyList<BlockSpec> Blocks { get; }
    public IReadOnlyList<BoundLimit> Bounds { get; }
    public IReadOnlyList<StockLimit> Stocks { get; }
    public IReadOnlyList<WindowLimit> Windows { get; }
    public IReadOnlyList<RestRule> RestRules { get; }
    public IReadOnlyList<AfterRule> AfterRules { get; }
    public IReadOnlyList<StopRule> StopRules { get; }
    public IReadOnlyList<DropRule> DropRules { get; }
    public IReadOnlyList<ScenarioSpec> Scenarios { get; }

    /// <summary>How shares become whole plots (<c>rounding</c>; largest remainder unless written).</summary>
    public RoundingRule Rounding { get; init; } = RoundingRule.LargestRemainder;

    /// <summary>Whether a normal outcome's posterior adjusts for block and round effects (<c>model</c>).</summary>
    public ModelSpec Model { get; init; } = ModelSpec.Independent;

    public int PlotsPerRound => Blocks.Sum(b => b.Plots);

    /// <summary>
    /// The same design with every plot shared equally: same plots, blocks, rounds, limits, stop
    /// and drop rules, and model; the policy is 'equal'. <c>simulate</c> runs it beside the design
    /// so every report shows what adaptive allocation buys and costs.
    /// </summary>
    public CheckedDesign EqualTwin() =>
        new(Source, Name, Seed, Rounds, Outcome, Valuation, new PolicySpec(Syntax.PolicyKind.Equal, 0, false, default),
            Arms, Control, Blocks, Bounds, Stocks, Windows, RestRules, AfterRules, StopRules, DropRules, Scenarios)
        {
            Rounding = Rounding,
            Model = Model,
        };

    public ArmSpec? FindArm(string code) => Arms.FirstOrDefault(a => a.Code == code);

    public SourceLocation Locate(TextSpan span) => SourceLocation.In(Source, span);
}
