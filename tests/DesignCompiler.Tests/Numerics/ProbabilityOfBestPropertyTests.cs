using DesignCompiler.Numerics;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DesignCompiler.Tests.Numerics;

public class ProbabilityOfBestPropertyTests
{
    // Posteriors a trial can produce: rates after up to 5000 plots, normal means, Poisson rates.
    private static Gen<IMarginal> Arm =>
        Gen.OneOf(
            from n in Gen.Choose(0, 5000)
            from percent in Gen.Choose(0, 100)
            select (IMarginal)new BetaMarginal(1 + n * percent / 100, 1 + n - n * percent / 100),
            from mean in Gen.Choose(-1000, 1000)
            from sd in Gen.Choose(1, 1000)
            select (IMarginal)new NormalMarginal(mean / 1000.0, Math.Pow(10, -sd / 300.0)),
            from shape in Gen.Choose(1, 4000)
            from rate in Gen.Choose(1, 1000)
            select (IMarginal)new GammaMarginal(Math.Pow(10, shape / 1000.0 - 0.5), Math.Pow(10, rate / 500.0 - 1)));

    // Mostly one family per call, as in a real design, sometimes mixed.
    private static Gen<IMarginal[]> Arms =>
        from k in Gen.Choose(2, 12)
        from family in Gen.Choose(0, 3)
        from arms in family == 3 ? Gen.ArrayOf(Arm, k) : Gen.ArrayOf(Arm, k).Select(a => Family(a, family))
        select arms;

    [Property(MaxTest = 80)]
    public Property ProbabilitiesFormADistribution() => Prop.ForAll(Arms.ToArbitrary(), arms =>
    {
        var result = ProbabilityOfBest.Compute(arms);
        bool inRange = result.Probabilities.All(p => p >= 0 && p <= 1);
        bool sums = Math.Abs(result.Probabilities.Sum() - 1) <= 1e-9;
        bool finite = double.IsFinite(result.ExpectedMaximum) && result.ExpectedLoss.All(l => l >= 0 && double.IsFinite(l));
        return inRange && sums && finite && result.ErrorBound < 1e-9;
    });

    [Property(MaxTest = 60)]
    public Property InvariantToTheOrderOfTheArms() => Prop.ForAll(
        (from arms in Arms
         from order in Gen.Shuffle(Enumerable.Range(0, arms.Length).ToArray())
         select (arms, order)).ToArbitrary(),
        c =>
        {
            var direct = ProbabilityOfBest.Compute(c.arms);
            var permuted = ProbabilityOfBest.Compute(c.order.Select(i => c.arms[i]).ToArray());
            return c.order.Select((armIndex, position) =>
                Math.Abs(permuted.Probabilities[position] - direct.Probabilities[armIndex]) <= 1e-12).All(ok => ok);
        });

    [Property(MaxTest = 60)]
    public Property IdenticalArmsGetEqualProbabilities() => Prop.ForAll(
        (from arms in Arms
         from copies in Gen.Choose(2, 4)
         select (arms, copies)).ToArbitrary(),
        c =>
        {
            // The first arm appears `copies` times, the copies being new but equal objects.
            var withCopies = c.arms.Concat(Enumerable.Range(0, c.copies - 1).Select(_ => Copy(c.arms[0]))).ToArray();
            var result = ProbabilityOfBest.Compute(withCopies);
            return Enumerable.Range(c.arms.Length, c.copies - 1).All(i => result.Probabilities[i] == result.Probabilities[0]);
        });

    [Fact]
    public void HundredMixedArms()
    {
        var rng = new Random(3);
        var arms = new IMarginal[100];
        for (int i = 0; i < arms.Length; i++)
        {
            arms[i] = (i % 3) switch
            {
                0 => new BetaMarginal(1 + rng.Next(300, 400), 1 + rng.Next(600, 700)),
                1 => new NormalMarginal(0.35 + 0.01 * rng.NextDouble(), 0.005 + 0.02 * rng.NextDouble()),
                _ => new GammaMarginal(300 + rng.Next(0, 200), 1000),
            };
        }
        var result = ProbabilityOfBest.Compute(arms);
        Assert.All(result.Probabilities, p => Assert.InRange(p, 0.0, 1.0));
        NumericAssert.Absolute(1.0, result.Probabilities.Sum(), 1e-9, "sum");
    }

    [Fact]
    public void MoreArmsThanTheStackHolds()
    {
        // Beyond 128 arms the working memory comes from the shared array pool instead of the stack.
        var arms = Enumerable.Range(0, 150).Select(i => (IMarginal)new BetaMarginal(20 + i % 17, 60 - i % 13)).ToArray();
        var result = ProbabilityOfBest.Compute(arms);
        NumericAssert.Absolute(1.0, result.Probabilities.Sum(), 1e-12, "sum");
        Assert.True(result.ErrorBound < 1e-9, $"error bound {result.ErrorBound}");
        var again = ProbabilityOfBest.Compute(arms);
        for (int i = 0; i < arms.Length; i++) Assert.True(result.Probabilities[i] == again.Probabilities[i], $"{i}: {result.Probabilities[i]:R} {again.Probabilities[i]:R} {result.ErrorBound} {again.ErrorBound}");
    }

    [Fact]
    public void SpanOverloadAgreesAndDoesNotAllocate()
    {
        var arms = new IMarginal[] { new BetaMarginal(30, 70), new BetaMarginal(35, 65), new BetaMarginal(33, 67), new BetaMarginal(12, 20) };
        var reference = ProbabilityOfBest.Compute(arms);
        Span<double> probabilities = stackalloc double[arms.Length];
        Span<double> loss = stackalloc double[arms.Length];
        double error = 0;
        long fewest = long.MaxValue;
        // The runtime itself may allocate while it compiles or re-tiers a method during one of the calls,
        // so the fewest bytes over several calls is what the call itself costs.
        for (int call = 0; call < 8; call++)
        {
            long before = GC.GetAllocatedBytesForCurrentThread();
            error = ProbabilityOfBest.Compute(arms, probabilities, loss);
            fewest = Math.Min(fewest, GC.GetAllocatedBytesForCurrentThread() - before);
        }
        Assert.Equal(0, fewest);
        Assert.Equal(reference.ErrorBound, error);
        for (int i = 0; i < arms.Length; i++)
        {
            Assert.Equal(reference.Probabilities[i], probabilities[i]);
            Assert.Equal(reference.ExpectedLoss[i], loss[i]);
        }
    }

    private static IMarginal[] Family(IMarginal[] arms, int family) =>
        arms.Select(a => a switch
        {
            BetaMarginal or NormalMarginal or GammaMarginal when FamilyOf(a) == family => a,
            _ => Convert(a, family),
        }).ToArray();

    private static int FamilyOf(IMarginal a) => a switch { BetaMarginal => 0, NormalMarginal => 1, _ => 2 };

    // Keeps the location and spread of an arm while moving it into the requested family.
    private static IMarginal Convert(IMarginal a, int family)
    {
        double mean = Math.Clamp(Math.Abs(a.Mean), 0.01, 0.99), sd = Math.Min(a.StdDev, 0.2);
        return family switch
        {
            0 => new BetaMarginal(1 + Math.Round(mean * (1 / (sd * sd))), 1 + Math.Round((1 - mean) * (1 / (sd * sd)))),
            1 => new NormalMarginal(a.Mean, Math.Max(a.StdDev, 1e-4)),
            _ => new GammaMarginal(mean * mean / (sd * sd) + 0.5, mean / (sd * sd)),
        };
    }

    private static IMarginal Copy(IMarginal a) => a switch
    {
        BetaMarginal b => new BetaMarginal(b.A, b.B),
        NormalMarginal n => new NormalMarginal(n.Mean, n.StdDev),
        GammaMarginal g => new GammaMarginal(g.Shape, g.Rate),
        _ => a,
    };
}
