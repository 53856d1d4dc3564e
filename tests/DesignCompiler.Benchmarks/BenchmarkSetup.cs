using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Diagnosers;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Toolchains.InProcess.Emit;
using DesignCompiler.Binding;
using DesignCompiler.Text;

namespace DesignCompiler.Benchmarks;

/// <summary>The configuration every benchmark runs under, and the designs they load.</summary>
public static class BenchmarkSetup
{
    /// <summary>
    /// Allocations are always reported (MemoryDiagnoser): the simulator promises none per round. The short
    /// mode runs in this process with few iterations, for a quick look; its numbers are rougher.
    /// </summary>
    public static IConfig Config(bool quick)
    {
        var config = DefaultConfig.Instance.AddDiagnoser(MemoryDiagnoser.Default);
        if (!quick) return config;
        var job = Job.ShortRun.WithToolchain(InProcessEmitToolchain.Instance).WithWarmupCount(2).WithIterationCount(3);
        return config.AddJob(job).WithOptions(ConfigOptions.DisableOptimizationsValidator);
    }

    public static string DesignPath(string name) => Path.Combine(AppContext.BaseDirectory, "Designs", name);

    public static CheckedDesign Load(string name)
    {
        var path = DesignPath(name);
        var bound = DesignBinder.Check(new SourceText(path, File.ReadAllText(path)));
        return bound.Design ?? throw new InvalidOperationException(path + " does not check: " + string.Join("; ", bound.Diagnostics.Select(d => d.Message)));
    }
}
