using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning;
using DesignCompiler.Rendering;
using DesignCompiler.Tests.Testing;
using DesignCompiler.Text;

namespace DesignCompiler.Fuzz;

/// <summary>
/// A design file's bytes, taken the way <c>trialc compile</c> takes them: decoded, parsed, bound,
/// checked for feasibility, every diagnostic formatted. A design that checks clean is planned for
/// round 1 and rendered to all four files, so mutations that stay valid reach the planner's
/// numerics and the templates too.
/// </summary>
internal sealed class DesignTarget : IFuzzTarget
{
    public string Name => "design";

    public string Description => "design text: parser, binder, feasibility check, round-1 plan, rendered files";

    public IReadOnlyList<string> SeedPatterns => ["examples/*.trial", "tests/Cases/*/*.trial"];

    public IEnumerable<(string Name, byte[] Content)> GeneratedSeeds() => [];

    /// <summary>
    /// The embedded cover-crop example (its seeds are files fuzz.sh copies, which the harness does not
    /// know the path of): whole, it is planned and rendered; cut in half, it reaches the diagnostics.
    /// </summary>
    public IEnumerable<byte[]> WarmUpInputs()
    {
        var example = IssuedRound.ExampleDesign;
        return [example, example[..(example.Length / 2)]];
    }

    public void Run(byte[] input)
    {
        var (text, problem) = SourceFiles.Decode("fuzzed.trial", input);
        if (text is null)
        {
            _ = DiagnosticFormatter.Format(problem!);
            return;
        }

        var bound = DesignBinder.Check(text);
        var diagnostics = bound.Diagnostics.ToList();
        if (bound.Design is not null) diagnostics.AddRange(DesignFeasibility.Check(bound.Design));
        _ = DiagnosticFormatter.FormatAll(diagnostics);
        Findings.ThrowIfAny(OutputInvariants.DiagnosticProblems(text, diagnostics));
        if (bound.Design is null || diagnostics.Any(d => d.Severity == Severity.Error)) return;

        var (planner, _) = RoundPlanner.For(bound.Design);
        var result = planner!.Plan(new TrialState(bound.Design.Arms.Count), 1);
        Findings.ThrowIfAny(OutputInvariants.DiagnosticProblems(text, result.Diagnostics));
        _ = DiagnosticFormatter.FormatAll(result.Diagnostics);
        if (result.Plan is null) return;

        Findings.ThrowIfAny(OutputInvariants.PlanProblems(result.Plan));
        var (files, renderProblems) = RoundOutputs.Render(result.Plan, bound.Design, "fuzzed");
        if (renderProblems.Count > 0) throw new FuzzFinding("a built-in template failed:\n" + DiagnosticFormatter.FormatAll(renderProblems));
        if (!NamesSpellNonFinite(bound.Design)) Findings.ThrowIfAny(OutputInvariants.FileProblems(files));
    }

    /// <summary>A name or label that itself spells NaN or Infinity would trip the text check on the sheets, not a number.</summary>
    private static bool NamesSpellNonFinite(CheckedDesign design) =>
        new[] { design.Name, design.Outcome.Name, design.Outcome.Unit ?? "", design.Valuation.Currency ?? "" }
            .Concat(design.Arms.SelectMany(a => new[] { a.Code, a.Label }))
            .Concat(design.Blocks.Select(b => b.Name))
            .Any(s => s.Contains("NaN", StringComparison.Ordinal) || s.Contains("Infinity", StringComparison.Ordinal)
                || s.Contains('\u221E') || s.Contains("inf,", StringComparison.Ordinal) || s.Contains("nan,", StringComparison.Ordinal));
}
