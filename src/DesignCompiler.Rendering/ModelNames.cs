using System.Collections.Concurrent;
using System.Reflection;
using Scriban.Runtime;

namespace DesignCompiler.Rendering;

/// <summary>Every name a template can use on a model type, snake_case as templates see them, nested records and lists included.</summary>
internal static class ModelNames
{
    private static readonly ConcurrentDictionary<Type, IReadOnlyList<string>> Cache = new();

    public static IReadOnlyList<string> Of(Type type) => Cache.GetOrAdd(type, t =>
    {
        var names = new SortedSet<string>(StringComparer.Ordinal);
        Collect(t, names, []);
        return names.ToList();
    });

    private static void Collect(Type type, SortedSet<string> names, HashSet<Type> seen)
    {
        if (type.IsPrimitive || type == typeof(string) || !seen.Add(type)) return;
        if (ElementType(type) is { } element)
        {
            Collect(element, names, seen);
            return;
        }
        foreach (var property in type.GetProperties(BindingFlags.Public | BindingFlags.Instance))
        {
            if (property.Name == "EqualityContract") continue;
            names.Add(StandardMemberRenamer.Rename(property.Name));
            Collect(Nullable.GetUnderlyingType(property.PropertyType) ?? property.PropertyType, names, seen);
        }
    }

    private static Type? ElementType(Type type) =>
        type.GetInterfaces().Append(type)
            .FirstOrDefault(i => i.IsGenericType && i.GetGenericTypeDefinition() == typeof(IEnumerable<>))?.GetGenericArguments()[0];
}
