namespace PadPlan.Planning;

internal sealed partial class AnnealState
{
    /// <summary>Smallest cell of the bucket grid that finds an item's neighbours (mm): about one small part with its pads.</summary>
    private const double MinCellSize = 8.0;
    /// <summary>Most cells along either side of the grid: a region sized by large numbers in the file gets larger cells, not more of them.</summary>
    private const int MaxCellsPerSide = 128;
    /// <summary>Most cells an item is filed under; an item wider than that (a huge body) goes on the wide list that every search also reads.</summary>
    private const int MaxCellsPerItem = 64;
    /// <summary>Room around the region that the grid still covers; items beyond it share the edge cells.</summary>
    private const double GridApron = 20.0;
    /// <summary>Items a cell has room for before its list must grow.</summary>
    private const int CellRoom = 64;

    private double _gridX0, _gridY0, _cellSize;
    private int _cols, _rows;
    private List<int>[] _cells = [];
    private int[] _cellBox = [];
    private readonly List<int> _wide = [];
    private int[] _seen = [];
    private int _seenStamp;

    private void BuildGrid()
    {
        var r = _p.Region;
        _gridX0 = r.MinX - GridApron;
        _gridY0 = r.MinY - GridApron;
        var (width, height) = (r.Width + 2 * GridApron, r.Height + 2 * GridApron);
        _cellSize = Math.Max(MinCellSize, Math.Max(width, height) / MaxCellsPerSide);
        _cols = Math.Clamp((int)Math.Ceiling(width / _cellSize), 1, MaxCellsPerSide);
        _rows = Math.Clamp((int)Math.Ceiling(height / _cellSize), 1, MaxCellsPerSide);
        _cells = new List<int>[_cols * _rows];
        // Room for a crowded cell from the start, so the move loop does not grow lists (it must not allocate).
        for (var k = 0; k < _cells.Length; k++) _cells[k] = new List<int>(CellRoom);
        _cellBox = new int[4 * _items.Length];
        Array.Fill(_cellBox, -1);
        _wide.Capacity = _items.Length;
        _seen = new int[_items.Length];
    }

    private int Col(double x) => Math.Clamp((int)Math.Floor((x - _gridX0) / _cellSize), 0, _cols - 1);
    private int Row(double y) => Math.Clamp((int)Math.Floor((y - _gridY0) / _cellSize), 0, _rows - 1);

    private bool IsWide(int i) => _cellBox[4 * i] == WideMark;

    /// <summary>Marks an item filed on the wide list rather than under cells.</summary>
    private const int WideMark = -2;

    /// <summary>
    /// Files an item under every cell its extent, widened by the largest gap, touches; a neighbour search then only needs
    /// the item's own cells. An item that would cover more than <see cref="MaxCellsPerItem"/> cells goes on the wide list
    /// instead, so one move never walks thousands of cells.
    /// </summary>
    private void Register(int i)
    {
        var c0 = Col(_eMinX[i] - _cull);
        var c1 = Col(_eMaxX[i] + _cull);
        var r0 = Row(_eMinY[i] - _cull);
        var r1 = Row(_eMaxY[i] + _cull);
        var wide = (c1 - c0 + 1) * (r1 - r0 + 1) > MaxCellsPerItem;
        var b = 4 * i;
        if (wide && IsWide(i)) return;
        if (!wide && _cellBox[b] == c0 && _cellBox[b + 1] == r0 && _cellBox[b + 2] == c1 && _cellBox[b + 3] == r1) return;
        if (IsWide(i)) _wide.Remove(i);
        else if (_cellBox[b] >= 0)
            for (var c = _cellBox[b]; c <= _cellBox[b + 2]; c++)
                for (var r = _cellBox[b + 1]; r <= _cellBox[b + 3]; r++)
                    _cells[r * _cols + c].Remove(i);
        if (wide)
        {
            _wide.Add(i);
            (_cellBox[b], _cellBox[b + 1], _cellBox[b + 2], _cellBox[b + 3]) = (WideMark, WideMark, WideMark, WideMark);
            return;
        }
        for (var c = c0; c <= c1; c++)
            for (var r = r0; r <= r1; r++)
                _cells[r * _cols + c].Add(i);
        (_cellBox[b], _cellBox[b + 1], _cellBox[b + 2], _cellBox[b + 3]) = (c0, r0, c1, r1);
    }

    /// <summary>Pair violations of item a with every other item except b, found through the grid (a wide item is paired with every item).</summary>
    private double PairsNear(int a, int b)
    {
        var v = 0.0;
        _seenStamp++;
        _seen[a] = _seenStamp;
        if (b >= 0) _seen[b] = _seenStamp;
        if (IsWide(a))
        {
            for (var j = 0; j < _items.Length; j++)
                if (_seen[j] != _seenStamp) v += Pair(a, j);
            return v;
        }
        for (var k = 0; k < _wide.Count; k++)
        {
            var j = _wide[k];
            if (_seen[j] == _seenStamp) continue;
            _seen[j] = _seenStamp;
            v += Pair(a, j);
        }
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
