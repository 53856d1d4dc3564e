using System.Text;
using System.Text.Json;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning;
using DesignCompiler.Text;

namespace DesignCompiler.Tests.Testing;

/// <summary>
/// What must hold for any input, as lists of broken rules (empty when all hold): every diagnostic
/// points inside its text, and every plan and rendered file is free of NaN and infinity with
/// probabilities in [0, 1] summing to 1. The tests assert the lists are empty; the fuzz harness
/// (tests/DesignCompiler.Fuzz, which compiles this file in) throws on the first entry, so both
/// judge an input by the same rules.
/// </summary>
internal static class OutputInvariants
{
    /// <summary>
    /// How far the probabilities of being best may sum from 1. The quadrature renormalises them, so
    /// the sum is 1 to rounding (a few ulps per arm); 1e-9 leaves room for a thousand arms.
    /// </summary>
    public const double SumTolerance = 1e-9;

    public static List<string> DiagnosticProblems(SourceText source, IEnumerable<Diagnostic> diagnostics)
    {
        var problems = new List<string>();
        foreach (var diagnostic in diagnostics)
        {
            Inside(source, diagnostic.Location, diagnostic.Id, problems);
            foreach (var related in diagnostic.RelatedLocations)
                Inside(source, related.Location, diagnostic.Id + " note", problems);
            if (diagnostic.Message.Length == 0) problems.Add(diagnostic.Id + " has an empty message");
        }
        return problems;
    }

    private static void Inside(SourceText source, SourceLocation location, string what, List<string> problems)
    {
        // A file-level diagnostic (no text: unreadable, too large) sits at 1:1 by definition.
        if (location.Source is null) return;
        var span = location.Span;
        if (!ReferenceEquals(location.Source.Content, source.Content) && location.Source.Content != source.Content)
            problems.Add($"{what} points into another text than the one checked");
        if (span.Start < 0 || span.Length < 0 || span.End > location.Source.Content.Length)
            problems.Add($"{what} points at {span}, outside the text of {location.Source.Content.Length} characters");
        var start = location.Start;
        if (start.Line < 1 || start.Line > location.Source.LineCount || start.Column < 1)
            problems.Add($"{what} is at line {start.Line}, column {start.Column}; the text has {location.Source.LineCount} lines");
    }

    public static List<string> PlanProblems(RoundPlan plan)
    {
        var problems = new List<string>();
        var sum = 0.0;
        foreach (var arm in plan.Arms)
        {
            Finite(arm.Code + " P(best)", arm.ProbabilityBest, problems);
            Finite(arm.Code + " target share", arm.TargetShare, problems);
            Finite(arm.Code + " posterior mean", arm.PosteriorMean, problems);
            Finite(arm.Code + " interval lower end", arm.CredibleLower, problems);
            Finite(arm.Code + " interval upper end", arm.CredibleUpper, problems);
            Finite(arm.Code + " expected loss", arm.ExpectedLoss, problems);
            if (arm.ProbabilityBest is < 0 or > 1) problems.Add($"{arm.Code} P(best) {arm.ProbabilityBest:R} is outside [0, 1]");
            if (arm.TargetShare is < 0 or > 1) problems.Add($"{arm.Code} target share {arm.TargetShare:R} is outside [0, 1]");
            if (arm.ExpectedLoss < 0) problems.Add($"{arm.Code} expected loss {arm.ExpectedLoss:R} is negative");
            if (arm.CredibleLower > arm.CredibleUpper) problems.Add($"{arm.Code} interval [{arm.CredibleLower:R}, {arm.CredibleUpper:R}] is reversed");
            if (arm.Plots < 0) problems.Add($"{arm.Code} has {arm.Plots} plots");
            sum += arm.ProbabilityBest;
        }
        var anyInTrial = plan.Arms.Any(a => a.Status != ArmStatus.Dropped);
        if (anyInTrial && Math.Abs(sum - 1) > SumTolerance)
            problems.Add($"P(best) sums to {sum:R}, not 1 within {SumTolerance:R}");
        Finite("the P(best) error bound", plan.ProbabilityBestErrorBound, problems);
        if (plan.Arms.Sum(a => a.Plots) != plan.Plots) problems.Add("the arms' plots do not add up to the round's");
        return problems;
    }

    private static void Finite(string what, double value, List<string> problems)
    {
        if (!double.IsFinite(value)) problems.Add($"{what} is {value}");
    }

    /// <summary>
    /// Rendered files: no NaN or infinity written as text in any of them, and the JSON parses with
    /// every number finite. User text (names, labels) could spell "NaN", so callers pass designs
    /// whose names do not, or accept the word inside a JSON string.
    /// </summary>
    public static List<string> FileProblems(IEnumerable<(string Name, byte[] Content)> files)
    {
        var problems = new List<string>();
        foreach (var (name, content) in files)
        {
            var text = Encoding.UTF8.GetString(content);
            if (name.EndsWith(".json", StringComparison.Ordinal))
            {
                try
                {
                    using var document = JsonDocument.Parse(text);
                    JsonNumbers(document.RootElement, name, problems);
                    JsonProbabilities(document.RootElement, name, problems);
                }
                catch (JsonException e)
                {
                    problems.Add($"{name} is not valid JSON: {e.Message}");
                }
                continue;
            }
            foreach (var word in NonFiniteWords)
                if (text.Contains(word, StringComparison.Ordinal)) problems.Add($"{name} contains '{word}'");
        }
        return problems;
    }

    /// <summary>How .NET, C and JavaScript print a number that is not finite.</summary>
    private static readonly string[] NonFiniteWords = ["NaN", "Infinity", "\u221E", "inf,", "nan,"];

    private static readonly HashSet<string> AlwaysNumbers =
        ["probabilityBest", "posteriorMean", "expectedLoss", "targetShare", "probabilityBestErrorBound"];

    /// <summary>Every "arms" list: each probabilityBest in [0, 1], and together 1 within <see cref="SumTolerance"/>.</summary>
    private static void JsonProbabilities(JsonElement root, string name, List<string> problems)
    {
        if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty("arms", out var arms) || arms.ValueKind != JsonValueKind.Array) return;
        var probabilities = arms.EnumerateArray()
            .Where(a => a.ValueKind == JsonValueKind.Object && a.TryGetProperty("probabilityBest", out var p) && p.ValueKind == JsonValueKind.Number)
            .Select(a => a.GetProperty("probabilityBest").GetDouble()).ToList();
        if (probabilities.Count == 0) return;
        foreach (var p in probabilities)
            if (p is < 0 or > 1) problems.Add($"{name} has a probability of being best of {p:R}, outside [0, 1]");
        var sum = probabilities.Sum();
        if (sum > 0 && Math.Abs(sum - 1) > SumTolerance) problems.Add($"{name}: the probabilities of being best sum to {sum:R}");
    }

    private static void JsonNumbers(JsonElement element, string name, List<string> problems)
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (var property in element.EnumerateObject())
                {
                    // The renderers write null for a number that is not finite; for these figures that is never right.
                    if (AlwaysNumbers.Contains(property.Name) && property.Value.ValueKind == JsonValueKind.Null)
                        problems.Add($"{name} has \"{property.Name}\": null");
                    if (property.Name == "credibleInterval" && property.Value.ValueKind == JsonValueKind.Array
                        && property.Value.EnumerateArray().Any(v => v.ValueKind != JsonValueKind.Number))
                        problems.Add($"{name} has a credible interval that is not two numbers");
                    JsonNumbers(property.Value, name, problems);
                }
                break;
            case JsonValueKind.Array:
                foreach (var item in element.EnumerateArray()) JsonNumbers(item, name, problems);
                break;
            case JsonValueKind.Number:
                if (!element.TryGetDouble(out var value) || !double.IsFinite(value))
                    problems.Add($"{name} has the number {element.GetRawText()}, which is not a finite double");
                break;
            case JsonValueKind.String:
                var s = element.GetString();
                if (s is "NaN" or "Infinity" or "-Infinity") problems.Add($"{name} has the string \"{s}\" where a number belongs");
                break;
        }
    }
}
