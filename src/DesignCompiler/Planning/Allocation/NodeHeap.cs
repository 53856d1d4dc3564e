namespace DesignCompiler.Planning.Allocation;

/// <summary>
/// A binary min-heap of (distance, node) over caller-owned arrays, ordered by distance and then
/// by node number so that equal distances always come out in the same order.
/// </summary>
internal struct NodeHeap
{
    private readonly long[] _keys;
    private readonly int[] _nodes;
    private int _count;

    public NodeHeap(long[] keys, int[] nodes)
    {
        _keys = keys;
        _nodes = nodes;
        _count = 0;
    }

    public void Push(long key, int node)
    {
        int child = _count++;
        while (child > 0)
        {
            int parent = (child - 1) >> 1;
            if (!Less(key, node, _keys[parent], _nodes[parent]))
            {
                break;
            }

            _keys[child] = _keys[parent];
            _nodes[child] = _nodes[parent];
            child = parent;
        }

        _keys[child] = key;
        _nodes[child] = node;
    }

    public bool TryPop(out long key, out int node)
    {
        if (_count == 0)
        {
            key = 0;
            node = -1;
            return false;
        }

        key = _keys[0];
        node = _nodes[0];
        _count--;
        if (_count > 0)
        {
            long lastKey = _keys[_count];
            int lastNode = _nodes[_count];
            int parent = 0;
            while (true)
            {
                int child = 2 * parent + 1;
                if (child >= _count)
                {
                    break;
                }

                if (child + 1 < _count && Less(_keys[child + 1], _nodes[child + 1], _keys[child], _nodes[child]))
                {
                    child++;
                }

                if (!Less(_keys[child], _nodes[child], lastKey, lastNode))
                {
                    break;
                }

                _keys[parent] = _keys[child];
                _nodes[parent] = _nodes[child];
                parent = child;
            }

            _keys[parent] = lastKey;
            _nodes[parent] = lastNode;
        }

        return true;
    }

    private static bool Less(long keyA, int nodeA, long keyB, int nodeB) =>
        keyA < keyB || (keyA == keyB && nodeA < nodeB);
}
