using System.Reflection;
using DesignCompiler.Rendering.Models;
using DesignCompiler.Rendering.Status;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Architecture;

/// <summary>docs/templates.md documents every name a template can use, so the page cannot fall behind the models.</summary>
public sealed class TemplateModelDocsTests
{
    public static TheoryData<string> Names() => [.. ModelNames()];

    private static SortedSet<string> ModelNames()
    {
        var names = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var model in new[] { typeof(SheetModel), typeof(StatusModel) }) Collect(model, names, []);
        return names;
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void Every_model_field_is_documented(string name)
    {
        var docs = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "templates.md"));
        Assert.Contains("`" + name + "`", docs);
    }

    [Fact]
    public void The_documented_round_model_is_the_one_templates_see()
    {
        // A template sees names as Scriban's standard renamer makes them (PascalCase to snake_case).
        Assert.Equal("probability_best_text", Scriban.Runtime.StandardMemberRenamer.Rename(nameof(ArmModel.ProbabilityBestText)));
        Assert.Contains("plot_list", ModelNames());
    }

    private static void Collect(Type type, SortedSet<string> names, HashSet<Type> seen)
    {
        if (type.IsPrimitive || type == typeof(string) || !seen.Add(type)) return;
        var element = type.IsGenericType && type.GetGenericTypeDefinition() == typeof(IReadOnlyList<>) ? type.GetGenericArguments()[0] : null;
        if (element is not null)
        {
            Collect(element, names, seen);
            return;
        }
        foreach (var property in type.GetProperties(BindingFlags.Public | BindingFlags.Instance).Where(p => p.Name != "EqualityContract"))
        {
            names.Add(Scriban.Runtime.StandardMemberRenamer.Rename(property.Name));
            Collect(Nullable.GetUnderlyingType(property.PropertyType) ?? property.PropertyType, names, seen);
        }
    }
}
