using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Text;

namespace DesignCompiler.Tests.Testing;

/// <summary>Checked designs from inline text or shipped examples, for planner tests.</summary>
public static class TestDesigns
{
    public static CheckedDesign FromText(string text, string path = "test.trial")
    {
        var bound = DesignBinder.Check(new SourceText(path, text));
        Assert.True(bound.Design is not null, string.Join("\n", bound.Diagnostics.Select(d => d.Message)));
        var feasibility = DesignFeasibility.Check(bound.Design!);
        Assert.DoesNotContain(feasibility, d => d.Severity == Diagnostics.Severity.Error);
        return bound.Design!;
    }

    public static CheckedDesign Example(string name) =>
        FromText(File.ReadAllText(RepoPaths.Example(name)), RepoPaths.Example(name));
}
