using DesignCompiler.Diagnostics;
using DesignCompiler.Syntax;

namespace DesignCompiler.Binding;

public sealed partial class DesignBinder
{
    private OutcomeSpec? BindOutcome(OutcomeStatementSyntax? statement, DesignSyntax syntax)
    {
        if (statement is null)
        {
            ReportMissing("outcome", "say what is measured on each plot",
                "add a line such as 'outcome established: bernoulli' or 'outcome yield \"t/ha\": normal noise unknown'", syntax);
            return null;
        }

        var unit = statement.Unit?.Value;
        switch (statement.Family)
        {
            case BernoulliFamilySyntax:
                return new OutcomeSpec(statement.Name.Name, unit, OutcomeFamily.Bernoulli, 1, null, statement.Span);
            case BinomialFamilySyntax binomial:
                var trials = Whole(binomial.Trials, "the number of trials per plot (binomial of N)", 1, DesignLimits.MaxBinomialTrials);
                return trials is null ? null : new OutcomeSpec(statement.Name.Name, unit, OutcomeFamily.Binomial, trials.Value, null, statement.Span);
            case NormalFamilySyntax normal:
                double? sd = null;
                if (normal.NoiseSd is { } written)
                {
                    sd = Scale(written, "the noise sd");
                    if (sd is null) return null;
                }
                return new OutcomeSpec(statement.Name.Name, unit, OutcomeFamily.Normal, 1, sd, statement.Span);
            default:
                return new OutcomeSpec(statement.Name.Name, unit, OutcomeFamily.Count, 1, null, statement.Span);
        }
    }

    private Valuation BindValuation(GoalStatementSyntax? goal, PriceStatementSyntax? price)
    {
        var direction = goal?.Direction.Keyword == "minimize" ? Goal.Minimize : Goal.Maximize;
        double? value = price is null ? null : Between(price.Value, "the price per outcome unit", DesignLimits.MinScale, DesignLimits.MaxPrice);
        return new Valuation(direction, value, price?.Currency?.Value);
    }

    private PolicySpec BindPolicy(PolicyStatementSyntax? statement, int? rounds, OutcomeSpec? outcome)
    {
        if (statement is null) return PolicySpec.Default;
        var policy = statement.Policy;
        var parameter = policy.Parameter;
        switch (policy.Kind)
        {
            case PolicyKind.TopTwoThompson:
                var beta = parameter is null ? PolicySpec.DefaultTopTwoBeta
                    : Real(parameter, "top-two thompson's beta", "between 0 and 1, exclusive", v => v is > 0 and < 1);
                return new PolicySpec(policy.Kind, beta ?? PolicySpec.DefaultTopTwoBeta, false, policy.Span);
            case PolicyKind.KlUcb:
                var c = parameter is null ? PolicySpec.DefaultKlUcbC : Real(parameter, "kl-ucb's c", "0 or more", v => v >= 0);
                return new PolicySpec(policy.Kind, c ?? PolicySpec.DefaultKlUcbC, false, policy.Span);
            case PolicyKind.EpsilonGreedy:
                var epsilon = Probability(parameter!, "epsilon");
                return new PolicySpec(policy.Kind, epsilon ?? 0, policy.Decreasing, policy.Span);
            case PolicyKind.ExploreThenCommit:
                var k = Whole(parameter!, "the rounds of exploration", 1, rounds ?? DesignLimits.MaxRounds);
                return new PolicySpec(policy.Kind, k ?? 1, false, policy.Span);
            default:
                return new PolicySpec(policy.Kind, 0, false, policy.Span);
        }
    }
}
