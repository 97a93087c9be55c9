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
        var wide = grid.Wide;
        for (var k = 0; k < wide.Count; k++)
        {
            var j = wide[k];
            if (_seen[j] == _seenStamp) continue;
            _seen[j] = _seenStamp;
            v += Pair(a, j);
        }
        // a narrow item's extent spans no more cells than it is filed under
        grid.Span(_eMinX[a], _eMinY[a], _eMaxX[a], _eMaxY[a], out var c0, out var r0, out var c1, out var r1);
        for (var c = c0; c <= c1; c++)
            for (var r = r0; r <= r1; r++)
            {
                var cell = grid.Cell(c, r);
                for (var k = 0; k < cell.Count; k++)
                {
                    var j = cell[k];
                    if (_seen[j] == _seenStamp) continue;
                    _seen[j] = _seenStamp;
                    v += Pair(a, j);
                }
            }
        return v;
    }
}
