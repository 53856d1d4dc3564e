using DesignCompiler.Binding;

namespace DesignCompiler.Simulation;

/// <summary>The <see cref="SimulationSetup"/> of a design simulated with given settings.</summary>
public static class SetupBuilder
{
    public static SimulationSetup Build(CheckedDesign design, IReadOnlyList<ScenarioInfo> scenarios, SimulationSettings settings)
    {
        var valueUnit = ValueUnit(design);
        return new SimulationSetup(
            design.Name, design.Hash, settings.Seed, design.Policy.Name, design.Outcome.Name, design.Outcome.Unit,
            design.Outcome.FamilyText, valueUnit, design.Rounds, design.PlotsPerRound, settings.Replications,
            settings.Margin, settings.MarginRule,
            design.Arms.Select(a => new ArmInfo(a.Code, a.Label, a.Index == design.Control)).ToList(),
            scenarios);
    }

    /// <summary>
    /// The unit of an arm's value: the currency when priced; otherwise the outcome's unit, except
    /// for bernoulli and binomial outcomes, whose value is a success probability without a unit.
    /// </summary>
    public static string? ValueUnit(CheckedDesign design) =>
        design.Valuation.HasPrice ? design.Valuation.Currency ?? "money"
        : design.Outcome.Family is OutcomeFamily.Bernoulli or OutcomeFamily.Binomial ? null
        : design.Outcome.Unit;
}
