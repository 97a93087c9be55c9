namespace PadPlan.Planning;

internal sealed partial class AnnealState
{
    /// <summary>Smallest cell of the grid that finds an item's neighbours (mm): about one small part with its pads.</summary>
    private const double ItemCellSize = 8.0;

    /// <summary>Items filed by their extent widened by the largest gap (<see cref="_cull"/>): a neighbour search then only needs the item's own cells.</summary>
    private BucketGrid _itemGrid = null!;
    private int[] _seen = [];
    private int _seenStamp;

    private void BuildGrid()
    {
        _itemGrid = new BucketGrid(_p.Region, ItemCellSize, _items.Length);
        _seen = new int[_items.Length];
    }

    /// <summary>Files an item under every cell its extent, widened by the largest gap, touches (see <see cref="BucketGrid"/>).</summary>
    private void Register(int i) => _itemGrid.File(i, _eMinX[i] - _cull, _eMinY[i] - _cull, _eMaxX[i] + _cull, _eMaxY[i] + _cull);

    /// <summary>Pair violations of item a with every other item except b, found through the grid (a wide item is paired with every item).</summary>
    private double PairsNear(int a, int b)
    {
        var v = 0.0;
        _seenStamp++;
        _seen[a] = _seenStamp;
        if (b >= 0) _seen[b] = _seenStamp;
        var grid = _itemGrid;
        if (grid.IsWide(a))
        {
            for (var j = 0; j < _items.Length; j++)
                if (_seen[j] != _seenStamp) v += Pair(a, j);
            return v;
        }
        // a narrow item's extent spans no more cells than it is filed under, so this walks the wide list and the cells
        foreach (var j in grid.Around(_eMinX[a], _eMinY[a], _eMaxX[a], _eMaxY[a], _items.Length))
        {
            if (_seen[j] == _seenStamp) continue;
            _seen[j] = _seenStamp;
            v += Pair(a, j);
        }
        return v;
    }
}
