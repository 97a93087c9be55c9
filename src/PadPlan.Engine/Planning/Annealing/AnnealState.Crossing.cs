namespace PadPlan.Planning;

/// <summary>
/// Bare leads of two nets whose paths (exit to landing, plan view) cross or pass nearer than the lead gap: the placer's
/// own version of the checker's lead-crossing rule. Each lead keeps its committed landing point; a move re-measures the
/// pairs of the leads it can change (those of the moved items and the free leads of their nets), found through a grid
/// of lead paths.
/// </summary>
internal sealed partial class AnnealState
{
    /// <summary>Smallest cell of the lead-path grid (mm).</summary>
    private const double LeadCellSize = 4.0;
    /// <summary>Committed lead paths (exit to landing) filed by their boxes; a lead with no landing is filed nowhere.</summary>
    private BucketGrid _leadGrid = null!;
    private bool[] _crosses = [];
    private double[] _lx = [], _ly = [], _lxNew = [], _lyNew = [];
    private int[] _changed = [], _changedStamp = [], _leadSeen = [];
    private int _changedCount, _leadSeenStamp, _tangledCount, _nearWorst;
    private int[] _tangled = [];
    private double _nearWorstV;
    private double _leadReach, _crossBefore;
    /// <summary>Most changed leads whose pairs among themselves are kept from the opening of a move for its evaluation; pairs beyond are measured again.</summary>
    private const int KeptPairLeads = 64;
    // What opening a move measured per changed lead (by its place in _changed) and per pair of the first KeptPairLeads of them,
    // with the exit each lead had: a lead whose path the move leaves alone gives the same figures again, so the evaluation reuses them.
    private double[] _nearBefore = [], _pairBefore = [], _exBeforeX = [], _exBeforeY = [];
    private bool[] _pathKept = [];

    private void BuildCrossing()
    {
        var n = _leads.Length;
        _crosses = new bool[n];
        var widest = 0.0;
        for (var l = 0; l < n; l++)
        {
            var lead = _leads[l];
            // the wires of a wire landing come in insulated; an unconnected lead is cut off short, unless it is a pin soldered
            // to its own strip segment, which another bare lead must still keep clear of (the checker's lead-crossing rule)
            _crosses[l] = !_items[lead.Item].IsLanding && (lead.Ground || lead.Net >= 0 || lead.OwnIsland >= 0);
            if (_crosses[l]) widest = Math.Max(widest, lead.Diameter);
        }
        _leadReach = _p.Rules.LeadGap + widest;
        _lx = new double[n]; _ly = new double[n]; _lxNew = new double[n]; _lyNew = new double[n];
        Array.Fill(_lx, double.NaN);
        Array.Fill(_ly, double.NaN);
        _changed = new int[n];
        _nearBefore = new double[n]; _exBeforeX = new double[n]; _exBeforeY = new double[n];
        _pathKept = new bool[n];
        _pairBefore = new double[KeptPairLeads * (KeptPairLeads - 1) / 2];
        _tangled = new int[2 * n];
        _changedStamp = new int[n];
        _leadSeen = new int[n];
        _leadGrid = new BucketGrid(_p.Region, LeadCellSize, n);
    }

    /// <summary>The landing of a lead that is fixed by its own item: its ground landing, or its exit over the strip segment beneath it.</summary>
    private void OwnLanding(int l, double[] lx, double[] ly)
    {
        var lead = _leads[l];
        if (lead.Ground) (lx[l], ly[l]) = (_gX[l], _gY[l]);
        else if (lead.OwnIsland >= 0) (lx[l], ly[l]) = (_exX[l], _exY[l]); // a pin over its strip segment lands where it leaves the body, as written
    }

    /// <summary>Files a lead's committed path under the lead cells it touches (see <see cref="BucketGrid"/>).</summary>
    private void RegisterLead(int l) =>
        _leadGrid.File(l, Math.Min(_exX[l], _lx[l]), Math.Min(_exY[l], _ly[l]), Math.Max(_exX[l], _lx[l]), Math.Max(_exY[l], _ly[l]));

    /// <summary>All lead-crossing violations from scratch, after the nets have set every free lead's landing.</summary>
    private double RecomputeCrossing()
    {
        for (var l = 0; l < _leads.Length; l++)
        {
            if (!_crosses[l]) continue;
            OwnLanding(l, _lx, _ly);
            RegisterLead(l);
        }
        _tangledCount = 0;
        return CommittedCrossings((l, _) =>
        {
            MarkCrowded(_leads[l].Item); // so the annealer's mending moves pick it
            if (_nearWorst < 0) return;
            _tangled[2 * _tangledCount] = l;
            _tangled[2 * _tangledCount++ + 1] = _nearWorst;
        });
    }

    /// <summary>Pairs of leads that crossed at the last full recount.</summary>
    public int TangledCount => _tangledCount;

    /// <summary>The k-th pair of leads that crossed at the last full recount: a lead, and the lead it crossed most.</summary>
    public (int A, int B) Tangled(int k) => (_tangled[2 * k], _tangled[2 * k + 1]);

    /// <summary>The item that carries the pad a lead lands on (-1 when it lands on none).</summary>
    public int HolderOf(int l) => IslandOf(l) is var island and >= 0 ? _islands[island].Item : -1;

    /// <summary>The committed lead-crossing violations, each pair counted once (from its first lead); <paramref name="perLead"/> hears each lead's share that is not zero.</summary>
    private double CommittedCrossings(Action<int, double>? perLead)
    {
        _stamp++;
        var v = 0.0;
        for (var p = 0; p < _leads.Length; p++)
        {
            if (!_crosses[p]) continue;
            _changedStamp[p] = _stamp;
            var near = CrossingNear(p, _lx, _ly);
            if (near > 0) perLead?.Invoke(p, near);
            v += near;
        }
        return v;
    }

    /// <summary>How far one lead's committed path breaks the crossing rule, and the lead of another net it comes nearest to (-1 when none): for the legaliser's choice of what to move.</summary>
    public (double V, int Other) CrossingAt(int l)
    {
        if (!_crosses[l]) return (0, -1);
        _stamp++;
        var v = CrossingNear(l, _lx, _ly);
        return (v, _nearWorst);
    }

    /// <summary>The crossing violations an item's leads take part in, for the legaliser's choice of what to move.</summary>
    private double CrossingOf(int i)
    {
        _stamp++;
        var v = 0.0;
        foreach (var l in _items[i].Leads)
            if (_crosses[l]) v += CrossingNear(l, _lx, _ly);
        return v;
    }

    /// <summary>Collects the leads the open move can change: every lead of the moved items, and the free leads of their nets.</summary>
    private void CollectChanged()
    {
        _changedCount = 0;
        void Add(int l)
        {
            if (!_crosses[l] || _changedStamp[l] == _stamp) return;
            _changedStamp[l] = _stamp;
            _changed[_changedCount++] = l;
        }
        foreach (var l in _items[_ta].Leads) Add(l);
        if (_tb >= 0) foreach (var l in _items[_tb].Leads) Add(l);
        for (var k = 0; k < _affectedCount; k++)
            foreach (var l in _nets[_affected[k]].FreeLeads) Add(l);
    }

    /// <summary>Violations of every pair with a changed lead as committed, when a move opens; keeps each lead's and each pair's figure, and each lead's exit, for <see cref="CrossingOfChangedAfter"/>.</summary>
    private double CrossingOfChangedBefore()
    {
        var v = 0.0;
        var kept = 0;
        for (var i = 0; i < _changedCount; i++)
        {
            var p = _changed[i];
            (_exBeforeX[i], _exBeforeY[i]) = (_exX[p], _exY[p]);
            _nearBefore[i] = CrossingNear(p, _lx, _ly);
            v += _nearBefore[i];
            for (var j = i + 1; j < _changedCount; j++)
            {
                var q = _changed[j];
                var c = CrossPair(p, q, _lx[p], _ly[p], _lx[q], _ly[q]);
                if (j < KeptPairLeads) _pairBefore[kept++] = c;
                v += c;
            }
        }
        return v;
    }

    /// <summary>
    /// Violations of every pair with a changed lead, measured with the changed leads' new landings (_lxNew, _lyNew) once the
    /// move is applied. A changed lead whose exit and landing stayed bit for bit the same (a free lead of another part, still on
    /// its pad) meets the unchanged leads as before, and another such lead as before, so those figures are taken from the opening;
    /// the sum runs in the same order over the same figures, so it is the very number a full re-measure gives.
    /// </summary>
    private double CrossingOfChangedAfter()
    {
        for (var i = 0; i < _changedCount; i++)
        {
            var p = _changed[i];
            _pathKept[i] = SameBits(_exX[p], _exBeforeX[i]) && SameBits(_exY[p], _exBeforeY[i])
                && SameBits(_lxNew[p], _lx[p]) && SameBits(_lyNew[p], _ly[p]);
        }
        var v = 0.0;
        var kept = 0;
        for (var i = 0; i < _changedCount; i++)
        {
            var p = _changed[i];
            v += _pathKept[i] ? _nearBefore[i] : CrossingNear(p, _lxNew, _lyNew);
            for (var j = i + 1; j < _changedCount; j++)
            {
                var q = _changed[j];
                var reuse = j < KeptPairLeads && _pathKept[i] && _pathKept[j];
                v += reuse ? _pairBefore[kept] : CrossPair(p, q, _lxNew[p], _lyNew[p], _lxNew[q], _lyNew[q]);
                if (j < KeptPairLeads) kept++;
            }
        }
        return v;
    }

    /// <summary>The same double to the bit (NaN, the mark of no landing, equals itself).</summary>
    private static bool SameBits(double a, double b) => BitConverter.DoubleToInt64Bits(a) == BitConverter.DoubleToInt64Bits(b);

    /// <summary>Violations between lead p (landing px, py) and every unchanged lead whose committed path is near (a search over more than <see cref="BucketGrid.MaxCellsPerEntry"/> cells reads every lead instead).</summary>
    private double CrossingNear(int p, double[] lx, double[] ly)
    {
        var (px, py) = (lx[p], ly[p]);
        if (double.IsNaN(px)) return 0;
        var reach = _leadReach + _slack;
        _leadSeenStamp++;
        (_nearWorst, _nearWorstV) = (-1, 0.0);
        var v = 0.0;
        double Near(int q)
        {
            if (_leadSeen[q] == _leadSeenStamp || _changedStamp[q] == _stamp || !_crosses[q]) return 0;
            _leadSeen[q] = _leadSeenStamp;
            var c = CrossPair(p, q, px, py, _lx[q], _ly[q]);
            if (c > _nearWorstV) (_nearWorst, _nearWorstV) = (q, c);
            return c;
        }
        foreach (var q in _leadGrid.Around(Math.Min(_exX[p], px) - reach, Math.Min(_exY[p], py) - reach, Math.Max(_exX[p], px) + reach, Math.Max(_exY[p], py) + reach, _leads.Length))
            v += Near(q);
        return v;
    }

    /// <summary>How much nearer than allowed two lead paths come (mm): the lead gap between two parts; within one part at most half the gap its package leaves at the body.</summary>
    private double CrossPair(int p, int q, double px, double py, double qx, double qy)
    {
        var (a, b) = (_leads[p], _leads[q]);
        if (double.IsNaN(px) || double.IsNaN(qx) || (a.Ground && b.Ground) || (a.Net >= 0 && a.Net == b.Net)) return 0;
        if (a.OwnIsland >= 0 && b.OwnIsland >= 0 && a.Item == b.Item) return 0; // pins over one part's strip: fixed geometry
        var radii = (a.Diameter + b.Diameter) / 2;
        var gap = _p.Rules.LeadGap;
        if (a.Item == b.Item)
        {
            var ex = _exX[p] - _exX[q];
            var ey = _exY[p] - _exY[q];
            gap = Math.Min(gap, (Math.Sqrt(ex * ex + ey * ey) - radii) / 2);
        }
        var need = radii + gap + PlacerLimits.Safety + _slack;
        var d = Geometry.SegmentGap(_exX[p], _exY[p], px, py, _exX[q], _exY[q], qx, qy, need);
        return d < need ? need - d : 0;
    }
}
