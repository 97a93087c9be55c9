namespace PadPlan.Planning;

/// <summary>
/// Bare leads whose level run (from the exit to above the landing, plan view) or drop onto the landing passes through
/// another part's body or closer than the lead gap under it: the placer's own form of the checker's lead-meets-body
/// rule, on body boxes. A run ending inside a box has its drop there too, so bodies may lie over pads as long as no lead
/// comes down under them.
/// Like lead crossing it is kept apart from the nets: each lead keeps its committed landing and its committed violation.
/// Opening a move only sums the committed figures of the runs it can change (every lead of the moved items and the free
/// leads of their nets); evaluating it re-measures those runs against the bodies near them, found through the item grid,
/// and the unchanged runs near the moved bodies' old and new boxes, found through the lead grid, by how much the move
/// changes them. Leads that no body could meet and bodies that sit high enough to clear every lead are left out from
/// the start; nothing is allocated per move.
/// </summary>
internal sealed partial class AnnealState
{
    /// <summary>The lead has a level run to a landing that some body could meet.</summary>
    private bool[] _runs = [];
    /// <summary>Per lead: how high above the pad tops a body's underside must be to clear it (its part's lead level plus the lead gap).</summary>
    private double[] _runNeed = [];
    /// <summary>Per item: its body sits low enough for some lead to meet it.</summary>
    private bool[] _lowBody = [];
    /// <summary>Per lead: its committed run violation (mm), and during an evaluated move its new one.</summary>
    private double[] _runViol = [], _runViolNew = [];
    /// <summary>Per lead: how many low bodies its committed run meets (the terms of its violation), or -1 when not known (a lead so thick that the item grid might not show it every body it meets); during an evaluated move the changed runs' new counts, and the change to the unchanged runs' counts.</summary>
    private int[] _runMet = [], _runMetNew = [], _runMetDelta = [];
    /// <summary>The bodies met in the last <see cref="RunNear"/> search, or -1 when that search may have missed one.</summary>
    private int _runMetCount;
    private int[] _runChanged = [], _runChangedStamp = [];
    private int _runChangedCount, _runStamp;
    // unchanged runs a moved body passes over: which, and by how much the move changes each
    private int[] _runTouched = [], _runTouchedStamp = [];
    private double[] _runDelta = [];
    private int _runTouchedCount;
    // the moved bodies' boxes before the move
    private double _oldAx0, _oldAy0, _oldAx1, _oldAy1, _oldBx0, _oldBy0, _oldBx1, _oldBy1;
    private double _widestRun;

    private void BuildRuns()
    {
        var n = _leads.Length;
        _runs = new bool[n];
        _runNeed = new double[n];
        _lowBody = new bool[_items.Length];
        _runChanged = new int[n];
        _runChangedStamp = new int[n];
        _runViol = new double[n];
        _runViolNew = new double[n];
        _runMet = new int[n]; _runMetNew = new int[n]; _runMetDelta = new int[n];
        _runTouched = new int[n];
        _runTouchedStamp = new int[n];
        _runDelta = new double[n];
        var highestNeed = double.NegativeInfinity;
        for (var l = 0; l < n; l++)
        {
            _runNeed[l] = _items[_leads[l].Item].LeadLevel + _p.Rules.LeadGap;
            if (Lands(_leads[l])) highestNeed = Math.Max(highestNeed, _runNeed[l]);
        }
        var lowestBottom = double.PositiveInfinity;
        for (var i = 0; i < _items.Length; i++)
        {
            _lowBody[i] = _items[i].KeepsOffPads && _items[i].BodyBottom < highestNeed;
            if (_lowBody[i]) lowestBottom = Math.Min(lowestBottom, _items[i].BodyBottom);
        }
        for (var l = 0; l < n; l++)
        {
            _runs[l] = Lands(_leads[l]) && lowestBottom < _runNeed[l];
            if (_runs[l]) _widestRun = Math.Max(_widestRun, _leads[l].Diameter);
        }
    }

    /// <summary>The lead lands somewhere: on its net's pads, its own strip segment (a run of no length: it drops where it leaves the body) or the plane.</summary>
    private static bool Lands(ProblemLead lead) => lead.OwnIsland >= 0 || lead.Ground || lead.Net >= 0;

    /// <summary>All run violations from scratch, after the nets and the crossing recount have set every lead's landing; files every run in the lead grid.</summary>
    private double RecomputeRuns()
    {
        var v = 0.0;
        for (var l = 0; l < _leads.Length; l++)
        {
            if (!_runs[l]) continue;
            OwnLanding(l, _lx, _ly);
            RegisterLead(l);
            _runViol[l] = RunNear(l, _lx[l], _ly[l]);
            _runMet[l] = _runMetCount;
            if (_runViol[l] > 0) MarkRunCrowded(l);
            v += _runViol[l];
        }
        return v;
    }

    /// <summary>Marks the items a lead's run meets as crowded, with the lead's own part and the item it lands on, so the annealer's mending moves pick them.</summary>
    private void MarkRunCrowded(int l)
    {
        MarkCrowded(_leads[l].Item);
        if (IslandOf(l) is var s and >= 0) MarkCrowded(_islands[s].Item);
        foreach (var j in BodiesOverRun(l)) MarkCrowded(j);
    }

    /// <summary>The items whose low bodies lead l's committed run passes through or too close under (a scan of every item: for the recount and the failure message, not for moves).</summary>
    private IEnumerable<int> BodiesOverRun(int l)
    {
        var r = RunWidening(l);
        for (var j = 0; j < _items.Length; j++)
            if (j != _leads[l].Item && _lowBody[j] && _items[j].BodyBottom < _runNeed[l]
                && Geometry.ClippedLength(_exX[l], _exY[l], _lx[l], _ly[l], _bMinX[j] - r, _bMinY[j] - r, _bMaxX[j] + r, _bMaxY[j] + r) > 0)
                yield return j;
    }

    /// <summary>Opens the run term of a move of item a (and b): collects the runs it can change (every lead of the moved items,
    /// and the free leads of their nets), remembers the moved bodies' boxes, and returns the changed runs' committed violation.</summary>
    private double BeginRuns(int a, int b)
    {
        _runStamp++;
        _runChangedCount = 0;
        AddRunsOfItem(a);
        if (b >= 0) AddRunsOfItem(b);
        (_oldAx0, _oldAy0, _oldAx1, _oldAy1) = (_bMinX[a], _bMinY[a], _bMaxX[a], _bMaxY[a]);
        if (b >= 0) (_oldBx0, _oldBy0, _oldBx1, _oldBy1) = (_bMinX[b], _bMinY[b], _bMaxX[b], _bMaxY[b]);
        var v = 0.0;
        for (var k = 0; k < _runChangedCount; k++) v += _runViol[_runChanged[k]];
        return v;
    }

    private void AddRunsOfItem(int item)
    {
        foreach (var l in _items[item].Leads) AddRunChanged(l);
        foreach (var n in _items[item].Nets)
            foreach (var l in _nets[n].FreeLeads) AddRunChanged(l);
    }

    private void AddRunChanged(int l)
    {
        if (!_runs[l] || _runChangedStamp[l] == _runStamp) return;
        _runChangedStamp[l] = _runStamp;
        _runChanged[_runChangedCount++] = l;
    }

    /// <summary>The run term of the open move after its geometry and landings (lxNew, lyNew) are set: the changed runs' new
    /// violation, plus how much the moved bodies change the unchanged runs near them.</summary>
    private double EvaluateRuns()
    {
        var v = 0.0;
        for (var k = 0; k < _runChangedCount; k++)
        {
            var l = _runChanged[k];
            OwnLanding(l, _lxNew, _lyNew);
            if (!KeptRunMeetsOnlyMoved(l, out _runViolNew[l], out _runMetNew[l]))
            {
                _runViolNew[l] = RunNear(l, _lxNew[l], _lyNew[l]);
                _runMetNew[l] = _runMetCount;
            }
            v += _runViolNew[l];
        }
        _runTouchedCount = 0;
        v += MovedBodyOverRuns(_ta, _oldAx0, _oldAy0, _oldAx1, _oldAy1);
        if (_tb >= 0) v += MovedBodyOverRuns(_tb, _oldBx0, _oldBy0, _oldBx1, _oldBy1);
        return v;
    }

    /// <summary>Takes the open move's runs as committed: the changed runs' landings, violations and grid cells, and the change to the unchanged runs under the moved bodies.</summary>
    private void CommitRuns()
    {
        for (var k = 0; k < _runChangedCount; k++)
        {
            var l = _runChanged[k];
            (_lx[l], _ly[l]) = (_lxNew[l], _lyNew[l]);
            _runViol[l] = _runViolNew[l];
            _runMet[l] = _runMetNew[l];
            RegisterLead(l);
        }
        for (var k = 0; k < _runTouchedCount; k++)
        {
            var q = _runTouched[k];
            _runViol[q] += _runDelta[q];
            if (_runMet[q] >= 0) _runMet[q] += _runMetDelta[q];
        }
    }

    /// <summary>The run violations an item can mend by moving, for the legaliser's choice of what to move: its own leads' runs,
    /// the runs of leads landing on its islands, and the runs under its body (not every run of its nets: moving a part
    /// elsewhere on a net does not move another part's lead).</summary>
    private double RunsOf(int i)
    {
        _runStamp++;
        _runChangedCount = 0;
        foreach (var l in _items[i].Leads) AddRunChanged(l);
        foreach (var n in _items[i].Nets)
            foreach (var l in _nets[n].FreeLeads)
                if (IslandOf(l) is var s and >= 0 && _islands[s].Item == i) AddRunChanged(l);
        var v = 0.0;
        for (var k = 0; k < _runChangedCount; k++) v += _runViol[_runChanged[k]];
        _leadSeenStamp++;
        return v + BodyOverRuns(i, _bMinX[i], _bMinY[i], _bMaxX[i], _bMaxY[i], change: false);
    }

    /// <summary>How far lead l's run to (ax, ay) passes through or too close under the boxes of other items' low bodies (mm).</summary>
    private double RunNear(int l, double ax, double ay)
    {
        _runMetCount = 0;
        if (double.IsNaN(ax)) return 0;
        var (ex, ey) = (_exX[l], _exY[l]);
        var r = RunWidening(l);
        // A body met by the run is filed under a cell the search reads when the run's widening is within the grid's (see KeptRunMeetsOnlyMoved).
        if (!(r <= _cull)) _runMetCount = int.MinValue;
        _seenStamp++;
        _seen[_leads[l].Item] = _seenStamp;
        var v = 0.0;
        foreach (var j in _itemGrid.Around(Math.Min(ex, ax) - r, Math.Min(ey, ay) - r, Math.Max(ex, ax) + r, Math.Max(ey, ay) + r, _items.Length))
            v += RunThroughBody(l, ex, ey, ax, ay, r, j);
        return v;
    }

    private double RunThroughBody(int l, double ex, double ey, double ax, double ay, double r, int j)
    {
        if (_seen[j] == _seenStamp) return 0;
        _seen[j] = _seenStamp;
        if (!_lowBody[j] || _items[j].BodyBottom >= _runNeed[l]) return 0;
        var t = Geometry.ClippedLength(ex, ey, ax, ay, _bMinX[j] - r, _bMinY[j] - r, _bMaxX[j] + r, _bMaxY[j] + r);
        if (t > 0) _runMetCount++;
        return t;
    }

    /// <summary>
    /// The new violation and count of a changed run that the open move leaves where it was (its part did not move, its landing
    /// is the same to the bit) and that meets no body but the moved ones, without a search: false when that does not hold.
    /// Its search would find the moved bodies that meet it (a body met by a run is filed under a cell the search reads, since
    /// the run's widening r is within the grid's widening _cull) and nothing else that adds, and a sum of at most two terms is
    /// the same in either order, so the figure is the very one the search gives.
    /// </summary>
    private bool KeptRunMeetsOnlyMoved(int l, out double v, out int met)
    {
        (v, met) = (0, 0);
        var item = _leads[l].Item;
        if (_runMet[l] < 0 || item == _ta || item == _tb || double.IsNaN(_lx[l])
            || !SameBits(_lxNew[l], _lx[l]) || !SameBits(_lyNew[l], _ly[l])) return false;
        var r = RunWidening(l);
        var others = _runMet[l];
        var (a, b) = (0.0, 0.0);
        if (MeetsLowBody(l, _ta))
        {
            if (RunThroughBox(l, r, _oldAx0, _oldAy0, _oldAx1, _oldAy1) > 0) others--;
            a = RunThroughBox(l, r, _bMinX[_ta], _bMinY[_ta], _bMaxX[_ta], _bMaxY[_ta]);
        }
        if (_tb >= 0 && MeetsLowBody(l, _tb))
        {
            if (RunThroughBox(l, r, _oldBx0, _oldBy0, _oldBx1, _oldBy1) > 0) others--;
            b = RunThroughBox(l, r, _bMinX[_tb], _bMinY[_tb], _bMaxX[_tb], _bMaxY[_tb]);
        }
        if (others != 0) return false;
        if (a > 0) (v, met) = (v + a, met + 1);
        if (b > 0) (v, met) = (v + b, met + 1);
        return true;
    }

    /// <summary>How far lead l's committed run passes through or too close under bodies (mm).</summary>
    public double RunViolation(int l) => _runViol[l];

    /// <summary>How many low bodies lead l's committed run meets, as kept move by move (-1 when not known): for the verify test.</summary>
    internal int RunMeets(int l) => _runMet[l];

    /// <summary>How far a body's box is widened for lead l's run: the lead's radius, the annealing's slack, and the margin that
    /// keeps a written layout legal once its landings are rounded to 0.01 mm (the checker measures the rounded ones).</summary>
    private double RunWidening(int l) => _leads[l].Diameter / 2 + _slack + PlacerLimits.Safety;

    /// <summary>Item j's body is low enough to meet lead l's run.</summary>
    private bool MeetsLowBody(int l, int j) => _lowBody[j] && _items[j].BodyBottom < _runNeed[l];

    /// <summary>How far lead l's committed run passes through a body box (min and max corners) widened by r (mm).</summary>
    private double RunThroughBox(int l, double r, double x0, double y0, double x1, double y1) =>
        Geometry.ClippedLength(_exX[l], _exY[l], _lx[l], _ly[l], x0 - r, y0 - r, x1 + r, y1 + r);

    /// <summary>By how much moving item j's body from the old box to where it is now changes the unchanged committed runs near either box (mm); each such run's change is kept for the commit.</summary>
    private double MovedBodyOverRuns(int j, double x0, double y0, double x1, double y1)
    {
        if (!_lowBody[j]) return 0;
        _leadSeenStamp++;
        return BodyOverRuns(j, x0, y0, x1, y1, change: true) + BodyOverRuns(j, _bMinX[j], _bMinY[j], _bMaxX[j], _bMaxY[j], change: true);
    }

    /// <summary>
    /// The unchanged committed runs near a box of item j's body: how far they pass through or too close under the body as
    /// it stands (mm), or with <paramref name="change"/> how much that changed from its old box, noted per run for the
    /// commit. Each run counts once per body until the caller moves <see cref="_leadSeenStamp"/> on.
    /// </summary>
    private double BodyOverRuns(int j, double x0, double y0, double x1, double y1, bool change)
    {
        if (!_lowBody[j]) return 0;
        var reach = _widestRun / 2 + _slack + PlacerLimits.Safety;
        var v = 0.0;
        foreach (var q in _leadGrid.Around(x0 - reach, y0 - reach, x1 + reach, y1 + reach, _leads.Length)) v += RunUnderBody(q, j, change);
        return v;
    }

    /// <summary>An unchanged run's violation under item j's body as it stands, or with <paramref name="change"/> its change from the body's old box.</summary>
    private double RunUnderBody(int q, int j, bool change)
    {
        if (_leadSeen[q] == _leadSeenStamp) return 0;
        _leadSeen[q] = _leadSeenStamp;
        if (!_runs[q] || _runChangedStamp[q] == _runStamp || _leads[q].Item == j || _items[j].BodyBottom >= _runNeed[q] || double.IsNaN(_lx[q])) return 0;
        var r = RunWidening(q);
        var (ex, ey, ax, ay) = (_exX[q], _exY[q], _lx[q], _ly[q]);
        var now = Geometry.ClippedLength(ex, ey, ax, ay, _bMinX[j] - r, _bMinY[j] - r, _bMaxX[j] + r, _bMaxY[j] + r);
        if (!change) return now;
        var old = Geometry.ClippedLength(ex, ey, ax, ay, OldBox(j, 0) - r, OldBox(j, 1) - r, OldBox(j, 2) + r, OldBox(j, 3) + r);
        var d = now - old;
        if (d == 0) return 0;
        if (_runTouchedStamp[q] != _runStamp)
        {
            _runTouchedStamp[q] = _runStamp;
            _runDelta[q] = 0;
            _runMetDelta[q] = 0;
            _runTouched[_runTouchedCount++] = q;
        }
        _runDelta[q] += d;
        _runMetDelta[q] += (now > 0 ? 1 : 0) - (old > 0 ? 1 : 0);
        return d;
    }

    /// <summary>Corner k (minX, minY, maxX, maxY) of a moved item's body box before the open move.</summary>
    private double OldBox(int j, int k) => j == _ta
        ? k switch { 0 => _oldAx0, 1 => _oldAy0, 2 => _oldAx1, _ => _oldAy1 }
        : k switch { 0 => _oldBx0, 1 => _oldBy0, 2 => _oldBx1, _ => _oldBy1 };
}
