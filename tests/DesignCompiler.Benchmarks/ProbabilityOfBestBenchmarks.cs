using BenchmarkDotNet.Attributes;
using DesignCompiler.Numerics;

namespace DesignCompiler.Benchmarks;

/// <summary>
/// P(best) for 2, 10 and 100 arms of each posterior family, moderate (a few dozen plots per arm) and very
/// peaked (thousands), plus the C reference's mixed set of ten beta arms. Allocation-free form, as the
/// planner's inner loop calls it.
/// </summary>
public class ProbabilityOfBestBenchmarks
{
    private IMarginal[] _arms = [];
    private double[] _probabilities = [];
    private double[] _loss = [];

    [ParamsSource(nameof(Cases))]
    public string Case { get; set; } = "";

    public static IEnumerable<string> Cases()
    {
        yield return "beta-10-reference";
        foreach (var family in new[] { "beta", "normal", "student-t", "gamma" })
            foreach (var arms in new[] { 2, 10, 100 })
                foreach (var shape in new[] { "moderate", "peaked" })
                    yield return $"{family}-{arms}-{shape}";
    }

    [GlobalSetup]
    public void Setup()
    {
        _arms = PosteriorSets.For(Case);
        _probabilities = new double[_arms.Length];
        _loss = new double[_arms.Length];
    }

    [Benchmark]
    public double ProbabilityOfBest() => Numerics.ProbabilityOfBest.Compute(_arms, _probabilities, _loss);
}
