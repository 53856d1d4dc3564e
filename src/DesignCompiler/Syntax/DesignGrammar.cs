using DesignCompiler.Text;
using Sprache;
using static DesignCompiler.Syntax.TokenGrammar;

namespace DesignCompiler.Syntax;

/// <summary>
/// One parser field per production of grammar/trial.ebnf, named like the nonterminal
/// (trial-header is <see cref="TrialHeader"/>). Fields are declared bottom-up so that
/// each is built before the fields that use it. The statement-level recovery that
/// lets one run report every broken line lives in <see cref="StatementRecovery"/>.
/// </summary>
internal static class DesignGrammar
{
    private static Parser<TNode> Node<T, TNode>(Parser<T> parser, Func<T, TextSpan, TNode> make) => Located(parser, make);

    // --- the trial as a whole -------------------------------------------------
    internal static readonly Parser<StatementSyntax> SeedStatement =
        Node(Keyword("seed").Then(_ => Number), (v, s) => new SeedStatementSyntax(v, s));

    internal static readonly Parser<StatementSyntax> RoundsStatement =
        Node(Keyword("rounds").Then(_ => Number), (v, s) => new RoundsStatementSyntax(v, s));

    internal static readonly Parser<StatementSyntax> GoalStatement =
        Node(Keyword("goal").Then(_ => Keyword("maximize").Or(Keyword("minimize"))), (v, s) => new GoalStatementSyntax(v, s));

    internal static readonly Parser<StatementSyntax> PriceStatement =
        Node(
            from keyword in Keyword("price")
            from value in Number
            from currency in StringLiteral.Optional()
            select (value, currency: currency.GetOrDefault()),
            (v, s) => new PriceStatementSyntax(v.value, v.currency, s));

    // --- what is measured on each plot ---------------------------------------
    internal static readonly Parser<FamilySyntax> BernoulliFamily =
        Node(Keyword("bernoulli"), (_, s) => new BernoulliFamilySyntax(s));

    internal static readonly Parser<FamilySyntax> BinomialFamily =
        Node(Keyword("binomial").Then(_ => Keyword("of")).Then(_ => Number), (n, s) => new BinomialFamilySyntax(n, s));

    /// <summary>The noise sd, or null for <c>noise unknown</c>.</summary>
    internal static readonly Parser<NumberSyntax?> Noise =
        Keyword("noise").Then(_ =>
            Keyword("sd").Then(_ => Number).Select(n => (NumberSyntax?)n)
                .Or(Keyword("unknown").Select(_ => (NumberSyntax?)null)));

    internal static readonly Parser<FamilySyntax> NormalFamily =
        Node(Keyword("normal").Then(_ => Noise), (sd, s) => new NormalFamilySyntax(sd, s));

    internal static readonly Parser<FamilySyntax> CountFamily =
        Node(Keyword("count"), (_, s) => new CountFamilySyntax(s));

    internal static readonly Parser<FamilySyntax> Family =
        BernoulliFamily.Or(BinomialFamily).Or(NormalFamily).Or(CountFamily).Named("an outcome family (bernoulli, binomial of N, normal, count)");

    internal static readonly Parser<StatementSyntax> OutcomeStatement =
        Node(
            from keyword in Keyword("outcome")
            from name in Identifier
            from unit in StringLiteral.Optional()
            from colon in Symbol(":")
            from family in Family
            select (name, unit: unit.GetOrDefault(), family),
            (v, s) => new OutcomeStatementSyntax(v.name, v.unit, v.family, s));

    // --- how plots are shared out --------------------------------------------
    internal static readonly Parser<PolicySyntax> ThompsonPolicy =
        Node(Keyword("thompson"), (_, s) => new PolicySyntax(PolicyKind.Thompson, null, false, s));

    internal static readonly Parser<PolicySyntax> TopTwoPolicy =
        Node(
            from top in Keyword("top-two")
            from thompson in Keyword("thompson")
            from beta in Keyword("beta").Then(_ => Number).Optional()
            select beta.GetOrDefault(),
            (beta, s) => new PolicySyntax(PolicyKind.TopTwoThompson, beta, false, s));

    internal static readonly Parser<PolicySyntax> Ucb1Policy =
        Node(Keyword("ucb1"), (_, s) => new PolicySyntax(PolicyKind.Ucb1, null, false, s));

    internal static readonly Parser<PolicySyntax> KlUcbPolicy =
        Node(Keyword("kl-ucb").Then(_ => Keyword("c").Then(_ => Number).Optional()),
            (c, s) => new PolicySyntax(PolicyKind.KlUcb, c.GetOrDefault(), false, s));

    internal static readonly Parser<PolicySyntax> EpsilonGreedyPolicy =
        Node(
            from keyword in Keyword("epsilon-greedy")
            from epsilonWord in Keyword("epsilon")
            from epsilon in Number
            from decreasing in Keyword("decreasing").Optional()
            select (epsilon, decreasing.IsDefined),
            (v, s) => new PolicySyntax(PolicyKind.EpsilonGreedy, v.epsilon, v.IsDefined, s));

    internal static readonly Parser<PolicySyntax> ExploreCommitPolicy =
        Node(
            from keyword in Keyword("explore-then-commit")
            from rounds in Number
            from unit in Keyword("rounds").Or(Keyword("round"))
            select rounds,
            (k, s) => new PolicySyntax(PolicyKind.ExploreThenCommit, k, false, s));

    internal static readonly Parser<PolicySyntax> EqualPolicy =
        Node(Keyword("equal"), (_, s) => new PolicySyntax(PolicyKind.Equal, null, false, s));

    internal static readonly Parser<PolicySyntax> Policy =
        ThompsonPolicy.Or(TopTwoPolicy).Or(Ucb1Policy).Or(KlUcbPolicy).Or(EpsilonGreedyPolicy)
            .Or(ExploreCommitPolicy).Or(EqualPolicy)
            .Named("a policy (thompson, top-two thompson, ucb1, kl-ucb, epsilon-greedy, explore-then-commit, equal)");

    internal static readonly Parser<StatementSyntax> PolicyStatement =
        Node(Keyword("policy").Then(_ => Policy), (p, s) => new PolicyStatementSyntax(p, s));

    internal static readonly Parser<StatementSyntax> RoundingStatement =
        Node(Keyword("rounding").Then(_ => Keyword("largest-remainder").Or(Keyword("randomized"))
                .Named("'largest-remainder' or 'randomized'")),
            (method, s) => new RoundingStatementSyntax(method, s));

    // --- how the posterior treats the field -------------------------------------
    /// <summary>(adjusts for block, adjusts for round).</summary>
    internal static readonly Parser<(bool Block, bool Round)> AdjustedTerms =
        Keyword("block").Then(_ => Keyword("and").Then(_ => Keyword("round")).Optional())
            .Select(andRound => (true, andRound.IsDefined))
            .Or(Keyword("round").Return((false, true)))
            .Named("'block', 'block and round' or 'round'");

    internal static readonly Parser<StatementSyntax> ModelStatement =
        Node(
            Keyword("model").Then(_ =>
                Keyword("independent").Return((Block: false, Round: false))
                    .Or(Keyword("adjusts").Then(_ => Keyword("for")).Then(_ => AdjustedTerms))
                    .Named("'independent' or 'adjusts for block [and round]'")),
            (terms, s) => new ModelStatementSyntax(terms.Block, terms.Round, s));

    // --- priors ----------------------------------------------------------------
    internal static readonly Parser<PriorSyntax> BetaPrior =
        Node(
            from keyword in Keyword("beta")
            from open in Symbol("(")
            from a in Number
            from comma in Symbol(",")
            from b in Number
            from close in Symbol(")")
            select (a, b),
            (v, s) => new BetaPriorSyntax(v.a, v.b, s));

    internal static readonly Parser<PriorSyntax> NormalPrior =
        Node(
            from keyword in Keyword("normal")
            from open in Symbol("(")
            from meanWord in Keyword("mean")
            from mean in Number
            from comma in Symbol(",")
            from sdWord in Keyword("sd")
            from sd in Number
            from noise in (
                from comma2 in Symbol(",")
                from noiseWord in Keyword("noise")
                from guess in Number
                from worth in (
                    from worthWord in Keyword("worth")
                    from plots in Number
                    from plotsWord in Keyword("plots")
                    select plots).Optional()
                select (guess, worth: worth.GetOrDefault())).Optional()
            from close in Symbol(")")
            select (mean, sd, noise),
            (v, s) => new NormalPriorSyntax(v.mean, v.sd,
                v.noise.IsDefined ? v.noise.Get().guess : null,
                v.noise.IsDefined ? v.noise.Get().worth : null, s));

    internal static readonly Parser<PriorSyntax> GammaPrior =
        Node(
            from keyword in Keyword("gamma")
            from open in Symbol("(")
            from shapeWord in Keyword("shape")
            from shape in Number
            from comma in Symbol(",")
            from rateWord in Keyword("rate")
            from rate in Number
            from close in Symbol(")")
            select (shape, rate),
            (v, s) => new GammaPriorSyntax(v.shape, v.rate, s));

    internal static readonly Parser<PriorSyntax> Prior =
        BetaPrior.Or(NormalPrior).Or(GammaPrior).Named("a prior (beta(a, b), normal(mean m, sd s), gamma(shape k, rate r))");

    internal static readonly Parser<StatementSyntax> DefaultPriorStatement =
        Node(Keyword("default").Then(_ => Keyword("prior")).Then(_ => Prior), (p, s) => new DefaultPriorStatementSyntax(p, s));

    // --- arms --------------------------------------------------------------------
    internal static readonly Parser<ArmOptionSyntax> ArmOption =
        Node(Keyword("prior").Then(_ => Prior), (p, s) => (ArmOptionSyntax)new ArmPriorOptionSyntax(p, s))
            .Or(Node(Keyword("cost").Then(_ => Number), (c, s) => (ArmOptionSyntax)new ArmCostOptionSyntax(c, s)));

    internal static readonly Parser<StatementSyntax> ArmStatement =
        Node(
            from keyword in Keyword("arm")
            from code in Identifier
            from label in StringLiteral
            from options in ArmOption.Many()
            select (code, label, options),
            (v, s) => new ArmStatementSyntax(v.code, v.label, v.options.ToArray(), s));

    internal static readonly Parser<StatementSyntax> ControlStatement =
        Node(Keyword("control").Then(_ => Identifier), (arm, s) => new ControlStatementSyntax(arm, s));

    // --- the field -----------------------------------------------------------------
    internal static readonly Parser<StatementSyntax> PlotsStatement =
        Node(
            from keyword in Keyword("plots")
            from count in Number
            from per in Keyword("per")
            from round in Keyword("round")
            select count,
            (n, s) => new PlotsStatementSyntax(n, s));

    internal static readonly Parser<StatementSyntax> BlockStatement =
        Node(
            from keyword in Keyword("block")
            from name in Identifier
            from plotsWord in Keyword("plots")
            from plots in Number
            from layout in (
                from layoutWord in Keyword("layout")
                from rows in Number
                from times in Symbol("x")
                from columns in Number
                select (rows, columns)).Optional()
            select (name, plots, layout),
            (v, s) => new BlockStatementSyntax(v.name, v.plots,
                v.layout.IsDefined ? v.layout.Get().rows : null,
                v.layout.IsDefined ? v.layout.Get().columns : null, s));

    // --- limits --------------------------------------------------------------------
    internal static readonly Parser<LimitTargetSyntax> LimitTarget =
        Node(Keyword("every").Then(_ => Keyword("arm")), (_, s) => new LimitTargetSyntax(LimitTargetKind.EveryArm, null, s))
            .Or(Node(Keyword("control"), (_, s) => new LimitTargetSyntax(LimitTargetKind.Control, null, s)))
            .Or(Node(Identifier, (arm, s) => new LimitTargetSyntax(LimitTargetKind.Arm, arm, s)))
            .Named("'every arm', 'control' or an arm code");

    internal static readonly Parser<AmountSyntax> Amount =
        Node(
            from value in Number
            from unit in Keyword("plots").Or(Keyword("plot")).Or(Symbol("%")).Named("'plots' or '%'")
            select (value, percent: unit.Keyword == "%"),
            (v, s) => new AmountSyntax(v.value, v.percent, s))
            .Named("an amount ('N plots' or 'P%')");

    internal static readonly Parser<LimitScope> Scope =
        Keyword("per").Then(_ =>
            Keyword("round").Return(LimitScope.PerRound)
                .Or(Keyword("block").Then(_ => Keyword("per").Then(_ => Keyword("round")).Optional()).Return(LimitScope.PerBlock)))
            .Named("'per round' or 'per block'");

    internal static readonly Parser<LimitRuleSyntax> BoundRule =
        Node(
            from direction in Symbol(">=").Return(BoundDirection.AtLeast).Or(Symbol("<=").Return(BoundDirection.AtMost))
            from amount in Amount
            from scope in Scope
            select (direction, amount, scope),
            (v, s) => (LimitRuleSyntax)new BoundRuleSyntax(v.direction, v.amount, v.scope, s));

    internal static readonly Parser<LimitRuleSyntax> StockRule =
        Node(Keyword("stock").Then(_ => Number).Then(n => Keyword("plots").Or(Keyword("plot")).Return(n)),
            (n, s) => (LimitRuleSyntax)new StockRuleSyntax(n, s));

    internal static readonly Parser<LimitRuleSyntax> WindowRule =
        Node(
            from fromWord in Keyword("from")
            from roundWord in Keyword("round")
            from first in Number
            from until in Keyword("until").Then(_ => Keyword("round")).Then(_ => Number).Optional()
            select (first: (NumberSyntax?)first, last: until.GetOrDefault()),
            (v, s) => (LimitRuleSyntax)new WindowRuleSyntax(v.first, v.last, s))
            .Or(Node(Keyword("until").Then(_ => Keyword("round")).Then(_ => Number),
                (last, s) => (LimitRuleSyntax)new WindowRuleSyntax(null, last, s)));

    internal static readonly Parser<LimitRuleSyntax> LimitRule =
        BoundRule.Or(StockRule).Or(WindowRule)
            .Named("a limit rule ('>= N plots per round', '<= P% per block', 'stock N plots', 'from round R', 'until round R')");

    internal static readonly Parser<StatementSyntax> LimitStatement =
        Node(
            from keyword in Keyword("limit")
            from target in LimitTarget
            from rule in LimitRule
            select (target, rule),
            (v, s) => new LimitStatementSyntax(v.target, v.rule, s));

    // --- rotation -----------------------------------------------------------------
    internal static readonly Parser<StatementSyntax> RestRule =
        Node(
            from target in LimitTarget
            from rest in Keyword("rest")
            from rounds in Number
            from unit in Keyword("rounds").Or(Keyword("round"))
            select (target, rounds),
            (v, s) => (StatementSyntax)new RestRotationSyntax(v.target, v.rounds, s));

    internal static readonly Parser<StatementSyntax> AfterRule =
        Node(
            from arm in Identifier
            from notWord in Keyword("not")
            from after in Keyword("after")
            from previous in Identifier
            select (arm, previous),
            (v, s) => (StatementSyntax)new AfterRotationSyntax(v.arm, v.previous, s));

    internal static readonly Parser<StatementSyntax> RotationStatement =
        input =>
        {
            // The rule's own span is widened to cover the 'rotation' keyword.
            var keyword = Keyword("rotation")(input);
            if (!keyword.WasSuccessful) return Result.Failure<StatementSyntax>(keyword.Remainder, keyword.Message, keyword.Expectations);
            var rule = RestRule.Or(AfterRule).Named("'ARM rest N rounds', 'every arm rest N rounds' or 'ARM not after ARM'")(keyword.Remainder);
            if (!rule.WasSuccessful) return rule;
            var span = SpanBetween(input, rule.Remainder);
            StatementSyntax widened = rule.Value switch
            {
                RestRotationSyntax rest => rest with { Span = span },
                AfterRotationSyntax after => after with { Span = span },
                var other => other,
            };
            return Result.Success(widened, rule.Remainder);
        };

    // --- stopping and dropping ------------------------------------------------------
    internal static readonly Parser<Comparison> ComparisonOperator =
        Symbol(">=").Return(Comparison.AtLeast)
            .Or(Symbol("<=").Return(Comparison.AtMost))
            .Or(Symbol(">").Return(Comparison.Above))
            .Or(Symbol("<").Return(Comparison.Below))
            .Named("a comparison (>=, <=, >, <)");

    internal static readonly Parser<CriterionSyntax> Criterion =
        Node(
            from metric in Keyword("best").Return(CriterionMetric.Best).Or(Keyword("loss").Return(CriterionMetric.Loss))
                .Named("'best' or 'loss'")
            from comparison in ComparisonOperator
            from threshold in Number
            select (metric, comparison, threshold),
            (v, s) => new CriterionSyntax(v.metric, v.comparison, v.threshold, s));

    private static readonly Parser<NumberSyntax?> AfterRound =
        Keyword("after").Then(_ => Keyword("round")).Then(_ => Number).Optional().Select(o => o.GetOrDefault());

    /// <summary>'stop when …' and 'drop when …' share their shape: keyword, 'when', criterion, optional 'after round R'.</summary>
    private static Parser<StatementSyntax> DecisionRule(string keyword, Func<CriterionSyntax, NumberSyntax?, TextSpan, StatementSyntax> make) =>
        Node(
            from word in Keyword(keyword)
            from whenWord in Keyword("when")
            from criterion in Criterion
            from after in AfterRound
            select (criterion, after),
            (v, s) => make(v.criterion, v.after, s));

    internal static readonly Parser<StatementSyntax> StopStatement =
        DecisionRule("stop", (criterion, after, span) => new StopStatementSyntax(criterion, after, span));

    internal static readonly Parser<StatementSyntax> DropStatement =
        DecisionRule("drop", (criterion, after, span) => new DropStatementSyntax(criterion, after, span));

    // --- scenarios ------------------------------------------------------------------
    private static Parser<T> Spaced<T>(Parser<T> parser) => from value in parser from space in AnySpace select value;

    internal static readonly Parser<ScenarioEntrySyntax> FieldEffect =
        Node(Keyword("season").Then(_ => Keyword("sd")).Then(_ => Number),
                (v, s) => new ScenarioEntrySyntax(ScenarioEntryKind.Season, null, v, s))
            .Or(Node(Keyword("interaction").Then(_ => Keyword("sd")).Then(_ => Number),
                (v, s) => new ScenarioEntrySyntax(ScenarioEntryKind.Interaction, null, v, s)))
            .Or(Node(Keyword("block").Then(_ => Keyword("sd")).Then(_ => Number),
                (v, s) => new ScenarioEntrySyntax(ScenarioEntryKind.BlockEffect, null, v, s)))
            .Or(Node(
                from word in Keyword("missing")
                from arm in Identifier.Optional()
                from value in Number
                from percent in Symbol("%")
                select (arm: arm.GetOrDefault(), value),
                (v, s) => new ScenarioEntrySyntax(ScenarioEntryKind.Missing, v.arm, v.value, s)))
            .Or(Node(Keyword("dispersion").Then(_ => Number),
                (v, s) => new ScenarioEntrySyntax(ScenarioEntryKind.Dispersion, null, v, s)))
            .Named("'season sd S', 'interaction sd S', 'block sd S', 'missing [ARM] P%' or 'dispersion K'");

    internal static readonly Parser<ScenarioEntrySyntax> ScenarioEntry =
        FieldEffect.Or(Node(Keyword("every").Then(_ => Keyword("arm")).Then(_ => Number),
                (v, s) => new ScenarioEntrySyntax(ScenarioEntryKind.EveryArm, null, v, s))
            .Or(Node(Keyword("noise").Then(_ => Number), (v, s) => new ScenarioEntrySyntax(ScenarioEntryKind.Noise, null, v, s)))
            .Or(Node(from arm in Identifier from value in Number select (arm, value),
                (v, s) => new ScenarioEntrySyntax(ScenarioEntryKind.Arm, v.arm, v.value, s))))
            .Named("'every arm V', 'ARM V', 'noise SD' or a field effect ('season sd S', 'block sd S', 'missing P%', ...)");

    /// <summary><c>from prior</c> with its field effects, or a list of entries.</summary>
    internal static readonly Parser<(bool FromPrior, ScenarioEntrySyntax[] Entries)> ScenarioBody =
        (from fromPrior in Spaced(Keyword("from").Then(_ => Keyword("prior")))
         from effects in Spaced(FieldEffect).Many()
         select (true, effects.ToArray()))
            .Or(Spaced(ScenarioEntry).AtLeastOnce().Select(e => (false, e.ToArray())));

    internal static readonly Parser<StatementSyntax> ScenarioStatement =
        Node(
            from keyword in Keyword("scenario")
            from name in StringLiteral
            from open in Spaced(Symbol("{"))
            from body in ScenarioBody
            from close in Symbol("}")
            select (name, body),
            (v, s) => new ScenarioStatementSyntax(v.name, v.body.FromPrior, v.body.Entries, s));

    // --- statements and the trial ---------------------------------------------------
    internal static readonly Parser<StatementSyntax> Statement =
        SeedStatement.Or(RoundsStatement).Or(OutcomeStatement).Or(GoalStatement).Or(PriceStatement)
            .Or(PolicyStatement).Or(DefaultPriorStatement).Or(ArmStatement).Or(ControlStatement)
            .Or(PlotsStatement).Or(BlockStatement).Or(LimitStatement).Or(RotationStatement)
            .Or(StopStatement).Or(DropStatement).Or(ScenarioStatement).Or(RoundingStatement).Or(ModelStatement);

    /// <summary>
    /// Every keyword of the language. An arm code may not be one of them (grammar/trial.ebnf),
    /// so that no limit, rotation or scenario line can be read two ways.
    /// </summary>
    internal static readonly IReadOnlyList<string> Keywords =
    [
        "trial", "seed", "rounds", "round", "outcome", "goal", "maximize", "minimize", "price", "bernoulli",
        "binomial", "of", "normal", "noise", "sd", "unknown", "count", "policy", "thompson", "top-two", "beta",
        "ucb1", "kl-ucb", "c", "epsilon-greedy", "epsilon", "decreasing", "explore-then-commit", "equal",
        "default", "prior", "arm", "cost", "control", "mean", "worth", "plots", "plot", "gamma", "shape", "rate",
        "per", "block", "layout", "x", "limit", "every", "stock", "from", "until", "rotation", "rest", "not",
        "after", "stop", "when", "drop", "best", "loss", "scenario", "rounding", "largest-remainder",
        "randomized", "model", "independent", "adjusts", "for", "and", "season", "interaction", "missing",
        "dispersion",
    ];

    /// <summary>The words that begin a statement, for "did you mean" hints.</summary>
    internal static readonly IReadOnlyList<string> StatementKeywords =
    [
        "seed", "rounds", "outcome", "goal", "price", "policy", "default", "arm", "control",
        "plots", "block", "limit", "rotation", "stop", "drop", "scenario", "rounding", "model",
    ];

    internal static readonly Parser<StringSyntax> TrialHeader =
        from keyword in Keyword("trial")
        from name in StringLiteral
        from open in Symbol("{")
        select name;

    internal static readonly Parser<KeywordSyntax> TrialEnd = Symbol("}");

    internal static readonly Parser<StatementOrError> StatementLine = StatementRecovery.StatementLine(Statement);

    internal static readonly Parser<ParsedDesign> Design = StatementRecovery.Design(TrialHeader, StatementLine, TrialEnd);
}
