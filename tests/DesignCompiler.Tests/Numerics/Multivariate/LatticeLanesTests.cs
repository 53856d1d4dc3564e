using DesignCompiler.Numerics.Multivariate;

namespace DesignCompiler.Tests.Numerics.Multivariate;

/// <summary>
/// Eight lattice points in one register give the scalar loop's sums bit for bit: every shift's probability and
/// moment, for normal and t posteriors, with and without shared effects, arms close together and far apart,
/// and point counts that leave a remainder for the scalar loop. The values themselves are checked against
/// independent references in <see cref="CorrelatedBestArmTests"/>; this checks that the fast path changes nothing.
/// </summary>
public sealed class LatticeLanesTests
{
    public static TheoryData<int, double, int> Cases() => new()
    {
        // arms, degrees of freedom (∞: normal), seed of the invented posterior
        { 3, double.PositiveInfinity, 1 },
        { 5, double.PositiveInfinity, 2 },
        { 8, double.PositiveInfinity, 3 },
        { 3, 4.5, 4 },
        { 5, 11.0, 5 },
        { 6, 2.5, 6 },
        { 8, 30.0, 7 },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void EightAtATimeIsTheScalarLoopBitForBit(int k, double degreesOfFreedom, int seed)
    {
        // The lanes need AVX-512; without it the planner never takes them, and there is nothing to compare.
        if (!System.Runtime.Intrinsics.X86.Avx512F.IsSupported) return;
        var random = new Random(seed);
        foreach (var spread in new[] { 0.05, 0.5, 3.0 })
        {
            // Invented posteriors: means spread out by 'spread' sds, a shared round effect and a block effect on half the arms.
            var location = new double[k];
            var scale = new double[k, k];
            double shared = 0.3 * random.NextDouble(), block = 0.2 * random.NextDouble();
            for (int i = 0; i < k; i++)
            {
                location[i] = 5.0 + spread * random.NextDouble();
                for (int j = 0; j < k; j++)
                {
                    scale[i, j] = shared + (i % 2 == j % 2 ? block : 0.0);
                    if (i == j) scale[i, j] += 0.2 + random.NextDouble();
                }
            }
            var chi = double.IsPositiveInfinity(degreesOfFreedom) ? null : new ChiScale(degreesOfFreedom);
            for (int arm = 0; arm < k; arm++)
            {
                var rivals = Enumerable.Range(0, k).Where(j => j != arm).ToList();
                var problem = BestArmOrthant.Build(location, scale, arm, rivals, withMoment: true);
                var settings = LatticeSettings.Default;
                var scalar = new LatticeRun(problem, degreesOfFreedom, LatticeRun.NeedsChi(problem, degreesOfFreedom) ? chi : null, settings);
                var lanes = new LatticeRun(problem, degreesOfFreedom, LatticeRun.NeedsChi(problem, degreesOfFreedom) ? chi : null, settings);
                foreach (var target in new long[] { 5, 133, 1000 })
                {
                    scalar.ExtendTo(target, inLanes: false);
                    lanes.ExtendTo(target, inLanes: true);
                    for (int q = 0; q < settings.Shifts; q++)
                    {
                        Assert.Equal(BitConverter.DoubleToInt64Bits(scalar.ShiftProbability(q)), BitConverter.DoubleToInt64Bits(lanes.ShiftProbability(q)));
                        Assert.Equal(BitConverter.DoubleToInt64Bits(scalar.ShiftMoment(q)), BitConverter.DoubleToInt64Bits(lanes.ShiftMoment(q)));
                    }
                }
                Assert.True(scalar.IsExact || scalar.Probability > 0 || spread > 1, "an invented case should integrate something");
            }
        }
    }
}
