using DesignCompiler.Diagnostics;
using DesignCompiler.Syntax;

namespace DesignCompiler.Binding;

public sealed partial class DesignBinder
{
    private static readonly HashSet<string> ReservedCodes = [.. DesignGrammar.Keywords];

    private List<ArmSpec> BindArms(
        IReadOnlyList<ArmStatementSyntax> statements, DefaultPriorStatementSyntax? defaultPrior,
        OutcomeSpec? outcome, Valuation valuation, DesignSyntax syntax)
    {
        var fallback = defaultPrior is null ? null : BindPrior(defaultPrior.Prior, outcome);
        var arms = new List<ArmSpec>();
        var firstByCode = new Dictionary<string, ArmStatementSyntax>(StringComparer.Ordinal);
        var firstByLabel = new Dictionary<string, ArmStatementSyntax>(StringComparer.Ordinal);

        if (statements.Count > DesignLimits.MaxArms)
        {
            ReportWithHint(DiagnosticCatalog.OutOfRange, statements[DesignLimits.MaxArms].Code.Span,
                "no field trial sows this many arms at once; screen them in several trials, or remove arms from this one",
                "the number of arms", FormattableString.Invariant($"at most {DesignLimits.MaxArms}"), statements.Count);
            return arms;
        }

        foreach (var statement in statements)
        {
            var code = statement.Code.Name;
            if (ReservedCodes.Contains(code))
                Report(DiagnosticCatalog.ReservedArmCode, statement.Code.Span, code);
            if (firstByCode.TryGetValue(code, out var first))
            {
                Report(DiagnosticCatalog.DuplicateArm, statement.Code.Span, code, LineOf(first.Span));
                continue;
            }
            firstByCode[code] = statement;

            var label = statement.Label.Value.Trim();
            if (label.Length == 0) Report(DiagnosticCatalog.EmptyName, statement.Label.Span, "an arm's label");
            else if (firstByLabel.TryGetValue(label, out var sameLabel))
                Report(DiagnosticCatalog.DuplicateArmLabel, statement.Label.Span, sameLabel.Code.Name, code, label);
            else firstByLabel[label] = statement;

            var prior = BindArmPrior(statement, outcome, fallback, defaultPrior is not null);
            var cost = BindArmCost(statement, valuation);
            // An arm with a broken prior is still an arm: later lines that name it must not be
            // reported as naming an unknown arm. The stand-in prior never leaves the binder,
            // because the broken prior was reported as an error.
            arms.Add(new ArmSpec(arms.Count, code, label, prior ?? new BetaPriorSpec(1, 1, statement.Span), cost, statement.Span));
        }

        if (arms.Count < 2 && !IsBroken("arm") && !_bag.HasErrors)
        {
            var at = statements.Count > 0 ? statements[^1].Span : syntax.Name?.Span ?? syntax.Span;
            ReportWithHint(DiagnosticCatalog.TooFewArms, at, "add arms such as 'arm OV \"Oat + vetch\"'", arms.Count);
        }
        return arms;
    }

    private PriorSpec? BindArmPrior(ArmStatementSyntax statement, OutcomeSpec? outcome, PriorSpec? fallback, bool hasDefault)
    {
        var priors = statement.Options.OfType<ArmPriorOptionSyntax>().ToList();
        foreach (var repeat in priors.Skip(1))
            Report(DiagnosticCatalog.DuplicateArmOption, repeat.Span, statement.Code.Name, "prior");
        if (priors.Count > 0) return BindPrior(priors[0].Prior, outcome);
        if (fallback is not null) return fallback;
        // A default prior that was written but is broken has been reported already.
        if (hasDefault || IsBroken("default")) return null;
        ReportWithHint(DiagnosticCatalog.NoPrior, statement.Code.Span,
            "add 'prior " + SuggestedPrior(outcome) + "' to the arm, or a 'default prior' line", statement.Code.Name);
        return null;
    }

    private double BindArmCost(ArmStatementSyntax statement, Valuation valuation)
    {
        var costs = statement.Options.OfType<ArmCostOptionSyntax>().ToList();
        foreach (var repeat in costs.Skip(1))
            Report(DiagnosticCatalog.DuplicateArmOption, repeat.Span, statement.Code.Name, "cost");
        if (costs.Count == 0) return 0;
        if (!valuation.HasPrice && !IsBroken("price"))
            ReportWithHint(DiagnosticCatalog.CostWithoutPrice, costs[0].Span,
                "add a line such as 'price 180 \"EUR\"' (money per outcome unit)", statement.Code.Name);
        return Between(costs[0].Cost, "an arm's cost", -DesignLimits.MaxCost, DesignLimits.MaxCost) ?? 0;
    }

    /// <summary>A checked prior, or null after reporting that it does not fit the outcome or has bad parameters.</summary>
    private PriorSpec? BindPrior(PriorSyntax prior, OutcomeSpec? outcome)
    {
        if (outcome is not null && !Fits(prior, outcome.Family))
        {
            ReportWithHint(DiagnosticCatalog.PriorMismatch, prior.Span, null, PriorName(prior), outcome.FamilyText, SuggestedPrior(outcome));
            return null;
        }

        switch (prior)
        {
            case BetaPriorSyntax beta:
                var a = PriorParameter(beta.A, "a beta prior's a");
                var b = PriorParameter(beta.B, "a beta prior's b");
                return a is null || b is null ? null : new BetaPriorSpec(a.Value, b.Value, prior.Span);
            case NormalPriorSyntax normal:
                var mean = Between(normal.Mean, "a normal prior's mean", -DesignLimits.MaxMagnitude, DesignLimits.MaxMagnitude);
                var sd = Scale(normal.Sd, "a normal prior's sd");
                var noise = normal.Noise is null ? null : Scale(normal.Noise, "a normal prior's noise guess");
                var worth = normal.Worth is null ? null : Between(normal.Worth, "the plots' worth of a noise guess", DesignLimits.MinWorth, DesignLimits.MaxWorth);
                if (normal.Noise is not null && outcome?.NoiseSd is { } known)
                    Report(DiagnosticCatalog.NoiseGuessUnused, normal.Noise.Span, FormattableString.Invariant($"noise sd {known}"));
                if (mean is null || sd is null || (normal.Noise is not null && noise is null) || (normal.Worth is not null && worth is null))
                    return null;
                return new NormalPriorSpec(mean.Value, sd.Value, noise, worth, prior.Span);
            case GammaPriorSyntax gamma:
                var shape = PriorParameter(gamma.Shape, "a gamma prior's shape");
                var rate = PriorParameter(gamma.Rate, "a gamma prior's rate");
                return shape is null || rate is null ? null : new GammaPriorSpec(shape.Value, rate.Value, prior.Span);
            default:
                return null;
        }
    }

    private static bool Fits(PriorSyntax prior, OutcomeFamily family) => prior switch
    {
        BetaPriorSyntax => family is OutcomeFamily.Bernoulli or OutcomeFamily.Binomial,
        NormalPriorSyntax => family is OutcomeFamily.Normal,
        GammaPriorSyntax => family is OutcomeFamily.Count,
        _ => false,
    };

    private static string PriorName(PriorSyntax prior) => prior switch
    {
        BetaPriorSyntax => "beta",
        NormalPriorSyntax => "normal",
        _ => "gamma",
    };

    private static string SuggestedPrior(OutcomeSpec? outcome) => outcome?.Family switch
    {
        OutcomeFamily.Normal => "normal(mean M, sd S)",
        OutcomeFamily.Count => "gamma(shape K, rate R)",
        _ => "beta(1, 1)",
    };

    private int? BindControl(ControlStatementSyntax? statement, IReadOnlyList<ArmSpec> arms) =>
        statement is null ? null : ResolveArm(statement.Arm, arms);

    /// <summary>The index of a named arm, or null after reporting it unknown (with a near name as hint).</summary>
    private int? ResolveArm(IdentifierSyntax name, IReadOnlyList<ArmSpec> arms)
    {
        var arm = arms.FirstOrDefault(a => a.Code == name.Name);
        if (arm is not null) return arm.Index;
        if (!IsBroken("arm"))
            ReportWithHint(DiagnosticCatalog.UnknownArm, name.Span,
                Text.Suggestions.DidYouMean(name.Name, arms.Select(a => a.Code))
                    ?? "arms are: " + string.Join(", ", arms.Select(a => a.Code)),
                name.Name);
        return null;
    }
}
