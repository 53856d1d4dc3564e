using System.Text;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Text;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DesignCompiler.Tests.Language;

/// <summary>
/// The checker never throws on bad input, and every diagnostic (and every note) points
/// inside the text it was given. Inputs are the example files, damaged at random: flipped
/// bytes, cuts, inserted braces, quotes, comment signs, huge numbers, odd Unicode, changed
/// line endings, byte-order marks, deep nesting, several of these at once. The whole class runs in a few seconds.
/// </summary>
/// <remarks>
/// Time per input is bounded by construction, not by a clock: the loader refuses any file over
/// <see cref="DesignLimits.MaxDesignFileBytes"/>, every generated input stays under it (asserted), and the
/// fuzz harness (tests/DesignCompiler.Fuzz) flags any input over a second. The one clock here is a
/// 30-second timeout per input, over a thousand times what an input takes, so that a hang fails this
/// test with the input shown instead of stalling the whole run; it is never a speed check.
/// </remarks>
public sealed class ParserRobustnessTests
{
    private static readonly Lazy<string[]> LazyExamples = new(() =>
        Directory.EnumerateFiles(LanguagePaths.Examples, "*.trial")
            .OrderBy(p => p, StringComparer.Ordinal)
            .Select(File.ReadAllText)
            .ToArray());

    private static string[] Examples => LazyExamples.Value;

    /// <summary>Text that is inserted: structure, numbers past every limit, and characters a lexer may trip on.</summary>
    private static readonly string[] Payloads =
    [
        "{", "}", "\"", "#", "(", ")", ",", ":", "%", ">=", "-", ".", "\\", "x",
        "1e999", "-1e999", "1e-999", "99999999999999999999", "18446744073709551616", "0.000000000000000000001",
        "\r\n", "\r", "\n", "\t", "\n}\n", "\nscenario \"s\" {\n", "\ntrial \"again\" {\n",
        "\u00e9", "\u00df", "\u0130", "\u0661\u0662", "\u2212", "\u00bd", "\u200b", "\u00a0", "\u2028",
        "\ufeff", "\u0000", "\ud83c\udf3e", "\ud800", "\udc00", "\ufffd",
    ];

    public enum MutationKind
    {
        FlipBit,
        Truncate,
        Insert,
        Delete,
        DuplicateLine,
        ToCrLf,
        ToCr,
        Repeat,
        Nest,
        Bom,
        HugeNumber,
    }

    /// <summary>Openings that nest when repeated: braces, parentheses, scenario and trial blocks, quotes.</summary>
    private static readonly string[] Nestings = ["{", "(", "scenario \"s\" {\n", "trial \"t\" {\n", "beta(", "\"", "{ every arm "];

    /// <summary>Numbers past every range a reader might hold them in.</summary>
    private static readonly string[] HugeNumbers =
    [
        new string('9', 400), "1e308", "1.7976931348623157e309", "4.9e-324", "1e-400", "-0", "0.0000000000000000000000000001",
        "2147483648", "-2147483649", "9223372036854775808", "18446744073709551616", "340282366920938463463374607431768211456",
    ];

    public sealed record Mutation(int Example, MutationKind Kind, int Position, int Payload, int Length)
    {
        public override string ToString() => $"{Kind} of example {Example} at {Position} (payload {Payload}, length {Length})";
    }

    private static Gen<Mutation> OneMutation() =>
        from example in Gen.Choose(0, 1000)
        from kind in Gen.Elements(Enum.GetValues<MutationKind>())
        from position in Gen.Choose(0, 100_000)
        from payload in Gen.Choose(0, Payloads.Length - 1)
        from length in Gen.Choose(1, 40)
        select new Mutation(example, kind, position, payload, length);

    private static Arbitrary<Mutation> Mutations() => OneMutation().ToArbitrary();

    /// <summary>Up to four mutations applied one after another to the same example.</summary>
    private static Arbitrary<Mutation[]> StackedMutations() =>
        (from count in Gen.Choose(1, 4)
         from mutations in OneMutation().ArrayOf(count)
         select mutations).ToArbitrary();

    internal static string Apply(Mutation m) => Apply(m, Examples[m.Example % Examples.Length]);

    internal static string Apply(IReadOnlyList<Mutation> mutations) =>
        mutations.Aggregate(Examples[mutations[0].Example % Examples.Length], (text, m) => Apply(m, text));

    internal static string Apply(Mutation m, string text)
    {
        var at = m.Position % (text.Length + 1);
        switch (m.Kind)
        {
            case MutationKind.FlipBit:
                var bytes = Encoding.UTF8.GetBytes(text);
                if (bytes.Length == 0) return text;
                bytes[m.Position % bytes.Length] ^= (byte)(1 << (m.Length % 8));
                return Encoding.UTF8.GetString(bytes);
            case MutationKind.Truncate:
                return text[..at];
            case MutationKind.Insert:
                return text.Insert(at, Payloads[m.Payload]);
            case MutationKind.Delete:
                return text.Remove(at, Math.Min(m.Length, text.Length - at));
            case MutationKind.DuplicateLine:
                var lines = text.Split('\n');
                var line = m.Position % lines.Length;
                return string.Join('\n', lines.Take(line + 1).Append(lines[line]).Concat(lines.Skip(line + 1)));
            case MutationKind.ToCrLf:
                return text.Replace("\n", "\r\n").Insert(Math.Min(at, text.Length), Payloads[m.Payload]);
            case MutationKind.ToCr:
                return text.Replace("\n", "\r");
            case MutationKind.Nest:
                return text.Insert(at, string.Concat(Enumerable.Repeat(Nestings[m.Payload % Nestings.Length], 10 * m.Length)));
            case MutationKind.Bom:
                return "\ufeff" + (m.Length % 2 == 0 ? text.Replace("\n", "\r\n") : text);
            case MutationKind.HugeNumber:
                return ReplaceNumber(text, at, HugeNumbers[m.Payload % HugeNumbers.Length]);
            default:
                return text.Insert(at, string.Concat(Enumerable.Repeat(Payloads[m.Payload], m.Length)));
        }
    }

    /// <summary>The first run of digits at or after <paramref name="at"/> (wrapping round) becomes <paramref name="number"/>.</summary>
    private static string ReplaceNumber(string text, int at, string number)
    {
        for (var k = 0; k < text.Length; k++)
        {
            var i = (at + k) % text.Length;
            if (!char.IsAsciiDigit(text[i]) || i > 0 && char.IsAsciiDigit(text[i - 1])) continue;
            var end = i;
            while (end < text.Length && (char.IsAsciiDigit(text[end]) || text[end] == '.')) end++;
            return text[..i] + number + text[end..];
        }
        return text + number;
    }

    /// <summary>
    /// <see cref="AssertWellBehaved"/> on a worker, failing with the input if it has not finished in 30 s
    /// (see the class remarks: a hang detector, not a speed check).
    /// </summary>
    internal static void AssertWellBehavedWithin(string text)
    {
        Assert.True(text.Length <= DesignLimits.MaxDesignFileBytes, "the generator made an input the loader would refuse unread");
        var check = Task.Run(() => AssertWellBehaved(text));
        if (!check.Wait(TimeSpan.FromSeconds(30)))
            Assert.Fail("the checker did not finish within 30 s for input:\n" + Visible(text));
        check.GetAwaiter().GetResult();
    }

    /// <summary>Checks the text; fails the test with the reason when the checker throws or points outside the text.</summary>
    internal static void AssertWellBehaved(string text)
    {
        var source = new SourceText("mutated.trial", text);
        IReadOnlyList<Diagnostic> diagnostics;
        try
        {
            diagnostics = Checker.Diagnose(source);
            _ = DiagnosticFormatter.FormatAll(diagnostics);
        }
        catch (Exception e)
        {
            Assert.Fail($"the checker threw {e.GetType().Name}: {e.Message}\nfor input:\n{Visible(text)}");
            return;
        }

        foreach (var diagnostic in diagnostics)
        {
            AssertInside(source, diagnostic.Location, diagnostic.Id, text);
            foreach (var related in diagnostic.RelatedLocations)
                AssertInside(source, related.Location, diagnostic.Id + " note", text);
        }
    }

    private static void AssertInside(SourceText source, SourceLocation location, string what, string text)
    {
        var span = location.Span;
        var inside = span.Start >= 0 && span.Length >= 0 && span.End <= source.Content.Length;
        Assert.True(inside, $"{what} points at {span}, outside the text of {source.Content.Length} characters:\n{Visible(text)}");
        Assert.Same(source.Content, location.Source?.Content ?? source.Content);
        Assert.InRange(location.Start.Line, 1, source.LineCount);
    }

    private static string Visible(string text) =>
        text.Length > 2000 ? text[..2000] + "…" : text.Replace("\r", "\\r");

    [Property(MaxTest = 400, QuietOnSuccess = true)]
    public Property Mutated_examples_never_throw_and_every_span_lies_within_the_text() =>
        Prop.ForAll(Mutations(), mutation =>
        {
            AssertWellBehavedWithin(Apply(mutation));
            return true;
        });

    [Property(MaxTest = 200, QuietOnSuccess = true)]
    public Property Examples_damaged_several_times_over_never_throw_and_every_span_lies_within_the_text() =>
        Prop.ForAll(StackedMutations(), mutations =>
        {
            AssertWellBehavedWithin(Apply(mutations));
            return true;
        });

    [Fact]
    public void The_shortest_example_cut_at_every_position_never_throws()
    {
        var shortest = Examples.OrderBy(e => e.Length).First();
        for (var length = 0; length <= shortest.Length; length++)
            AssertWellBehaved(shortest[..length]);
    }

    [Fact]
    public void Pathological_inputs_never_throw()
    {
        string[] inputs =
        [
            "", " ", "\n", "\r\n", "\ufeff", "\ufeff\ufeff", "}", "{", "\"", "#", "trial", "trial \"", "trial \"x\" {",
            "trial \"x\" {\n}\n}\n}", new string('{', 5000), new string('"', 5001), "trial \"x\" {\n" + new string('9', 10_000) + "\n}",
            "trial \"x\" {\n  seed " + new string('9', 400) + "\n  rounds 1e999\n  plots -1e999 per round\n}",
            "trial \"x\" {\n  scenario \"s\" {\n" + string.Concat(Enumerable.Repeat("    A 0.5\n", 2000)) + "}",
            "trial \"x\" {\n" + string.Concat(Enumerable.Repeat("  arm A \"a\"\n", 3000)) + "}",
            "trial \"x\" {\n  outcome y: bernoulli\n  default prior beta(1e-320, 1e308)\n  arm A \"a\"\n  arm B \"b\"\n" +
            "  seed 1\n  rounds 100\n  plots 100000 per round\n  limit every arm >= 100% per round\n}",
            "\u0000\u0001\u0002trial",
            // Nesting far past anything the grammar allows, as deep as a 100 KB file can make it.
            "trial \"x\" {\n  default prior beta" + new string('(', 100_000) + "\n}\n",
            "trial \"x\" {\n" + string.Concat(Enumerable.Repeat("  scenario \"s\" {\n", 2000)) + "}\n",
            "trial \"x\" {\n  arm A \"" + new string('x', 100_000) + "\n}\n",
            "\ufeff" + new string('{', 100_000),
            "trial \"\ud800\" {\n}",
        ];
        foreach (var input in inputs) AssertWellBehaved(input);
    }
}
