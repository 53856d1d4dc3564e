namespace DesignCompiler.Tests.Testing;

/// <summary>Finds the repository's folders from wherever the test assembly runs.</summary>
public static class RepoPaths
{
    public static string Root { get; } = FindRoot();

    public static string Examples => Path.Combine(Root, "examples");

    public static string Example(string name) => Path.Combine(Examples, name);

    private static string FindRoot()
    {
        if (Environment.GetEnvironmentVariable("TRIALC_REPO") is { Length: > 0 } fromEnvironment) return fromEnvironment;
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(Path.Combine(directory.FullName, "DesignCompiler.sln")))
            directory = directory.Parent;
        return directory?.FullName ?? throw new InvalidOperationException("cannot find DesignCompiler.sln above " + AppContext.BaseDirectory);
    }
}
