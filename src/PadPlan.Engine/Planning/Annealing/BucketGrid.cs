namespace PadPlan.Planning;

/// <summary>
/// A uniform grid over the region and an apron around it, each cell listing the entries (items, or lead paths) whose box
/// touches it, so a search reads only the entries near its own box. A region sized by large numbers in the file gets larger
/// cells, not more of them. An entry over more than <see cref="MaxCellsPerEntry"/> cells goes on the wide list instead, and a
/// search box that large reads every entry, so one move never walks thousands of cells. Nothing is allocated after
/// construction while no cell holds more than <see cref="CellRoom"/> entries.
/// </summary>
internal sealed class BucketGrid
{
    /// <summary>Most cells along either side of the grid.</summary>
    private const int MaxCellsPerSide = 128;
    /// <summary>Most cells an entry is filed under, and a search reads, before the wide list (or every entry) takes over.</summary>
    public const int MaxCellsPerEntry = 64;
    /// <summary>Room around the region that the grid still covers (mm); entries beyond it share the edge cells.</summary>
    private const double Apron = 20.0;
    /// <summary>Entries a cell has room for before its list must grow.</summary>
    private const int CellRoom = 64;
    /// <summary>Marks an entry filed on the wide list rather than under cells.</summary>
    private const int WideMark = -2;

    private readonly double _x0, _y0, _size;
    private readonly int _cols, _rows;
    private readonly List<int>[] _cells;
    /// <summary>Per entry, the cells it is filed under (first column, first row, last column, last row); -1 when filed nowhere.</summary>
    private readonly int[] _box;

    /// <summary>Entries filed on the wide list, which every search reads.</summary>
    private readonly List<int> _wide;

    public BucketGrid(Region region, double smallestCell, int entries)
    {
        _x0 = region.MinX - Apron;
        _y0 = region.MinY - Apron;
        var (width, height) = (region.Width + 2 * Apron, region.Height + 2 * Apron);
        _size = Math.Max(smallestCell, Math.Max(width, height) / MaxCellsPerSide);
        _cols = Math.Clamp((int)Math.Ceiling(width / _size), 1, MaxCellsPerSide);
        _rows = Math.Clamp((int)Math.Ceiling(height / _size), 1, MaxCellsPerSide);
        _cells = new List<int>[_cols * _rows];
        // Room for a crowded cell from the start, so the move loop does not grow lists (it must not allocate).
        for (var k = 0; k < _cells.Length; k++) _cells[k] = new List<int>(CellRoom);
        _box = new int[4 * entries];
        Array.Fill(_box, -1);
        _wide = new List<int>(entries);
    }

    private int Col(double x) => Math.Clamp((int)Math.Floor((x - _x0) / _size), 0, _cols - 1);
    private int Row(double y) => Math.Clamp((int)Math.Floor((y - _y0) / _size), 0, _rows - 1);

    /// <summary>The entries filed under one cell.</summary>
    private List<int> Cell(int col, int row) => _cells[row * _cols + col];

    public bool IsWide(int e) => _box[4 * e] == WideMark;

    /// <summary>
    /// The cells a search box reads, first and last column and row: false when they are more than
    /// <see cref="MaxCellsPerEntry"/>, and the search must read every entry instead.
    /// </summary>
    private bool Span(double x0, double y0, double x1, double y1, out int c0, out int r0, out int c1, out int r1)
    {
        (c0, c1, r0, r1) = (Col(x0), Col(x1), Row(y0), Row(y1));
        return (c1 - c0 + 1) * (r1 - r0 + 1) <= MaxCellsPerEntry;
    }

    /// <summary>
    /// The entries a search box may meet, for a <c>foreach</c> that allocates nothing: every entry below
    /// <paramref name="count"/> when the box spans more than <see cref="MaxCellsPerEntry"/> cells, otherwise the wide list and
    /// then each spanned cell's entries, column by column. An entry filed under several cells comes once per cell: the caller
    /// marks what it has seen.
    /// </summary>
    public Walk Around(double x0, double y0, double x1, double y1, int count) => new(this, x0, y0, x1, y1, count);

    /// <summary>
    /// The entries that may come within <paramref name="reach"/> of the segment from a to b: as <see cref="Around"/> on the
    /// segment's box widened by the reach, except that a box spanning more than <see cref="MaxCellsPerEntry"/> cells reads,
    /// column by column, only the cells within reach of the segment (a long slanting segment's box is mostly far from it),
    /// unless those are still more than a quarter of <paramref name="count"/>, when it reads every entry.
    /// </summary>
    public Walk AlongSegment(double ax, double ay, double bx, double by, double reach, int count) => new(this, ax, ay, bx, by, reach, count);

    /// <summary>Widening of a segment's cover beyond its reach (mm), far above the rounding of the cover's arithmetic.</summary>
    private const double CoverTolerance = 0.01;

    /// <summary>The rows of column c within reach r of the segment from a to b (empty when first is above last). The edge columns also hold what lies beyond the grid.</summary>
    private (int First, int Last) RowsAlong(int c, double ax, double ay, double bx, double by, double r)
    {
        var cx0 = c == 0 ? double.NegativeInfinity : _x0 + c * _size;
        var cx1 = c == _cols - 1 ? double.PositiveInfinity : _x0 + (c + 1) * _size;
        var xa = Math.Max(cx0 - r, Math.Min(ax, bx));
        var xb = Math.Min(cx1 + r, Math.Max(ax, bx));
        if (xa > xb) return (0, -1);
        double ylo, yhi;
        if (bx == ax) (ylo, yhi) = (Math.Min(ay, by), Math.Max(ay, by));
        else
        {
            var slope = (by - ay) / (bx - ax);
            var (ya, yb) = (ay + (xa - ax) * slope, ay + (xb - ax) * slope);
            (ylo, yhi) = (Math.Min(ya, yb), Math.Max(ya, yb));
        }
        return (Row(ylo - r), Row(yhi + r));
    }

    /// <summary>The enumerator of <see cref="Around"/> and <see cref="AlongSegment"/>.</summary>
    public ref struct Walk
    {
        private readonly BucketGrid _grid;
        private readonly int _count, _c0, _r0, _c1, _r1;
        private readonly bool _all, _along;
        private readonly double _ax, _ay, _bx, _by, _reach;
        private List<int>? _list;
        private int _c, _r, _k, _rowFirst, _rowLast;

        internal Walk(BucketGrid grid, double x0, double y0, double x1, double y1, int count)
        {
            _grid = grid;
            _count = count;
            _all = !grid.Span(x0, y0, x1, y1, out _c0, out _r0, out _c1, out _r1);
            _list = _all ? null : grid._wide;
            (_c, _r, _k, _rowFirst, _rowLast) = (_c0, _r0 - 1, -1, _r0, _r1);
            Current = -1;
        }

        internal Walk(BucketGrid grid, double ax, double ay, double bx, double by, double reach, int count)
            : this(grid, Math.Min(ax, bx) - reach, Math.Min(ay, by) - reach, Math.Max(ax, bx) + reach, Math.Max(ay, by) + reach, count)
        {
            if (!_all || double.IsNaN(ax + ay + bx + by)) return;
            var r = reach + CoverTolerance;
            (_ax, _ay, _bx, _by, _reach) = (ax, ay, bx, by, r);
            var (c0, c1) = (grid.Col(Math.Min(ax, bx) - r), grid.Col(Math.Max(ax, bx) + r));
            var cells = 0;
            for (var c = c0; c <= c1; c++)
            {
                var (first, last) = grid.RowsAlong(c, ax, ay, bx, by, r);
                cells += Math.Max(0, last - first + 1);
            }
            if (cells > count / 4) return;
            (_all, _along, _list) = (false, true, grid._wide);
            (_c0, _c1) = (c0, c1);
            (_c, _r, _k, _rowFirst, _rowLast) = (c0 - 1, 0, -1, 0, -1);
        }

        public int Current { get; private set; }

        /// <summary>The walk reads the cells along a segment, so entries come out of their index order.</summary>
        public readonly bool ByCells => _along;

        public readonly Walk GetEnumerator() => this;

        public bool MoveNext()
        {
            if (_all)
            {
                if (++_k >= _count) return false;
                Current = _k;
                return true;
            }
            while (++_k >= _list!.Count)
            {
                while (++_r > _rowLast)
                {
                    if (++_c > _c1) return false;
                    (_rowFirst, _rowLast) = _along ? _grid.RowsAlong(_c, _ax, _ay, _bx, _by, _reach) : (_r0, _r1);
                    _r = _rowFirst - 1;
                }
                (_list, _k) = (_grid.Cell(_c, _r), -1);
            }
            Current = _list[_k];
            return true;
        }
    }

    /// <summary>Files entry e under every cell its box touches (on the wide list when that is too many), or nowhere when the box is not a number.</summary>
    public void File(int e, double x0, double y0, double x1, double y1)
    {
        int c0 = -1, r0 = -1, c1 = -1, r1 = -1;
        if (!double.IsNaN(x0) && !Span(x0, y0, x1, y1, out c0, out r0, out c1, out r1)) c0 = r0 = c1 = r1 = WideMark;
        var b = 4 * e;
        if (_box[b] == c0 && _box[b + 1] == r0 && _box[b + 2] == c1 && _box[b + 3] == r1) return;
        if (_box[b] == WideMark) _wide.Remove(e);
        else if (_box[b] >= 0)
            for (var c = _box[b]; c <= _box[b + 2]; c++)
                for (var r = _box[b + 1]; r <= _box[b + 3]; r++)
                    _cells[r * _cols + c].Remove(e);
        if (c0 == WideMark) _wide.Add(e);
        else if (c0 >= 0)
            for (var c = c0; c <= c1; c++)
                for (var r = r0; r <= r1; r++)
                    _cells[r * _cols + c].Add(e);
        (_box[b], _box[b + 1], _box[b + 2], _box[b + 3]) = (c0, r0, c1, r1);
    }
}
