namespace DesignCompiler.Text;

/// <summary>"Did you mean …?" hints from a small edit distance.</summary>
public static class Suggestions
{
    /// <summary>The closest candidate within a distance that suits the word's length, as a hint; null when none is close.</summary>
    public static string? DidYouMean(string word, IEnumerable<string> candidates)
    {
        var best = Closest(word, candidates);
        return best is null ? null : $"did you mean '{best}'?";
    }

    public static string? Closest(string word, IEnumerable<string> candidates)
    {
        string? best = null;
        var bestDistance = int.MaxValue;
        // One edit turns any one- or two-letter code into any other, so short words get a hint only for case.
        var allowed = word.Length <= 2 ? 0 : word.Length <= 4 ? 1 : word.Length <= 7 ? 2 : 3;
        foreach (var candidate in candidates)
        {
            // A difference in letter case alone is always worth pointing out.
            var distance = string.Equals(candidate, word, StringComparison.OrdinalIgnoreCase) ? 0 : Distance(word, candidate);
            if (distance <= allowed && distance < bestDistance)
            {
                best = candidate;
                bestDistance = distance;
            }
        }
        return best;
    }

    /// <summary>Optimal string alignment distance (Levenshtein with adjacent transpositions).</summary>
    public static int Distance(string a, string b)
    {
        var d = new int[a.Length + 1, b.Length + 1];
        for (var i = 0; i <= a.Length; i++) d[i, 0] = i;
        for (var j = 0; j <= b.Length; j++) d[0, j] = j;
        for (var i = 1; i <= a.Length; i++)
        for (var j = 1; j <= b.Length; j++)
        {
            var cost = a[i - 1] == b[j - 1] ? 0 : 1;
            d[i, j] = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
            if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1])
                d[i, j] = Math.Min(d[i, j], d[i - 2, j - 2] + 1);
        }
        return d[a.Length, b.Length];
    }
}
