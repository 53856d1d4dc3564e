using DesignCompiler.Syntax;
using Sprache;

namespace DesignCompiler.Tests.Language;

/// <summary>
/// For every production of grammar/trial.ebnf, minimal snippets that its parser field accepts
/// as a whole (nothing left over), and a few that it rejects. The table is keyed by the
/// nonterminal's name, and one test checks that every nonterminal of the grammar has a row.
/// </summary>
public sealed class GrammarSnippetTests
{
    /// <summary>True when the parser reads the whole text (trailing spaces and tabs allowed, as tokens eat them).</summary>
    private static Func<string, bool> Whole<T>(Parser<T> parser) => text => parser.End().TryParse(text).WasSuccessful;

    /// <summary>The top rule never fails; a text is accepted when it gives no syntax error.</summary>
    private static bool DesignAccepts(string text) => DesignGrammar.Design.Parse(text).Errors.Count == 0;

    /// <summary>A statement line is accepted when it yields a statement (not an error) and consumes the line.</summary>
    private static bool StatementLineAccepts(string text)
    {
        var result = DesignGrammar.StatementLine.TryParse(text);
        return result.WasSuccessful && result.Value.Statement is not null && result.Remainder.AtEnd;
    }

    private const string MinimalDesign = """
        trial "Pea inoculants" {
          seed 101
          rounds 1
          outcome nodulated: bernoulli
          default prior beta(1, 1)
          arm PEAT "Peat inoculant"
          arm LIQ "Liquid inoculant"
          plots 4 per round
        }
        """;

    private static readonly Dictionary<string, (Func<string, bool> Accepts, string[] Good, string[] Bad)> Table = new()
    {
        ["design"] = (DesignAccepts,
            [MinimalDesign, "# a comment first\n" + MinimalDesign + "\n# and last\n", "trial \"Empty\" {\n}"],
            ["seed 101\n}", "trial \"No end\" {\n  seed 1\n", "trial \"Two\" {\n}\n}"]),
        ["trial-header"] = (Whole(DesignGrammar.TrialHeader),
            ["trial \"Pea inoculants\" {", "trial \"\" {"],
            ["trial Pea {", "trial \"Pea\"", "Trial \"Pea\" {"]),
        ["trial-end"] = (Whole(DesignGrammar.TrialEnd), ["}"], ["]", ""]),
        ["statement-line"] = (StatementLineAccepts,
            ["seed 42\n", "  seed 42   # the seed\n", "\n\n  rounds 3"],
            ["seed 42 rounds 3\n", "sede 42\n", "}"]),
        ["statement"] = (Whole(DesignGrammar.Statement),
            ["seed 42", "goal minimize", "arm OV \"Oat + vetch\"", "limit every arm >= 2 plots per round",
             "rotation OV not after RC", "drop when best < 0.02", "scenario \"s\" { every arm 0.5 }",
             "rounding randomized", "model adjusts for block and round"],
            ["trial \"x\" {", "Seed 42", "seed 42 rounds 3"]),
        ["seed-statement"] = (Whole(DesignGrammar.SeedStatement), ["seed 20260815", "seed 0"], ["seed", "seed five", "seed\n42", "seeds 4"]),
        ["rounds-statement"] = (Whole(DesignGrammar.RoundsStatement), ["rounds 4", "rounds 2.5"], ["rounds", "round 4"]),
        ["goal-statement"] = (Whole(DesignGrammar.GoalStatement), ["goal maximize", "goal minimize"], ["goal maximise", "goal maximized", "goal"]),
        ["price-statement"] = (Whole(DesignGrammar.PriceStatement), ["price 210", "price 210.5 \"EUR\""], ["price \"EUR\"", "price 210 EUR"]),
        ["outcome-statement"] = (Whole(DesignGrammar.OutcomeStatement),
            ["outcome established: bernoulli", "outcome yield \"t/ha\": normal noise unknown", "outcome emerged \"per tray\" : binomial of 50"],
            ["outcome: bernoulli", "outcome yield normal noise unknown", "outcome yield \"t/ha\":"]),
        ["family"] = (Whole(DesignGrammar.Family), ["bernoulli", "binomial of 50", "normal noise sd 0.8", "normal noise unknown", "count"], ["poisson", "binomial 50"]),
        ["bernoulli-family"] = (Whole(DesignGrammar.BernoulliFamily), ["bernoulli"], ["bernouli", "Bernoulli"]),
        ["binomial-family"] = (Whole(DesignGrammar.BinomialFamily), ["binomial of 50"], ["binomial of", "binomial 50"]),
        ["normal-family"] = (Whole(DesignGrammar.NormalFamily), ["normal noise sd 1.2", "normal noise unknown"], ["normal", "normal noise"]),
        ["noise"] = (Whole(DesignGrammar.Noise), ["noise sd 0.8", "noise unknown"], ["noise 0.8", "noise sd"]),
        ["count-family"] = (Whole(DesignGrammar.CountFamily), ["count"], ["counts"]),
        ["policy-statement"] = (Whole(DesignGrammar.PolicyStatement), ["policy thompson", "policy kl-ucb c 3"], ["policy", "policy thomson"]),
        ["policy"] = (Whole(DesignGrammar.Policy),
            ["thompson", "top-two thompson beta 0.5", "ucb1", "kl-ucb", "epsilon-greedy epsilon 0.1", "explore-then-commit 2 rounds", "equal"],
            ["random", "ucb"]),
        ["thompson-policy"] = (Whole(DesignGrammar.ThompsonPolicy), ["thompson"], ["thompsons"]),
        ["top-two-policy"] = (Whole(DesignGrammar.TopTwoPolicy), ["top-two thompson", "top-two thompson beta 0.5"], ["top-two", "top-two thompson beta"]),
        ["ucb1-policy"] = (Whole(DesignGrammar.Ucb1Policy), ["ucb1"], ["ucb", "ucb2"]),
        ["kl-ucb-policy"] = (Whole(DesignGrammar.KlUcbPolicy), ["kl-ucb", "kl-ucb c 3", "kl-ucb c 0"], ["kl-ucb 3", "klucb"]),
        ["epsilon-greedy-policy"] = (Whole(DesignGrammar.EpsilonGreedyPolicy),
            ["epsilon-greedy epsilon 0.1", "epsilon-greedy epsilon 0.1 decreasing"], ["epsilon-greedy 0.1", "epsilon-greedy epsilon"]),
        ["explore-commit-policy"] = (Whole(DesignGrammar.ExploreCommitPolicy),
            ["explore-then-commit 1 round", "explore-then-commit 2 rounds"], ["explore-then-commit 2", "explore-then-commit rounds"]),
        ["equal-policy"] = (Whole(DesignGrammar.EqualPolicy), ["equal"], ["equals"]),
        ["default-prior-statement"] = (Whole(DesignGrammar.DefaultPriorStatement),
            ["default prior beta(1, 1)", "default prior gamma(shape 2, rate 0.1)"], ["default beta(1, 1)", "default prior"]),
        ["arm-statement"] = (Whole(DesignGrammar.ArmStatement),
            ["arm OV \"Oat + vetch\"", "arm N60 \"60 kg N/ha\" cost 66 prior normal(mean 7, sd 1)", "arm LD \"Lot D\" prior beta(8, 2)"],
            ["arm OV", "arm \"Oat + vetch\"", "arm OV Oat", "arm 1A \"x\""]),
        ["arm-option"] = (Whole(DesignGrammar.ArmOption), ["prior beta(2, 2)", "cost 66", "cost -3.5"], ["prior", "cost", "price 3"]),
        ["control-statement"] = (Whole(DesignGrammar.ControlStatement), ["control OV"], ["control", "control \"OV\""]),
        ["prior"] = (Whole(DesignGrammar.Prior),
            ["beta(1, 1)", "normal(mean 7.5, sd 1.5)", "gamma(shape 2, rate 0.1)"], ["uniform(0, 1)", "beta"]),
        ["beta-prior"] = (Whole(DesignGrammar.BetaPrior), ["beta(2, 2)", "beta( 0.5 , 0.5 )"], ["beta(1 1)", "beta 1, 1", "beta(1, 1"]),
        ["normal-prior"] = (Whole(DesignGrammar.NormalPrior),
            ["normal(mean 7.5, sd 1.5)", "normal(mean -2, sd 1, noise 0.8)", "normal(mean 7.5, sd 1.5, noise 0.8 worth 4 plots)"],
            ["normal(7.5, 1.5)", "normal(mean 7.5, sd 1.5, worth 4 plots)", "normal(sd 1.5, mean 7.5)", "normal(mean 7.5, sd 1.5, noise 0.8 worth 4)"]),
        ["gamma-prior"] = (Whole(DesignGrammar.GammaPrior), ["gamma(shape 2, rate 0.1)"], ["gamma(2, 0.1)", "gamma(rate 0.1, shape 2)"]),
        ["plots-statement"] = (Whole(DesignGrammar.PlotsStatement), ["plots 24 per round"], ["plots 24", "plots per round"]),
        ["block-statement"] = (Whole(DesignGrammar.BlockStatement),
            ["block north plots 20", "block north plots 20 layout 4 x 5"], ["block north 20", "block plots 20", "block north plots 20 layout 4 by 5"]),
        ["limit-statement"] = (Whole(DesignGrammar.LimitStatement),
            ["limit every arm >= 2 plots per block per round", "limit control >= 20% per round", "limit MP stock 30 plots", "limit BP from round 2"],
            ["limit >= 2 plots per round", "limit every arm", "limit OV >= 2 plots"]),
        ["limit-target"] = (Whole(DesignGrammar.LimitTarget), ["every arm", "control", "OV"], ["every arm OV", "\"OV\"", "1OV"]),
        ["limit-rule"] = (Whole(DesignGrammar.LimitRule),
            [">= 2 plots per round", "<= 40% per block", "stock 30 plots", "from round 2", "until round 3"], ["= 2 plots per round", "stock 30"]),
        ["bound-rule"] = (Whole(DesignGrammar.BoundRule),
            [">= 2 plots per round", "<= 40% per block", ">= 1 plot per block per round"], ["> 2 plots per round", ">= 2 plots", "=> 2 plots per round"]),
        ["amount"] = (Whole(DesignGrammar.Amount), ["2 plots", "1 plot", "40%", "12.5 %"], ["2", "2 plotz", "% 40"]),
        ["scope"] = (Whole(DesignGrammar.Scope), ["per round", "per block", "per block per round"], ["per plot", "per", "per round per block"]),
        ["stock-rule"] = (Whole(DesignGrammar.StockRule), ["stock 30 plots", "stock 1 plot"], ["stock 30", "stock plots"]),
        ["window-rule"] = (Whole(DesignGrammar.WindowRule),
            ["from round 2", "from round 2 until round 3", "until round 3"], ["from 2", "until round", "from round 2 until 3"]),
        ["rotation-statement"] = (Whole(DesignGrammar.RotationStatement),
            ["rotation every arm rest 1 round", "rotation OV rest 2 rounds", "rotation OV not after RC"], ["rotation OV", "rotation OV after RC"]),
        ["rest-rule"] = (Whole(DesignGrammar.RestRule), ["OV rest 2 rounds", "every arm rest 1 round", "control rest 1 round"], ["OV rest 2", "rest 2 rounds"]),
        ["after-rule"] = (Whole(DesignGrammar.AfterRule), ["OV not after RC"], ["OV after RC", "OV not after"]),
        ["stop-statement"] = (Whole(DesignGrammar.StopStatement),
            ["stop when best >= 0.95", "stop when loss <= 10 after round 2"], ["stop best >= 0.95", "stop when best 0.95", "stop when worst > 0.5"]),
        ["drop-statement"] = (Whole(DesignGrammar.DropStatement), ["drop when best < 0.02 after round 2"], ["drop when best < 0.02 after 2"]),
        ["criterion"] = (Whole(DesignGrammar.Criterion), ["best >= 0.95", "loss < 10", "best > 0.5", "loss <= 1e-3"], ["best = 0.95", "loss"]),
        ["comparison-operator"] = (Whole(DesignGrammar.ComparisonOperator), [">=", "<=", ">", "<"], ["=", "==", "=>", "!="]),
        ["scenario-statement"] = (Whole(DesignGrammar.ScenarioStatement),
            ["scenario \"no effect\" { every arm 0.6 }", "scenario \"drawn\" { from prior }",
             "scenario \"plateau\" {\n  N0 5.9  N60 7.1\n  # a comment inside\n  noise 0.8\n}"],
            ["scenario \"empty\" { }", "scenario none { every arm 1 }", "scenario \"x\" { every arm 1"]),
        ["scenario-body"] = (Whole(DesignGrammar.ScenarioBody),
            ["from prior", "every arm 0.6 OV 0.7 noise 0.8", "OV 0.7\n RC 0.6", "from prior season sd 0.4 missing 5%", "every arm 3 block sd 0.2"],
            ["", "from", "OV", "from prior OV 0.7"]),
        ["scenario-entry"] = (Whole(DesignGrammar.ScenarioEntry),
            ["every arm 0.6", "OV 0.7", "noise 0.8", "OV -2", "season sd 0.3", "missing OV 10%"], ["every arm", "OV", "0.7", "noise"]),
        ["field-effect"] = (Whole(DesignGrammar.FieldEffect),
            ["season sd 0.3", "interaction sd 0.1", "block sd 0.25", "missing 5%", "missing OV 12.5 %", "dispersion 2"],
            ["season 0.3", "missing 5", "missing OV", "block 0.2", "dispersion", "drift sd 1"]),
        ["rounding-statement"] = (Whole(DesignGrammar.RoundingStatement),
            ["rounding randomized", "rounding largest-remainder"], ["rounding", "rounding random", "rounding largest remainder"]),
        ["model-statement"] = (Whole(DesignGrammar.ModelStatement),
            ["model independent", "model adjusts for block", "model adjusts for block and round", "model adjusts for round"],
            ["model", "model adjusts block", "model adjusts for", "model adjusts for round and block"]),
        ["adjusted-terms"] = (Whole(DesignGrammar.AdjustedTerms),
            ["block", "block and round", "round"], ["and round", "block and", "rounds"]),
        ["identifier"] = (Whole(TokenGrammar.Identifier), ["OV", "N120", "late_sown-2", "x"], ["9lives", "_x", "-x", "\u00c4B", "a.b"]),
        ["integer"] = (Whole(TokenGrammar.Integer), ["0", "20260815", "007"], ["-3", "1.5", "1e3", ""]),
        ["number"] = (Whole(TokenGrammar.Number), ["7", "-0.5", "1.5e3", "2E-4", "1e+2", "99999999999999999999", "1e999"],
            [".5", "1.", "1e", "+1", "1,5", "- 1", "\u2212" + "1"]),
        ["string-literal"] = (Whole(TokenGrammar.StringLiteral),
            ["\"Oat + vetch\"", "\"\"", "\"say \\\"hi\\\" \\\\ done\"", "\"# not a comment\"", "\"\u00e9t\u00e9 \u2014 \ud83c\udf3e\""],
            ["\"open", "\"line\nbreak\"", "\"bad \\q escape\"", "'single'"]),
        ["string-character"] = (Whole(TokenGrammar.StringCharacter), ["a", " ", "\\\"", "\\\\", "#"], ["\"", "\\", "\n", "\r", "\\n"]),
        ["letter"] = (Whole(TokenGrammar.Letter), ["a", "Z"], ["1", "_", "\u00e9", "\u0130"]),
        ["digit"] = (Whole(TokenGrammar.Digit), ["0", "9"], ["a", "\u0661", "\u00bd"]),
    };

    public static TheoryData<string> Productions()
    {
        var data = new TheoryData<string>();
        foreach (var name in Table.Keys) data.Add(name);
        return data;
    }

    [Fact]
    public void Every_production_of_the_grammar_has_snippets()
    {
        var missing = GrammarInStepTests.Nonterminals().Where(n => !Table.ContainsKey(n)).ToList();
        var unknown = Table.Keys.Except(GrammarInStepTests.Nonterminals()).ToList();
        Assert.Empty(missing);
        Assert.Empty(unknown);
    }

    [Theory]
    [MemberData(nameof(Productions))]
    public void Production_accepts_its_minimal_snippets(string nonterminal)
    {
        var (accepts, good, _) = Table[nonterminal];
        Assert.NotEmpty(good);
        var rejected = good.Where(s => !accepts(s)).ToList();
        Assert.True(rejected.Count == 0, $"{nonterminal} rejects: {string.Join(" | ", rejected.Select(Show))}");
    }

    [Theory]
    [MemberData(nameof(Productions))]
    public void Production_rejects_malformed_snippets(string nonterminal)
    {
        var (accepts, _, bad) = Table[nonterminal];
        Assert.NotEmpty(bad);
        var accepted = bad.Where(accepts).ToList();
        Assert.True(accepted.Count == 0, $"{nonterminal} accepts: {string.Join(" | ", accepted.Select(Show))}");
    }

    [Fact]
    public void Tokens_never_swallow_a_line_break()
    {
        // "Between the tokens of one statement only spaces and tabs may stand."
        Assert.False(Whole(DesignGrammar.SeedStatement)("seed\n42"));
        Assert.False(Whole(DesignGrammar.ArmStatement)("arm OV\n\"Oat + vetch\""));
        Assert.True(Whole(DesignGrammar.ArmStatement)("arm OV\t\"Oat + vetch\"  \t"));
    }

    [Fact]
    public void A_keyword_is_matched_as_a_whole_word()
    {
        // "policy thompsonx" must not read 'thompson' and leave 'x'.
        var result = DesignGrammar.Policy.TryParse("thompsonx");
        Assert.False(result.WasSuccessful && result.Remainder.Position == "thompson".Length);
        Assert.False(Whole(DesignGrammar.GoalStatement)("goal maximizer"));
    }

    [Fact]
    public void Numbers_are_read_with_the_invariant_culture_and_keep_their_text()
    {
        var number = TokenGrammar.Number.Parse("-1.25e2");
        Assert.Equal(-125.0, number.Value);
        Assert.Equal("-1.25e2", number.Text);
        Assert.False(number.IsInteger);
        Assert.True(TokenGrammar.Number.Parse("-7").IsInteger);
        Assert.True(double.IsPositiveInfinity(TokenGrammar.Number.Parse("1e999").Value));
    }

    [Fact]
    public void A_string_literal_resolves_its_escapes()
    {
        Assert.Equal("say \"hi\" \\ done", TokenGrammar.StringLiteral.Parse("\"say \\\"hi\\\" \\\\ done\"").Value);
    }

    [Fact]
    public void A_span_covers_the_token_without_trailing_blanks()
    {
        var identifier = TokenGrammar.Identifier.Parse("N120   ");
        Assert.Equal(0, identifier.Span.Start);
        Assert.Equal(4, identifier.Span.Length);
    }

    private static string Show(string snippet) => snippet.Replace("\n", "\\n").Replace("\r", "\\r");
}
