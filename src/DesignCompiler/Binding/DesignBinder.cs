using DesignCompiler.Diagnostics;
using DesignCompiler.Syntax;
using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>The checked design, when there were no errors, and every diagnostic found.</summary>
public sealed record BindResult(CheckedDesign? Design, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool HasErrors => Design is null;
}

/// <summary>
/// Syntax tree to checked design. Statements may come in any order, so they are first
/// grouped by kind, then bound in dependency order (outcome, arms, field, limits, rules,
/// scenarios). Each problem is reported once, where it was written; the checked design
/// is produced only when there is no error.
/// </summary>
public sealed partial class DesignBinder
{
    private readonly SourceText _source;
    private readonly DiagnosticBag _bag = new();

    // Statements on lines that did not parse are missing from the tree, so problems that
    // only say such a statement (or the arm it declared) was not found would be noise.
    private readonly IReadOnlySet<string> _broken;

    private DesignBinder(SourceText source, IReadOnlySet<string> broken)
    {
        _source = source;
        _broken = broken;
    }

    private bool _controlWritten;

    private bool IsBroken(string keyword) => _broken.Contains(keyword) || _broken.Contains("*");

    /// <summary>Parse and bind in one step: the usual entry point.</summary>
    public static BindResult Check(SourceText source)
    {
        var parsed = DesignParser.Parse(source);
        var bound = Bind(source, parsed.Syntax, parsed.BrokenStatements);
        var all = new DiagnosticBag();
        all.AddRange(parsed.Diagnostics);
        all.AddRange(bound.Diagnostics);
        return new BindResult(parsed.HasErrors ? null : bound.Design, all.ToSortedList());
    }

    public static BindResult Bind(SourceText source, DesignSyntax syntax, IReadOnlySet<string>? brokenStatements = null) =>
        new DesignBinder(source, brokenStatements ?? new HashSet<string>()).Run(syntax);

    private BindResult Run(DesignSyntax syntax)
    {
        var statements = syntax.Statements;
        var seed = BindSeed(Single<SeedStatementSyntax>(statements, "seed"), syntax);
        var rounds = BindRounds(Single<RoundsStatementSyntax>(statements, "rounds"), syntax);
        var outcome = BindOutcome(Single<OutcomeStatementSyntax>(statements, "outcome"), syntax);
        var valuation = BindValuation(Single<GoalStatementSyntax>(statements, "goal"), Single<PriceStatementSyntax>(statements, "price"));
        var policy = BindPolicy(Single<PolicyStatementSyntax>(statements, "policy"), rounds, outcome);
        var arms = BindArms(statements.OfType<ArmStatementSyntax>().ToList(),
            Single<DefaultPriorStatementSyntax>(statements, "default prior"), outcome, valuation, syntax);
        var controlStatement = Single<ControlStatementSyntax>(statements, "control");
        var control = BindControl(controlStatement, arms);
        // A control that was written but names an arm that could not be bound has been reported.
        _controlWritten = controlStatement is not null;
        var blocks = BindField(Single<PlotsStatementSyntax>(statements, "plots"), statements.OfType<BlockStatementSyntax>().ToList(), syntax);
        var limits = BindLimits(statements.OfType<LimitStatementSyntax>().ToList(), arms, control, rounds ?? DesignLimits.MaxRounds);
        var (rest, after) = BindRotation(statements.OfType<RotationStatementSyntax>().ToList(), arms, control, rounds);
        var stops = statements.OfType<StopStatementSyntax>().Select(s => new StopRule(BindCriterion(s.Criterion), BindAfterRound(s.AfterRound, rounds), s.Span)).ToList();
        var drops = statements.OfType<DropStatementSyntax>().Select(s => new DropRule(BindCriterion(s.Criterion), BindAfterRound(s.AfterRound, rounds), s.Span)).ToList();
        var scenarios = BindScenarios(statements.OfType<ScenarioStatementSyntax>().ToList(), arms, outcome);
        var rounding = BindRounding(Single<RoundingStatementSyntax>(statements, "rounding"));
        var model = BindModel(Single<ModelStatementSyntax>(statements, "model"), outcome, blocks, rounds);

        if (_bag.HasErrors || rounds is null || outcome is null || seed is null || blocks is null)
            return new BindResult(null, _bag.ToSortedList());

        var design = new CheckedDesign(_source, syntax.Name?.Value ?? "", seed.Value, rounds.Value, outcome, valuation,
            policy, arms, control, blocks, limits.Bounds, limits.Stocks, limits.Windows, rest, after, stops, drops, scenarios)
        {
            Rounding = rounding,
            Model = model,
        };
        return new BindResult(design, _bag.ToSortedList());
    }

    /// <summary>The one statement of a kind that may appear once; later copies are reported.</summary>
    private T? Single<T>(IReadOnlyList<StatementSyntax> statements, string keyword) where T : StatementSyntax
    {
        var found = statements.OfType<T>().ToList();
        foreach (var repeat in found.Skip(1))
            Report(DiagnosticCatalog.RepeatedStatement, repeat.Span, keyword, LineOf(found[0].Span));
        return found.FirstOrDefault();
    }

    private ulong? BindSeed(SeedStatementSyntax? statement, DesignSyntax syntax)
    {
        if (statement is null)
        {
            ReportMissing("seed", "every random placement comes from it, so a reviewer can reproduce the sheets",
                "add a line such as 'seed 20260815'", syntax);
            return null;
        }
        if (statement.Value.IsInteger && ulong.TryParse(statement.Value.Text, System.Globalization.NumberStyles.None,
                System.Globalization.CultureInfo.InvariantCulture, out var seed))
            return seed;
        if (!statement.Value.IsInteger) Report(DiagnosticCatalog.NotWholeNumber, statement.Value.Span, "the seed", statement.Value.Text);
        else Report(DiagnosticCatalog.OutOfRange, statement.Value.Span, "the seed", "between 0 and 18446744073709551615", statement.Value.Text);
        return null;
    }

    private int? BindRounds(RoundsStatementSyntax? statement, DesignSyntax syntax)
    {
        if (statement is null)
        {
            ReportMissing("rounds", "say how many planting rounds the trial has", "add a line such as 'rounds 4'", syntax);
            return null;
        }
        return Whole(statement.Value, "the number of rounds", 1, DesignLimits.MaxRounds);
    }

    private void ReportMissing(string keyword, string why, string hint, DesignSyntax syntax)
    {
        if (IsBroken(keyword)) return;
        var at = syntax.Name?.Span ?? new TextSpan(syntax.Span.Start, 0);
        _bag.Report(DiagnosticCatalog.MissingStatement, Locate(at), hint, null, keyword, why);
    }

    private SourceLocation Locate(TextSpan span) => SourceLocation.In(_source, span);

    private int LineOf(TextSpan span) => _source.PositionOf(span.Start).Line;

    private void Report(DiagnosticDescriptor descriptor, TextSpan span, params object[] arguments) =>
        _bag.Report(descriptor, Locate(span), arguments);

    private void ReportWithHint(DiagnosticDescriptor descriptor, TextSpan span, string? hint, params object[] arguments) =>
        _bag.Report(descriptor, Locate(span), hint, null, arguments);
}
