using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Planning;
using DesignCompiler.Text;

namespace DesignCompiler.Cli.Commands;

/// <summary>Read, parse, bind and check a design file: the first steps of every command.</summary>
internal static class DesignLoader
{
    public static (CheckedDesign? Design, IReadOnlyList<Diagnostic> Diagnostics) Load(string path)
    {
        var (text, problem) = SourceFiles.Read(path, DesignLimits.MaxDesignFileBytes, "a design file");
        if (text is null) return (null, [problem!]);
        var bound = DesignBinder.Check(text);
        if (bound.Design is null) return (null, bound.Diagnostics);
        var feasibility = DesignFeasibility.Check(bound.Design);
        var all = bound.Diagnostics.Concat(feasibility).ToList();
        return (all.Any(d => d.Severity == Severity.Error) ? null : bound.Design, all);
    }
}
