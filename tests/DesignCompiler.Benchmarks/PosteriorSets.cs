using DesignCompiler.Numerics;

namespace DesignCompiler.Benchmarks;

/// <summary>
/// Invented posterior sets for the P(best) benchmarks. "moderate": what a few dozen plots per arm leave;
/// "peaked": thousands of plots per arm, posteriors a hundred times narrower than their spread of means.
/// </summary>
public static class PosteriorSets
{
    /// <summary>The ten beta arms of the C reference's default set (RESULTS.md, "P(best) accuracy").</summary>
    public static readonly double[,] ReferenceBeta =
    {
        { 30, 70 }, { 35, 65 }, { 33, 67 }, { 1200, 8800 }, { 3400, 6600 },
        { 3550, 6450 }, { 12, 20 }, { 2, 3 }, { 400, 700 }, { 1, 4 },
    };

    public static IMarginal[] For(string name)
    {
        if (name == "beta-10-reference")
            return Enumerable.Range(0, 10).Select(i => (IMarginal)new BetaMarginal(ReferenceBeta[i, 0], ReferenceBeta[i, 1])).ToArray();
        var parts = name.Split('-');
        var family = parts.Length == 4 ? "student-t" : parts[0];
        var arms = int.Parse(parts[^2], System.Globalization.CultureInfo.InvariantCulture);
        var peaked = parts[^1] == "peaked";
        return Enumerable.Range(0, arms).Select(i => Arm(family, i, arms, peaked)).ToArray();
    }

    // Arm i of n: means spread evenly over a tenth of the scale, so every arm has some chance of being best.
    private static IMarginal Arm(string family, int i, int n, bool peaked)
    {
        double spread = n == 1 ? 0 : (double)i / (n - 1);
        double plots = peaked ? 5000 : 40;
        switch (family)
        {
            case "beta":
                double p = 0.40 + 0.05 * spread;
                return new BetaMarginal(1 + Math.Round(p * plots), 1 + Math.Round((1 - p) * plots));
            case "normal":
                return new NormalMarginal(5.0 + 0.5 * spread, 1.5 / Math.Sqrt(plots));
            case "student-t":
                return new StudentTMarginal(plots - 1, 5.0 + 0.5 * spread, 1.5 / Math.Sqrt(plots));
            default:
                double rate = plots, mean = 3.0 + 0.3 * spread;
                return new GammaMarginal(1 + Math.Round(mean * rate), rate + 0.5);
        }
    }
}
