namespace DesignCompiler.Numerics;

/// <summary>
/// Collapses equal arms (by <see cref="object.Equals(object)"/>) into one group with a multiplicity, so that
/// identical arms are computed once and receive bit-identical probabilities whatever their order.
/// </summary>
internal static class ArmGroups
{
    /// <returns>the number of groups; groupOf[i] is arm i's group, representative[g] and multiplicity[g] describe group g.</returns>
    internal static int Build(
        IReadOnlyList<IMarginal> arms, Span<int> hashes, Span<int> order,
        Span<int> groupOf, Span<int> representative, Span<int> multiplicity)
    {
        int k = arms.Count;
        for (int i = 0; i < k; i++)
        {
            hashes[i] = arms[i].GetHashCode();
            order[i] = i;
        }
        // Equal arms have equal hashes, so only runs of equal hashes need pairwise comparison.
        hashes[..k].Sort(order[..k]);
        int groups = 0;
        int runStart = 0;
        for (int position = 0; position < k; position++)
        {
            if (position > 0 && hashes[position] != hashes[position - 1]) runStart = groups;
            int arm = order[position];
            int found = -1;
            for (int g = runStart; g < groups; g++)
            {
                if (arms[representative[g]].Equals(arms[arm]))
                {
                    found = g;
                    break;
                }
            }
            if (found < 0)
            {
                found = groups++;
                representative[found] = arm;
                multiplicity[found] = 0;
            }
            multiplicity[found]++;
            groupOf[arm] = found;
        }
        return groups;
    }
}
