namespace PadPlan.Rules.Checks;

/// <summary>Disjoint sets over 0..n-1 with path halving and union by size: which pieces of copper are joined.</summary>
internal sealed class UnionFind
{
    private readonly int[] _parent;
    private readonly int[] _size;

    public UnionFind(int count)
    {
        _parent = new int[count];
        _size = new int[count];
        for (var i = 0; i < count; i++)
        {
            _parent[i] = i;
            _size[i] = 1;
        }
    }

    public int Find(int x)
    {
        while (_parent[x] != x)
        {
            _parent[x] = _parent[_parent[x]];
            x = _parent[x];
        }
        return x;
    }

    public void Union(int a, int b)
    {
        var ra = Find(a);
        var rb = Find(b);
        if (ra == rb) return;
        if (_size[ra] < _size[rb]) (ra, rb) = (rb, ra);
        _parent[rb] = ra;
        _size[ra] += _size[rb];
    }
}
