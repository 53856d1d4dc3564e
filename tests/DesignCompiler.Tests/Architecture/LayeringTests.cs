using System.Reflection;
using DesignCompiler.Binding;
using DesignCompiler.Syntax;

namespace DesignCompiler.Tests.Architecture;

/// <summary>The pipeline's direction and immutability, checked on the compiled assemblies.</summary>
public sealed class LayeringTests
{
    [Fact]
    public void The_core_library_references_neither_templating_nor_the_command_line()
    {
        var references = typeof(CheckedDesign).Assembly.GetReferencedAssemblies().Select(a => a.Name).ToList();
        Assert.DoesNotContain("Scriban", references);
        Assert.DoesNotContain("Scriban.Signed", references);
        Assert.DoesNotContain("System.CommandLine", references);
        // MathNet.Numerics is a test oracle only; the core's linear algebra is its own.
        Assert.DoesNotContain("MathNet.Numerics", references);
    }

    [Fact]
    public void Rendering_does_not_reference_the_command_line()
    {
        var references = typeof(DesignCompiler.Rendering.TemplateRenderer).Assembly.GetReferencedAssemblies().Select(a => a.Name);
        Assert.DoesNotContain("System.CommandLine", references);
    }

    public static TheoryData<Type> SyntaxAndBoundTypes()
    {
        var data = new TheoryData<Type>();
        foreach (var type in typeof(CheckedDesign).Assembly.GetTypes()
                     .Where(t => t.Namespace is "DesignCompiler.Syntax" or "DesignCompiler.Binding")
                     .Where(t => t.IsPublic && !t.IsEnum && !t.IsInterface && !(t.IsAbstract && t.IsSealed))
                     .Where(t => t != typeof(DesignBinder)))
            data.Add(type);
        return data;
    }

    [Theory]
    [MemberData(nameof(SyntaxAndBoundTypes))]
    public void Syntax_and_bound_types_are_immutable(Type type)
    {
        foreach (var property in type.GetProperties(BindingFlags.Public | BindingFlags.Instance))
        {
            var setter = property.SetMethod;
            var isInitOnly = setter?.ReturnParameter.GetRequiredCustomModifiers().Any(m => m.Name == "IsExternalInit") ?? true;
            Assert.True(setter is null || !setter.IsPublic || isInitOnly, $"{type.Name}.{property.Name} has a public setter");
        }
        foreach (var field in type.GetFields(BindingFlags.Public | BindingFlags.Instance))
            Assert.True(field.IsInitOnly, $"{type.Name}.{field.Name} is a writable public field");
    }
}
