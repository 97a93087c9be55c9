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
    private double _leadReach;
    // Per changed lead (by its place in _changed): its exit as the move opened; and the places of those whose path moved.
    private double[] _exBeforeX = [], _exBeforeY = [];
    private int[] _moved = [];
    /// <summary>Per lead: how many leads its committed path comes too near (pairs with a violation above 0), counted exactly, so a move can tell that a lead's old path meets nothing without searching.</summary>
    private int[] _crossCount = [];
    /// <summary>Some lead the open move can change comes too near another now: only then can the move lower the crossing violation.</summary>
    private bool _changedCross;
    /// <summary>The terms above 0 of a search that reads cells out of the leads' order: which lead, and how much.</summary>
    private int[] _termLead = [];
    private double[] _termValue = [];
    // The open move's pairs whose violation is above 0: (lead, lead, +1) with the new paths, (lead, lead, -1) with the old,
    // applied to _crossCount on commit.
    private int[] _pairLog = [];
    private int _pairLogCount;
    /// <summary>What <see cref="CrossingNear(int, double, double, double, double)"/> does with each pair above 0: nothing (0), log it for the open move (+1 new, -1 old), or count it at once (<see cref="RecountPairs"/>).</summary>
    private int _pairSign;
    private const int RecountPairs = 2;

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
        _crossCount = new int[n];
        _termLead = new int[n];
        _termValue = new double[n];
        _pairLog = new int[3 * 64];
        _exBeforeX = new double[n]; _exBeforeY = new double[n];
        _moved = new int[n];
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
        Array.Clear(_crossCount);
        _pairSign = RecountPairs;
        var v = CommittedCrossings((l, _) =>
        {
            MarkCrowded(_leads[l].Item); // so the annealer's mending moves pick it
            if (_nearWorst < 0) return;
            _tangled[2 * _tangledCount] = l;
            _tangled[2 * _tangledCount++ + 1] = _nearWorst;
        });
        _pairSign = 0;
        return v;
    }

    /// <summary>The committed crossing violation summed over every pair of leads, with no grid: for the verify test of the searches.</summary>
    internal double CrossingByEveryPair()
    {
        var v = 0.0;
        for (var p = 0; p < _leads.Length; p++)
            for (var q = p + 1; q < _leads.Length; q++)
                if (_crosses[p] && _crosses[q]) v += CrossPair(p, q, _exX[p], _exY[p], _lx[p], _ly[p], _exX[q], _exY[q], _lx[q], _ly[q]);
        return v;
    }

    /// <summary>The committed crossing violation as the searches found it at the last recount and kept it since.</summary>
    internal double CrossingViolation => _crossViolation;

    /// <summary>How many leads lead l's committed path comes too near, as kept move by move: for the verify test.</summary>
    internal int CrossCount(int l) => _crossCount[l];

    /// <summary>Notes a pair of leads whose violation is above 0, as <see cref="_pairSign"/> says.</summary>
    private void NotePair(int p, int q)
    {
        if (_pairSign == RecountPairs)
        {
            _crossCount[p]++;
            _crossCount[q]++;
            return;
        }
        if (3 * _pairLogCount + 3 > _pairLog.Length) Array.Resize(ref _pairLog, 2 * _pairLog.Length);
        var k = 3 * _pairLogCount++;
        (_pairLog[k], _pairLog[k + 1], _pairLog[k + 2]) = (p, q, _pairSign);
    }

    /// <summary>Takes the open move's pairs as committed: each lead's count of pairs above 0.</summary>
    private void CommitCrossCounts()
    {
        for (var k = 0; k < 3 * _pairLogCount; k += 3)
        {
            _crossCount[_pairLog[k]] += _pairLog[k + 2];
            _crossCount[_pairLog[k + 1]] += _pairLog[k + 2];
        }
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
            var near = CrossingNear(p);
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
        var v = CrossingNear(l);
        return (v, _nearWorst);
    }

    /// <summary>The crossing violations an item's leads take part in, for the legaliser's choice of what to move.</summary>
    private double CrossingOf(int i)
    {
        _stamp++;
        var v = 0.0;
        foreach (var l in _items[i].Leads)
            if (_crosses[l]) v += CrossingNear(l);
        return v;
    }

    /// <summary>Collects the leads the open move can change: every lead of the moved items, and the free leads of their nets.</summary>
    private void CollectChanged()
    {
        _changedCount = 0;
        _changedCross = false;
        void Add(int l)
        {
            if (!_crosses[l] || _changedStamp[l] == _stamp) return;
            _changedStamp[l] = _stamp;
            _changed[_changedCount++] = l;
            _changedCross |= _crossCount[l] > 0;
        }
        foreach (var l in _items[_ta].Leads) Add(l);
        if (_tb >= 0) foreach (var l in _items[_tb].Leads) Add(l);
        for (var k = 0; k < _affectedCount; k++)
            foreach (var l in _nets[_affected[k]].FreeLeads) Add(l);
    }

    /// <summary>Keeps each changed lead's exit as the move opens, for <see cref="CrossingChange"/>.</summary>
    private void KeepChangedExits()
    {
        for (var i = 0; i < _changedCount; i++)
        {
            var p = _changed[i];
            (_exBeforeX[i], _exBeforeY[i]) = (_exX[p], _exY[p]);
        }
    }

    /// <summary>
    /// How much the open move changes the crossing violations, once it is applied: for every changed lead whose path moved
    /// (its exit or its landing), its figure with the new path less that with the old one, against every lead whose path
    /// did not move; and for every pair of such leads, the new figure less the old. A changed lead whose exit and landing
    /// stayed bit for bit the same (a free lead of another part, still on its pad) is filed in the grid with the very path
    /// it has now, so the searches meet it like any unchanged lead, and only where a moved path comes near it.
    /// </summary>
    private double CrossingChange()
    {
        _pairLogCount = 0;
        var moved = 0;
        for (var i = 0; i < _changedCount; i++)
        {
            var p = _changed[i];
            if (SameBits(_exX[p], _exBeforeX[i]) && SameBits(_exY[p], _exBeforeY[i]) && SameBits(_lxNew[p], _lx[p]) && SameBits(_lyNew[p], _ly[p])) continue;
            _moved[moved++] = i;
        }
        if (moved == 0) return 0;
        // From here on only the moved paths are left out of the searches.
        _stamp++;
        for (var k = 0; k < moved; k++) _changedStamp[_changed[_moved[k]]] = _stamp;
        var d = 0.0;
        for (var k = 0; k < moved; k++)
        {
            var i = _moved[k];
            var p = _changed[i];
            _pairSign = 1;
            var now = CrossingNear(p, _exX[p], _exY[p], _lxNew[p], _lyNew[p]);
            _pairSign = -1;
            // an old path that came too near no lead adds exactly 0: no need to search
            d += now - (_crossCount[p] > 0 ? CrossingNear(p, _exBeforeX[i], _exBeforeY[i], _lx[p], _ly[p]) : 0);
            for (var m = k + 1; m < moved; m++)
            {
                var j = _moved[m];
                var q = _changed[j];
                var pairNow = CrossPair(p, q, _exX[p], _exY[p], _lxNew[p], _lyNew[p], _exX[q], _exY[q], _lxNew[q], _lyNew[q]);
                var pairBefore = _crossCount[p] > 0 && _crossCount[q] > 0
                    ? CrossPair(p, q, _exBeforeX[i], _exBeforeY[i], _lx[p], _ly[p], _exBeforeX[j], _exBeforeY[j], _lx[q], _ly[q])
                    : 0;
                if (pairNow > 0) { _pairSign = 1; NotePair(p, q); }
                if (pairBefore > 0) { _pairSign = -1; NotePair(p, q); }
                d += pairNow - pairBefore;
            }
        }
        _pairSign = 0;
        return d;
    }

    /// <summary>The same double to the bit (NaN, the mark of no landing, equals itself).</summary>
    private static bool SameBits(double a, double b) => BitConverter.DoubleToInt64Bits(a) == BitConverter.DoubleToInt64Bits(b);

    /// <summary>Violations between lead p, with its committed path, and every unchanged lead whose committed path is near.</summary>
    private double CrossingNear(int p) => CrossingNear(p, _exX[p], _exY[p], _lx[p], _ly[p]);

    /// <summary>
    /// Violations between lead p on the path (ex, ey) to (px, py) and every unchanged lead whose committed path is near
    /// (<see cref="BucketGrid.AlongSegment"/>). A search too wide for the grid's box reads the cells along the path, out of
    /// the order of the leads; its terms are then summed in that order, as reading every lead would, so the sum is the same
    /// to the bit.
    /// </summary>
    private double CrossingNear(int p, double ex, double ey, double px, double py)
    {
        if (double.IsNaN(px)) return 0;
        var reach = _leadReach + _slack;
        _leadSeenStamp++;
        (_nearWorst, _nearWorstV) = (-1, 0.0);
        var v = 0.0;
        var (x0, y0, x1, y1) = (Math.Min(ex, px) - reach, Math.Min(ey, py) - reach, Math.Max(ex, px) + reach, Math.Max(ey, py) + reach);
        var walk = _leadGrid.AlongSegment(ex, ey, px, py, reach, _leads.Length);
        var terms = 0;
        foreach (var q in walk)
        {
            if (_leadSeen[q] == _leadSeenStamp || _changedStamp[q] == _stamp || !_crosses[q]) continue;
            // A path whose box lies beyond the search box, widened by the margin the pair's need has over the reach, adds
            // exactly 0: skip it before reading the leads.
            if (Math.Max(_exX[q], _lx[q]) < x0 - PlacerLimits.Safety || Math.Min(_exX[q], _lx[q]) > x1 + PlacerLimits.Safety
                || Math.Max(_exY[q], _ly[q]) < y0 - PlacerLimits.Safety || Math.Min(_exY[q], _ly[q]) > y1 + PlacerLimits.Safety) continue;
            _leadSeen[q] = _leadSeenStamp;
            var c = CrossPair(p, q, ex, ey, px, py, _exX[q], _exY[q], _lx[q], _ly[q]);
            if (c <= 0) continue; // adds exactly 0
            if (walk.ByCells) (_termLead[terms], _termValue[terms++]) = (q, c);
            else v += CrossTerm(p, q, c);
        }
        if (terms > 0)
        {
            _termLead.AsSpan(0, terms).Sort(_termValue.AsSpan(0, terms));
            for (var k = 0; k < terms; k++) v += CrossTerm(p, _termLead[k], _termValue[k]);
        }
        return v;
    }

    /// <summary>One pair's violation c above 0, found by a search from lead p: noted for the counts and the worst, and returned.</summary>
    private double CrossTerm(int p, int q, double c)
    {
        if (_pairSign != 0) NotePair(p, q);
        if (c > _nearWorstV) (_nearWorst, _nearWorstV) = (q, c);
        return c;
    }

    /// <summary>How much nearer than allowed two lead paths come (mm): the lead gap between two parts; within one part at most half the gap its package leaves at the body.</summary>
    private double CrossPair(int p, int q, double pex, double pey, double px, double py, double qex, double qey, double qx, double qy)
    {
        var (a, b) = (_leads[p], _leads[q]);
        if (double.IsNaN(px) || double.IsNaN(qx) || (a.Ground && b.Ground) || (a.Net >= 0 && a.Net == b.Net)) return 0;
        if (a.OwnIsland >= 0 && b.OwnIsland >= 0 && a.Item == b.Item) return 0; // pins over one part's strip: fixed geometry
        var radii = (a.Diameter + b.Diameter) / 2;
        var gap = _p.Rules.LeadGap;
        if (a.Item == b.Item)
        {
            var ex = pex - qex;
            var ey = pey - qey;
            gap = Math.Min(gap, (Math.Sqrt(ex * ex + ey * ey) - radii) / 2);
        }
        var need = radii + gap + PlacerLimits.Safety + _slack;
        var d = Geometry.SegmentGap(pex, pey, px, py, qex, qey, qx, qy, need);
        return d < need ? need - d : 0;
    }
}
