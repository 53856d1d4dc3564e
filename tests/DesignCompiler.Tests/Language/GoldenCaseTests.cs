// Golden cases of the checker.
//
// Every tests/Cases/<area>/<name>.trial is checked (parse, bind, then the feasibility check
// when binding succeeded) and what the checker prints for it, DiagnosticFormatter.FormatAll
// with the path shown as "<name>.trial", is compared with <name>.expected.txt beside it.
// Expected files use LF line endings; a valid design's expected file is empty.
//
// To accept new output after a deliberate change (a reworded message, a new diagnostic),
// run the tests with the environment variable TRIALC_REGENERATE=1: instead of comparing,
// the runner then rewrites every expected file from the current output. Review the diff of
// tests/Cases before committing it: a regenerated file pins whatever the checker now prints.
//
// The case files are read as raw bytes (UTF-8, a byte-order mark kept as a character) so that
// the line-ending and byte-order-mark cases exercise the checker's own handling of them;
// tests/Cases/.gitattributes keeps git from converting them.

using System.Text;
using DesignCompiler.Diagnostics;

namespace DesignCompiler.Tests.Language;

public sealed class GoldenCaseTests
{
    private const string ValidArea = "009-valid";

    private static bool Regenerating => Environment.GetEnvironmentVariable("TRIALC_REGENERATE") == "1";

    /// <summary>Every case file, as a path relative to tests/Cases with '/' separators.</summary>
    public static TheoryData<string> Cases()
    {
        var data = new TheoryData<string>();
        foreach (var path in AllCaseFiles()) data.Add(Relative(path));
        return data;
    }

    private static IEnumerable<string> AllCaseFiles() =>
        Directory.EnumerateFiles(LanguagePaths.Cases, "*.trial", SearchOption.AllDirectories)
            .OrderBy(p => Relative(p), StringComparer.Ordinal);

    private static string Relative(string fullPath) =>
        Path.GetRelativePath(LanguagePaths.Cases, fullPath).Replace('\\', '/');

    private static string FullPath(string relative) => Path.Combine(LanguagePaths.Cases, relative.Replace('/', Path.DirectorySeparatorChar));

    private static string ExpectedPathOf(string trialPath) =>
        Path.Combine(Path.GetDirectoryName(trialPath)!, Path.GetFileNameWithoutExtension(trialPath) + ".expected.txt");

    private static string Actual(string trialPath) =>
        DiagnosticFormatter.FormatAll(Checker.Diagnose(Checker.ReadCase(trialPath)));

    private static string ReadExpected(string expectedPath) =>
        File.ReadAllText(expectedPath, Encoding.UTF8).Replace("\r\n", "\n");

    [Theory]
    [MemberData(nameof(Cases))]
    public void Case_prints_exactly_its_expected_diagnostics(string relativePath)
    {
        var trialPath = FullPath(relativePath);
        var expectedPath = ExpectedPathOf(trialPath);
        var actual = Actual(trialPath);

        if (Regenerating)
        {
            File.WriteAllText(expectedPath, actual, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false));
            return;
        }

        Assert.True(File.Exists(expectedPath),
            $"{relativePath} has no expected file; run with TRIALC_REGENERATE=1 to write it. The checker prints:\n{actual}");
        Assert.Equal(ReadExpected(expectedPath), actual);
    }

    [Fact]
    public void Every_expected_file_belongs_to_a_case()
    {
        var orphans = Directory.EnumerateFiles(LanguagePaths.Cases, "*.expected.txt", SearchOption.AllDirectories)
            .Where(e => !File.Exists(Path.Combine(Path.GetDirectoryName(e)!, Path.GetFileName(e)[..^".expected.txt".Length] + ".trial")))
            .Select(Relative)
            .ToList();
        Assert.Empty(orphans);
    }

    [Fact]
    public void There_are_at_least_35_bad_designs_and_a_few_valid_ones()
    {
        var all = AllCaseFiles().Select(Relative).ToList();
        var valid = all.Count(p => p.StartsWith(ValidArea + "/", StringComparison.Ordinal));
        Assert.True(all.Count - valid >= 35, $"only {all.Count - valid} bad designs");
        Assert.True(valid >= 3, $"only {valid} valid designs");
    }

    [Fact]
    public void Bad_designs_report_an_error_or_warning_and_valid_designs_report_nothing()
    {
        var problems = new List<string>();
        foreach (var path in AllCaseFiles())
        {
            var relative = Relative(path);
            var diagnostics = Checker.Diagnose(Checker.ReadCase(path));
            var isValid = relative.StartsWith(ValidArea + "/", StringComparison.Ordinal);
            if (isValid && diagnostics.Count > 0) problems.Add(relative + " should be clean but reports " + string.Join(", ", diagnostics.Select(d => d.Id)));
            if (!isValid && diagnostics.Count == 0) problems.Add(relative + " is meant to show a mistake but reports nothing");
        }
        Assert.Empty(problems);
    }

    /// <summary>The same design stored with LF, CR LF, a byte-order mark, and both: the output may differ only in the file name.</summary>
    [Fact]
    public void Line_endings_and_byte_order_mark_give_the_same_output_as_LF()
    {
        var folder = Path.Combine(LanguagePaths.Cases, "001-syntax");
        var lf = Path.Combine(folder, "line-endings-lf.trial");
        var reference = Actual(lf).Replace("line-endings-lf.trial", "FILE");
        Assert.NotEqual("", reference);

        foreach (var variant in new[] { "line-endings-crlf", "line-endings-bom", "line-endings-bom-crlf" })
        {
            var path = Path.Combine(folder, variant + ".trial");
            Assert.Equal(reference, Actual(path).Replace(variant + ".trial", "FILE"));
        }
    }

    /// <summary>Guards the cases above: if a checkout converted the files, they would no longer test anything.</summary>
    [Fact]
    public void Line_ending_cases_are_stored_as_their_names_say()
    {
        var folder = Path.Combine(LanguagePaths.Cases, "001-syntax");
        byte[] bom = [0xEF, 0xBB, 0xBF];

        var lf = File.ReadAllBytes(Path.Combine(folder, "line-endings-lf.trial"));
        var crlf = File.ReadAllBytes(Path.Combine(folder, "line-endings-crlf.trial"));
        var bomOnly = File.ReadAllBytes(Path.Combine(folder, "line-endings-bom.trial"));
        var both = File.ReadAllBytes(Path.Combine(folder, "line-endings-bom-crlf.trial"));

        Assert.DoesNotContain((byte)'\r', lf);
        Assert.False(lf.AsSpan().StartsWith(bom));
        Assert.Contains("\r\n", Encoding.UTF8.GetString(crlf), StringComparison.Ordinal);
        Assert.Equal(Encoding.UTF8.GetString(crlf).Split("\r\n").Length, Encoding.UTF8.GetString(crlf).Split('\n').Length);
        Assert.True(bomOnly.AsSpan().StartsWith(bom));
        Assert.DoesNotContain((byte)'\r', bomOnly);
        Assert.True(both.AsSpan().StartsWith(bom));
        Assert.Contains("\r\n", Encoding.UTF8.GetString(both), StringComparison.Ordinal);
        Assert.Contains((byte)'\t', File.ReadAllBytes(Path.Combine(folder, "tabs.trial")));
    }

    [Fact]
    public void Expected_files_use_LF_line_endings()
    {
        var withCr = Directory.EnumerateFiles(LanguagePaths.Cases, "*.expected.txt", SearchOption.AllDirectories)
            .Where(p => File.ReadAllBytes(p).Contains((byte)'\r'))
            .Select(Relative)
            .ToList();
        Assert.Empty(withCr);
    }
}
