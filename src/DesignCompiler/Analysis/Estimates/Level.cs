namespace DesignCompiler.Analysis.Estimates;

/// <summary>The interval level every estimator takes, checked in one place.</summary>
internal static class Level
{
    public static void Check(double level)
    {
        if (!(level > 0 && level < 1)) throw new ArgumentOutOfRangeException(nameof(level), "The level must lie strictly between 0 and 1.");
    }

    // ½ + level/2, the same upper tail CredibleInterval uses, so all three intervals are cut at the same probability.
    public static double UpperProbability(double level) => 0.5 + 0.5 * level;
}
