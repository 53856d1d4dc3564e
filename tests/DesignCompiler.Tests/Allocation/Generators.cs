using FsCheck;
using FsCheck.Fluent;

namespace DesignCompiler.Tests.Allocation;

/// <summary>Random apportionment inputs for the property tests.</summary>
internal static class Generators
{
    /// <summary>A share: sometimes zero, sometimes a round value that invites ties, usually random.</summary>
    public static Gen<double> Share =>
        Gen.Frequency(
            (1, Gen.Constant(0.0)),
            (2, Gen.Elements(0.1, 0.25, 1.0 / 3, 0.5, 1.0)),
            (5, Gen.Choose(1, 1_000_000).Select(k => k / 1_000_000.0)));

    /// <summary>A random share with no round values, for properties that must avoid ties.</summary>
    public static Gen<double> ContinuousShare => Gen.Choose(1, 1_000_000_000).Select(k => k / 1e9);

    /// <summary>1 to 12 populations, at least one positive.</summary>
    public static Gen<double[]> Populations =>
        Gen.Choose(1, 12)
            .SelectMany(n => Gen.ArrayOf(Share, n))
            .Where(shares => shares.Any(s => s > 0));

    public static Gen<BoundedInstance> FeasibleBounded =>
        from n in Gen.Choose(1, 8)
        from shares in Gen.ArrayOf(Share, n)
        from minimum in Gen.ArrayOf(Gen.Frequency((2, Gen.Constant(0)), (1, Gen.Choose(0, 6))), n)
        from room in Gen.ArrayOf(Gen.Frequency((1, Gen.Choose(0, 3)), (3, Gen.Choose(0, 60))), n)
        let maximum = minimum.Zip(room, (low, extra) => low + extra).ToArray()
        from total in Gen.Choose(minimum.Sum(), maximum.Sum())
        select new BoundedInstance(shares, total, minimum, maximum);

    /// <summary>Anything, feasible or not: negative numbers, crossed bounds, NaN shares.</summary>
    public static Gen<BoundedInstance> AnyBounded =>
        from n in Gen.Choose(1, 6)
        from shares in Gen.ArrayOf(Gen.Frequency((8, Share), (1, Gen.Elements(-0.5, double.NaN, double.PositiveInfinity))), n)
        from minimum in Gen.ArrayOf(Gen.Choose(-2, 10), n)
        from maximum in Gen.ArrayOf(Gen.Choose(-1, 30), n)
        from total in Gen.Choose(-3, 100)
        select new BoundedInstance(shares, total, minimum, maximum);
}

/// <summary>One bounded apportionment problem; printed in full when a property fails.</summary>
internal sealed record BoundedInstance(double[] Shares, int Total, int[] Minimum, int[] Maximum)
{
    public override string ToString() =>
        $"shares [{string.Join(", ", Shares.Select(s => s.ToString("R", System.Globalization.CultureInfo.InvariantCulture)))}], total {Total}, " +
        $"min [{string.Join(", ", Minimum)}], max [{string.Join(", ", Maximum)}]";
}
