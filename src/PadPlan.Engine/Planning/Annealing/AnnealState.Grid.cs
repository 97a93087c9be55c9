namespace PadPlan.Planning;

internal sealed partial class AnnealState
{
    /// <summary>Cell size of the bucket grid that finds an item's neighbours (mm): about one small part with its pads.</summary>
    private const double CellSize = 8.0;
    /// <summary>Room around the region that the grid still covers; items beyond it share the edge cells.</summary>
    private const double GridApron = 20.0;
    /// <summary>Items a cell has room for before its list must grow.</summary>
    private const int CellRoom = 64;

    private double _gridX0, _gridY0;
    private int _cols, _rows;
    private List<int>[] _cells = [];
    private int[] _cellBox = [];
    private int[] _seen = [];
    private int _seenStamp;

    private void BuildGrid()
    {
        var r = _p.Region;
        _gridX0 = r.MinX - GridApron;
        _gridY0 = r.MinY - GridApron;
        _cols = Math.Max(1, (int)Math.Ceiling((r.Width + 2 * GridApron) / CellSize));
        _rows = Math.Max(1, (int)Math.Ceiling((r.Height + 2 * GridApron) / CellSize));
        _cells = new List<int>[_cols * _rows];
        // Room for a crowded cell from the start, so the move loop does not grow lists (it must not allocate).
        for (var k = 0; k < _cells.Length; k++) _cells[k] = new List<int>(CellRoom);
        _cellBox = new int[4 * _items.Length];
        Array.Fill(_cellBox, -1);
        _seen = new int[_items.Length];
    }

    private int Col(double x) => Math.Clamp((int)Math.Floor((x - _gridX0) / CellSize), 0, _cols - 1);
    private int Row(double y) => Math.Clamp((int)Math.Floor((y - _gridY0) / CellSize), 0, _rows - 1);

    /// <summary>Files an item under every cell its extent, widened by the largest gap, touches; a neighbour search then only needs the item's own cells.</summary>
    private void Register(int i)
    {
        var c0 = Col(_eMinX[i] - _cull);
        var c1 = Col(_eMaxX[i] + _cull);
        var r0 = Row(_eMinY[i] - _cull);
        var r1 = Row(_eMaxY[i] + _cull);
        var b = 4 * i;
        if (_cellBox[b] == c0 && _cellBox[b + 1] == r0 && _cellBox[b + 2] == c1 && _cellBox[b + 3] == r1) return;
        if (_cellBox[b] >= 0)
            for (var c = _cellBox[b]; c <= _cellBox[b + 2]; c++)
                for (var r = _cellBox[b + 1]; r <= _cellBox[b + 3]; r++)
                    _cells[r * _cols + c].Remove(i);
        for (var c = c0; c <= c1; c++)
            for (var r = r0; r <= r1; r++)
                _cells[r * _cols + c].Add(i);
        (_cellBox[b], _cellBox[b + 1], _cellBox[b + 2], _cellBox[b + 3]) = (c0, r0, c1, r1);
    }

    /// <summary>Pair violations of item a with every other item except b, found through the grid.</summary>
    private double PairsNear(int a, int b)
    {
        var v = 0.0;
        _seenStamp++;
        _seen[a] = _seenStamp;
        if (b >= 0) _seen[b] = _seenStamp;
        var c0 = Col(_eMinX[a]);
        var c1 = Col(_eMaxX[a]);
        var r0 = Row(_eMinY[a]);
        var r1 = Row(_eMaxY[a]);
        for (var c = c0; c <= c1; c++)
            for (var r = r0; r <= r1; r++)
            {
                var cell = _cells[r * _cols + c];
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
