using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning;
using DesignCompiler.Syntax;

namespace DesignCompiler.Tests.Language;

/// <summary>The shipped examples are valid designs: they parse, bind with no error (warnings allowed) and pass the feasibility check.</summary>
public sealed class ExamplesParseTests
{
    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        foreach (var path in Directory.EnumerateFiles(LanguagePaths.Examples, "*.trial").OrderBy(p => p, StringComparer.Ordinal))
            data.Add(Path.GetFileName(path));
        return data;
    }

    [Fact]
    public void There_are_examples_to_check()
    {
        Assert.NotEmpty(Directory.EnumerateFiles(LanguagePaths.Examples, "*.trial"));
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Example_parses_without_syntax_errors(string name)
    {
        var source = Checker.ReadCase(Path.Combine(LanguagePaths.Examples, name));
        var parsed = DesignParser.Parse(source);
        Assert.False(parsed.HasErrors, DiagnosticFormatter.FormatAll(parsed.Diagnostics));
        Assert.NotNull(parsed.Syntax.Name);
        Assert.NotEmpty(parsed.Syntax.Statements);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Example_binds_without_errors(string name)
    {
        var source = Checker.ReadCase(Path.Combine(LanguagePaths.Examples, name));
        var bound = DesignBinder.Check(source);
        Assert.True(bound.Design is not null, DiagnosticFormatter.FormatAll(bound.Diagnostics));
        Assert.DoesNotContain(bound.Diagnostics, d => d.Severity == Severity.Error);
        Assert.True(bound.Design!.Arms.Count >= 2);
        Assert.True(bound.Design.PlotsPerRound > 0);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Example_passes_the_feasibility_check(string name)
    {
        var source = Checker.ReadCase(Path.Combine(LanguagePaths.Examples, name));
        var design = DesignBinder.Check(source).Design;
        Assert.NotNull(design);
        var problems = DesignFeasibility.Check(design);
        Assert.DoesNotContain(problems, d => d.Severity == Severity.Error);
    }
}
