namespace Electrostat.Meshing.Core;

/// <summary>
/// Bucketed priority queue of (triangle, stamp) pairs: bucket 0 is served first; within a bucket the last pushed
/// is served first, which keeps consecutive work close together in memory. Push and pop are O(1) amortised.
/// </summary>
internal sealed class TriangleQueue
{
    private readonly int[][] _items;
    private readonly int[] _count;
    private int _min;

    internal TriangleQueue(int buckets)
    {
        _items = new int[buckets][];
        _count = new int[buckets];
        for (int i = 0; i < buckets; i++) _items[i] = new int[32];
        _min = buckets;
    }

    internal int BucketCount => _count.Length;

    internal void Push(int t, int stamp, int bucket)
    {
        int c = _count[bucket];
        int[] arr = _items[bucket];
        if (c + 2 > arr.Length)
        {
            Array.Resize(ref arr, arr.Length * 2);
            _items[bucket] = arr;
        }
        arr[c] = t;
        arr[c + 1] = stamp;
        _count[bucket] = c + 2;
        if (bucket < _min) _min = bucket;
    }

    internal bool TryPop(out int t, out int stamp)
    {
        while (_min < _count.Length && _count[_min] == 0) _min++;
        if (_min == _count.Length) { t = stamp = -1; return false; }
        int c = _count[_min] - 2;
        t = _items[_min][c];
        stamp = _items[_min][c + 1];
        _count[_min] = c;
        return true;
    }

    internal void Clear()
    {
        Array.Clear(_count);
        _min = _count.Length;
    }
}
