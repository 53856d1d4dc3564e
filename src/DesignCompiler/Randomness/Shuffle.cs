namespace DesignCompiler.Randomness;

/// <summary>Uniform random permutations in place.</summary>
public static class Shuffle
{
    /// <summary>
    /// The Fisher–Yates shuffle in Durstenfeld's in-place form (Durstenfeld 1964, CACM 7(7);
    /// Knuth, TAOCP vol. 2, §3.4.2, Algorithm P): for j from n−1 down to 1, swap item j with a
    /// uniformly chosen item in [0, j]. With an unbiased <see cref="Xoshiro256StarStar.NextInt"/>
    /// every one of the n! orders is equally likely. Draws exactly n−1 bounded integers, from the
    /// top index down, so a placement can be replayed in another language.
    /// </summary>
    public static void FisherYates<T>(Span<T> items, ref Xoshiro256StarStar rng)
    {
        for (int j = items.Length - 1; j > 0; j--)
        {
            int k = rng.NextInt(j + 1);
            (items[j], items[k]) = (items[k], items[j]);
        }
    }
}
