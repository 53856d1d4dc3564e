using DesignCompiler.Planning.Allocation;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DesignCompiler.Tests.Allocation;

/// <summary>The properties promised in BoundedApportionment's documentation, for random inputs.</summary>
public class BoundedApportionmentPropertyTests
{
    [Property(MaxTest = 1000)]
    public Property CountsSumToTheTotalWithinTheBounds() =>
        Prop.ForAll(Arb.From(Generators.FeasibleBounded), instance =>
        {
            var result = Apportion(instance);
            return result.IsFeasible
                && result.Counts.Sum() == instance.Total
                && result.Counts.Select((c, i) => c >= instance.Minimum[i] && c <= instance.Maximum[i]).All(ok => ok);
        });

    [Property(MaxTest = 1000)]
    public Property EachCountIsWithinOneOfItsClippedQuota() =>
        Prop.ForAll(Arb.From(Generators.FeasibleBounded), instance =>
        {
            // Quotas from an independent bisection (ReferenceApportionment), not the library's walk.
            double[] quotas = ReferenceApportionment.BoundedQuotas(instance);
            int[] counts = Apportion(instance).Counts;
            return counts.Select((c, i) => Math.Abs(c - quotas[i]) < 1 + 1e-6).All(ok => ok);
        });

    [Property(MaxTest = 1000)]
    public Property WithoutBindingBoundsItEqualsHamilton() =>
        Prop.ForAll(Arb.From(Generators.Populations), Arb.From(Gen.Choose(0, 400)), (shares, total) =>
        {
            int[] hamilton = Hamilton.Apportion(shares, total);
            double sum = shares.Sum();

            // Minimums strictly below and maximums strictly above every quota never bind.
            var minimum = new int[shares.Length];
            var maximum = new int[shares.Length];
            for (int i = 0; i < shares.Length; i++)
            {
                double quota = total * shares[i] / sum;
                minimum[i] = Math.Max(0, (int)Math.Floor(quota) - 1);
                maximum[i] = (int)Math.Ceiling(quota) + 1;
                if (shares[i] == 0)
                {
                    minimum[i] = 0;
                }
            }

            var bounded = BoundedApportionment.Apportion(shares, total, minimum, maximum);
            var unbounded = BoundedApportionment.Apportion(shares, total, new int[shares.Length], Enumerable.Repeat(total, shares.Length).ToArray());
            return bounded.Counts.AsSpan().SequenceEqual(hamilton) && unbounded.Counts.AsSpan().SequenceEqual(hamilton);
        });

    [Property(MaxTest = 500)]
    public Property PermutingTheArmsPermutesTheResultAwayFromTies() =>
        Prop.ForAll(Arb.From(Generators.FeasibleBounded), Arb.From(Gen.Choose(0, int.MaxValue)), (instance, seed) =>
        {
            double[] quotas = ReferenceApportionment.BoundedQuotas(instance);
            if (NearATie(quotas))
            {
                return true;
            }

            int n = instance.Shares.Length;
            int[] order = Enumerable.Range(0, n).ToArray();
            var rng = new DesignCompiler.Randomness.Xoshiro256StarStar((ulong)seed);
            DesignCompiler.Randomness.Shuffle.FisherYates<int>(order, ref rng);
            var permuted = new BoundedInstance(
                order.Select(i => instance.Shares[i]).ToArray(),
                instance.Total,
                order.Select(i => instance.Minimum[i]).ToArray(),
                order.Select(i => instance.Maximum[i]).ToArray());

            int[] original = Apportion(instance).Counts;
            int[] counts = Apportion(permuted).Counts;
            return order.Select((source, position) => counts[position] == original[source]).All(ok => ok);
        });

    [Property(MaxTest = 2000)]
    public Property InfeasibleInputIsReportedNeverThrown() =>
        Prop.ForAll(Arb.From(Generators.AnyBounded), instance =>
        {
            var result = Apportion(instance);
            bool badShare = instance.Shares.Any(s => !(s >= 0) || double.IsInfinity(s));
            bool feasible = instance.Total >= 0
                && !badShare
                && instance.Minimum.All(m => m >= 0)
                && instance.Minimum.Zip(instance.Maximum).All(pair => pair.First <= pair.Second)
                && instance.Minimum.Sum() <= instance.Total
                && instance.Maximum.Sum() >= instance.Total;
            if (!feasible)
            {
                return !result.IsFeasible && result.Counts.Length == 0;
            }

            return result.IsFeasible && result.Counts.Sum() == instance.Total;
        });

    private static ApportionmentResult Apportion(BoundedInstance instance) =>
        BoundedApportionment.Apportion(instance.Shares, instance.Total, instance.Minimum, instance.Maximum);

    /// <summary>
    /// True when two fractional parts are close enough that the tie rule (lower index) rather
    /// than the values could decide which arm gets a contested plot. Exact integers (arms held
    /// at a bound) never compete, so they are left out.
    /// </summary>
    private static bool NearATie(double[] quotas)
    {
        var fractions = quotas.Select(q => q - Math.Floor(q)).Where(f => f > 1e-12 && f < 1 - 1e-12).ToArray();
        for (int i = 0; i < fractions.Length; i++)
        {
            for (int j = i + 1; j < fractions.Length; j++)
            {
                if (Math.Abs(fractions[i] - fractions[j]) < 1e-6)
                {
                    return true;
                }
            }
        }

        return false;
    }
}
