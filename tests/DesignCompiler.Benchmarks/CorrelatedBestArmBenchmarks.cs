using BenchmarkDotNet.Attributes;
using DesignCompiler.Numerics.Multivariate;

namespace DesignCompiler.Benchmarks;

/// <summary>
/// P(best) when arms share block and round effects (the posterior of 'model adjusts for block and round'): five
/// arms, normal (noise known) and t (noise unknown, ν = 12), with the lattice points eight to a register or one at
/// a time. Invented posteriors of the size the nitrogen-rates example reaches after its first round.
/// </summary>
public class CorrelatedBestArmBenchmarks
{
    private static readonly double[] Location = [5.9, 7.0, 7.8, 8.2, 8.3];

    private SeparatedProblem[] _problems = [];
    private ChiScale? _chi;

    [Params(double.PositiveInfinity, 12.0)]
    public double DegreesOfFreedom { get; set; }

    [Params(true, false)]
    public bool InLanes { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        // A shared season effect (0.25), a farm effect on alternate arms (0.1) and each arm's own 0.15.
        var scale = new double[5, 5];
        for (int i = 0; i < 5; i++)
            for (int j = 0; j < 5; j++)
                scale[i, j] = 0.25 + (i % 2 == j % 2 ? 0.1 : 0.0) + (i == j ? 0.15 : 0.0);
        _problems = Enumerable.Range(0, 5)
            .Select(arm => BestArmOrthant.Build(Location, scale, arm, Enumerable.Range(0, 5).Where(j => j != arm).ToList(), withMoment: true))
            .ToArray();
        _chi = double.IsPositiveInfinity(DegreesOfFreedom) ? null : new ChiScale(DegreesOfFreedom);
    }

    /// <summary>Every arm's probability to 1,024 points per shift, as a close race needs.</summary>
    [Benchmark]
    public double Lattice()
    {
        double total = 0;
        foreach (var problem in _problems)
        {
            var run = new LatticeRun(problem, DegreesOfFreedom, LatticeRun.NeedsChi(problem, DegreesOfFreedom) ? _chi : null, LatticeSettings.Default);
            run.ExtendTo(1024, InLanes);
            total += run.Probability;
        }
        return total;
    }
}
