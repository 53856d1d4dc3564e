using System.Collections;
using DesignCompiler.Numerics;

namespace DesignCompiler.Planning;

/// <summary>
/// Some arms' marginals as a list, refilled in place: the P(best) computation takes a list, and building a
/// new one for every round would be the planner's only reason to allocate there.
/// </summary>
internal sealed class MarginalSubset(int capacity) : IReadOnlyList<IMarginal>
{
    private readonly IMarginal[] _items = new IMarginal[capacity];

    public int Count { get; private set; }

    public IMarginal this[int index] => index < Count ? _items[index] : throw new ArgumentOutOfRangeException(nameof(index));

    public void Fill(IReadOnlyList<IMarginal> values, ReadOnlySpan<int> subset)
    {
        for (var k = 0; k < subset.Length; k++) _items[k] = values[subset[k]];
        Count = subset.Length;
    }

    public IEnumerator<IMarginal> GetEnumerator()
    {
        for (var k = 0; k < Count; k++) yield return _items[k];
    }

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
}
