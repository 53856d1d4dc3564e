namespace DesignCompiler.Planning.Policies;

/// <summary>Small pieces several policies share.</summary>
internal static class PolicyMath
{
    public static int CountAvailable(PolicyContext context)
    {
        var count = 0;
        for (var i = 0; i < context.Available.Count; i++) if (context.Available[i]) count++;
        return count;
    }

    /// <summary>The available arms whose posterior mean value is highest (all of them on an exact tie).</summary>
    public static List<int> HighestMeanValue(PolicyContext context)
    {
        var best = double.NegativeInfinity;
        var leaders = new List<int>();
        for (var i = 0; i < context.Available.Count; i++)
        {
            if (!context.Available[i]) continue;
            var mean = context.Values[i].Mean;
            if (mean > best) { best = mean; leaders.Clear(); leaders.Add(i); }
            else if (mean == best) leaders.Add(i);
        }
        return leaders;
    }
}
