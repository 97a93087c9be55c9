using PadPlan.Model;

namespace PadPlan.Planning;

internal sealed partial class AnnealState
{
    private readonly double[] _pairKey, _pairLen, _pairViol, _pairAx, _pairAy;
    private readonly int[] _pairId;
    private readonly int[] _use;
    private readonly bool[] _taken;
    private readonly double[] _mstDist;
    private readonly bool[] _mstIn;
    /// <summary>Soft cost found by <see cref="Pair"/> calls since it was last cleared.</summary>
    private double _soft;

    /// <summary>Work counters for the profile: nets evaluated, lead landings found, item pairs tested.</summary>
    public long NetEvaluations, LandingsFound, PairTests;

    /// <summary>Lead length to an island for one lead, with its landing point and any broken reach limit.</summary>
    public double Land(int l, int s, out double ax, out double ay, out double violation)
    {
        var lead = _leads[l];
        var island = _islands[s];
        LandingsFound++;
        return Landing.Find(_exX[l], _exY[l], _ouX[l], _ouY[l], island.Round, _isX[s], _isY[s], _isHW[s], _isHH[s],
            lead.Diameter + 2 * _slack, lead.MinReach, lead.MaxReach - _slack, out ax, out ay, out violation);
    }

    /// <summary>Cost of one net: weighted lead lengths to the islands they are given (nearest first, within capacity) and the jumpers joining its islands.</summary>
    private void EvalNet(int n, int[] assign, double[] lx, double[] ly, double[] runBox, out double cost, out double viol)
    {
        var net = _nets[n];
        var isl = net.Islands;
        var count = isl.Length;
        NetEvaluations++;
        cost = 0;
        viol = 0;
        var box = 4 * n;
        (runBox[box], runBox[box + 1], runBox[box + 2], runBox[box + 3]) = (double.MaxValue, double.MaxValue, double.MinValue, double.MinValue);
        if (count == 0) { viol = 10 * net.Leads.Length; return; }
        for (var k = 0; k < count; k++) _use[k] = 0;
        foreach (var l in net.Leads)
        {
            var own = _leads[l].OwnIsland;
            if (own < 0) continue;
            var k = Array.IndexOf(isl, own);
            if (k >= 0) _use[k]++;
        }
        var free = net.FreeLeads;
        foreach (var l in free) lx[l] = ly[l] = double.NaN;
        var longest = 0.0;
        if (count == 1)
        {
            for (var a = 0; a < free.Length; a++)
            {
                var l = free[a];
                var len = Land(l, isl[0], out lx[l], out ly[l], out var v);
                cost += LeadCost(l, len);
                longest = Math.Max(longest, len);
                viol += v + RunThroughBodies(l, lx[l], ly[l], runBox, box);
                assign[l] = isl[0];
                _use[0]++;
            }
        }
        else
        {
            var m = 0;
            for (var a = 0; a < free.Length; a++)
            {
                _taken[a] = false;
                for (var k = 0; k < count; k++)
                {
                    var id = a * count + k;
                    var len = Land(free[a], isl[k], out _pairAx[id], out _pairAy[id], out var v);
                    _pairLen[id] = len;
                    _pairViol[id] = v;
                    _pairKey[m] = len + 1000 * v; // an island within reach always beats one out of reach
                    _pairId[m] = id;
                    m++;
                }
            }
            _pairKey.AsSpan(0, m).Sort(_pairId.AsSpan(0, m));
            var placed = 0;
            for (var q = 0; q < m && placed < free.Length; q++)
            {
                var id = _pairId[q];
                var a = id / count;
                var k = id % count;
                if (_taken[a] || _use[k] >= _islands[isl[k]].Capacity) continue;
                _taken[a] = true;
                _use[k]++;
                placed++;
                var l = free[a];
                assign[l] = isl[k];
                (lx[l], ly[l]) = (_pairAx[id], _pairAy[id]);
                cost += LeadCost(l, _pairLen[id]);
                longest = Math.Max(longest, _pairLen[id]);
                viol += _pairViol[id] + RunThroughBodies(l, _pairAx[id], _pairAy[id], runBox, box);
            }
            viol += 5.0 * (free.Length - placed);
            cost += _w.Jumper * JumperLength(isl);
        }
        if (net.Net.Class == NetClass.Rf) cost += _w.RfLongestLead * longest;
        for (var k = 0; k < count; k++)
        {
            var over = _use[k] - _islands[isl[k]].Capacity;
            if (over > 0) viol += 5.0 * over;
        }
    }

    /// <summary>How far a lead's level run, from its exit to above its landing, passes through or too close under other parts' bodies
    /// (the placer's own form of lead-meets-body, on body boxes); also widens the net's run box by the run.</summary>
    private double RunThroughBodies(int l, double ax, double ay, double[] runBox, int box)
    {
        var lead = _leads[l];
        var (ex, ey) = (_exX[l], _exY[l]);
        var r = lead.Diameter / 2 + _slack;
        var (x0, y0, x1, y1) = (Math.Min(ex, ax) - r, Math.Min(ey, ay) - r, Math.Max(ex, ax) + r, Math.Max(ey, ay) + r);
        runBox[box] = Math.Min(runBox[box], x0); runBox[box + 1] = Math.Min(runBox[box + 1], y0);
        runBox[box + 2] = Math.Max(runBox[box + 2], x1); runBox[box + 3] = Math.Max(runBox[box + 3], y1);
        var need = _items[lead.Item].LeadLevel + _p.Rules.LeadGap;
        var v = 0.0;
        _seenStamp++;
        _seen[lead.Item] = _seenStamp;
        for (var c = Col(x0); c <= Col(x1); c++)
            for (var row = Row(y0); row <= Row(y1); row++)
            {
                var cell = _cells[row * _cols + c];
                for (var k = 0; k < cell.Count; k++)
                {
                    var j = cell[k];
                    if (_seen[j] == _seenStamp) continue;
                    _seen[j] = _seenStamp;
                    var item = _items[j];
                    if (!item.KeepsOffPads || item.BodyBottom >= need) continue;
                    v += Geometry.ClippedLength(ex, ey, ax, ay, _bMinX[j] - r, _bMinY[j] - r, _bMaxX[j] + r, _bMaxY[j] + r);
                }
            }
        return v;
    }

    /// <summary>A lead costs more per millimetre the longer it is, so the search evens out long leads instead of trading one long lead for several short ones.</summary>
    private double LeadCost(int l, double len) => len * _w.Lead * _leads[l].Weight * (1 + len / _w.LongLead);

    /// <summary>Length of the shortest tree of straight jumpers joining a net's islands, centre to centre (Prim).</summary>
    private double JumperLength(int[] isl)
    {
        var count = isl.Length;
        for (var k = 0; k < count; k++) { _mstIn[k] = false; _mstDist[k] = double.MaxValue; }
        _mstDist[0] = 0;
        var total = 0.0;
        for (var step = 0; step < count; step++)
        {
            var best = -1;
            for (var k = 0; k < count; k++)
                if (!_mstIn[k] && (best < 0 || _mstDist[k] < _mstDist[best])) best = k;
            _mstIn[best] = true;
            total += _mstDist[best];
            var s = isl[best];
            for (var k = 0; k < count; k++)
            {
                if (_mstIn[k]) continue;
                var t = isl[k];
                var d = Math.Sqrt((_isX[s] - _isX[t]) * (_isX[s] - _isX[t]) + (_isY[s] - _isY[t]) * (_isY[s] - _isY[t]));
                if (d < _mstDist[k]) _mstDist[k] = d;
            }
        }
        return total;
    }

    /// <summary>Costs and violations of one item on its own: board edge, keep-outs, its ground leads, its pull to edges and to the middle.</summary>
    private void EvalUnary(int i, out double cost, out double viol)
    {
        var item = _items[i];
        cost = 0;
        viol = 0;
        ref readonly var r = ref _inside;
        if (item.HasBody) viol += Geometry.OutsideRegion(_bMinX[i], _bMinY[i], _bMaxX[i], _bMaxY[i], in r);
        foreach (var s in item.Islands)
            viol += Geometry.OutsideRegion(_isX[s] - _isHW[s], _isY[s] - _isHH[s], _isX[s] + _isHW[s], _isY[s] + _isHH[s], in r);
        foreach (var l in item.GroundLeads)
        {
            viol += Geometry.OutsideRegion(_gX[l], _gY[l], _gX[l], _gY[l], in r);
            cost += _leads[l].GroundReach[GroundChoice[l]] * _w.GroundLead;
            // Within one part the strips and pins are fixed geometry: no annealing slack, only the rule itself.
            var need = _groundNeed - _slack;
            foreach (var s in item.Islands)
            {
                var d = Geometry.PointToIsland(_gX[l], _gY[l], _islands[s].Round, _isX[s], _isY[s], _isHW[s], _isHH[s]);
                if (d < need) viol += need - d;
            }
        }
        var keepouts = _p.Keepouts;
        for (var k = 0; k < keepouts.Count; k++) viol += KeepoutIntrusion(i, keepouts[k]);
        if (item.IsLanding)
        {
            var edge = Math.Min(Math.Min(X[i] - _inside.MinX, _inside.MaxX - X[i]), Math.Min(Y[i] - _inside.MinY, _inside.MaxY - Y[i]));
            cost += _w.LandingEdge * Math.Max(0, edge);
        }
        if (item.Flow < 0) cost += _w.Flow * (X[i] - _inside.MinX);
        else if (item.Flow > 0) cost += _w.Flow * (_inside.MaxX - X[i]);
        cost += _w.Gravity * (Math.Abs(X[i] - _inside.CentreX) + Math.Abs(Y[i] - _inside.CentreY));
    }

    private double KeepoutIntrusion(int i, Keepout keepout)
    {
        var item = _items[i];
        var v = 0.0;
        const double s = PlacerLimits.Safety;
        switch (keepout)
        {
            case CircleKeepout c:
                var rad = c.Diameter / 2 + s;
                if (item.HasBody)
                {
                    var d = Geometry.PointToBox(c.Center.X, c.Center.Y, (_bMinX[i] + _bMaxX[i]) / 2, (_bMinY[i] + _bMaxY[i]) / 2, (_bMaxX[i] - _bMinX[i]) / 2, (_bMaxY[i] - _bMinY[i]) / 2);
                    if (d < rad) v += rad - d;
                }
                foreach (var sI in item.Islands)
                {
                    var d = Geometry.PointToIsland(c.Center.X, c.Center.Y, _islands[sI].Round, _isX[sI], _isY[sI], _isHW[sI], _isHH[sI]);
                    if (d < rad) v += rad - d;
                }
                foreach (var l in item.GroundLeads)
                {
                    var d = Math.Sqrt((_gX[l] - c.Center.X) * (_gX[l] - c.Center.X) + (_gY[l] - c.Center.Y) * (_gY[l] - c.Center.Y));
                    if (d < rad) v += rad - d;
                }
                break;
            case RectKeepout k:
                var (kx0, ky0, kx1, ky1) = (k.Center.X - k.Width / 2, k.Center.Y - k.Height / 2, k.Center.X + k.Width / 2, k.Center.Y + k.Height / 2);
                if (item.HasBody) v += Geometry.BoxIntrusion(_bMinX[i], _bMinY[i], _bMaxX[i], _bMaxY[i], kx0, ky0, kx1, ky1, s);
                foreach (var sI in item.Islands)
                    v += Geometry.BoxIntrusion(_isX[sI] - _isHW[sI], _isY[sI] - _isHH[sI], _isX[sI] + _isHW[sI], _isY[sI] + _isHH[sI], kx0, ky0, kx1, ky1, s);
                foreach (var l in item.GroundLeads)
                    v += Geometry.BoxIntrusion(_gX[l], _gY[l], _gX[l], _gY[l], kx0, ky0, kx1, ky1, s);
                break;
        }
        return v;
    }

    /// <summary>Violations between two different items: bodies too close, islands closer than the pad gap, ground landings too close to an island.</summary>
    private double Pair(int i, int j)
    {
        PairTests++;
        if (_eMinX[i] > _eMaxX[j] + _cull || _eMinX[j] > _eMaxX[i] + _cull || _eMinY[i] > _eMaxY[j] + _cull || _eMinY[j] > _eMaxY[i] + _cull) return 0;
        var a = _items[i];
        var b = _items[j];
        var v = 0.0;
        if (a.KeepsOffPads) _soft += (a.LiesFlat ? _w.FlatBodyOverPad : _w.UprightBodyOverPad) * BodyOverIslands(i, b);
        if (b.KeepsOffPads) _soft += (b.LiesFlat ? _w.FlatBodyOverPad : _w.UprightBodyOverPad) * BodyOverIslands(j, a);
        if (a.KeepsOffPads) v += LowBodyOverLeads(i, b);
        if (b.KeepsOffPads) v += LowBodyOverLeads(j, a);
        if (a.HasBody && b.HasBody)
            v += Geometry.BoxIntrusion(_bMinX[i], _bMinY[i], _bMaxX[i], _bMaxY[i], _bMinX[j], _bMinY[j], _bMaxX[j], _bMaxY[j], _bodyNeed);
        foreach (var s in a.Islands)
        {
            var sa = _islands[s];
            foreach (var t in b.Islands)
            {
                var d = Geometry.IslandGap(sa.Round, _isX[s], _isY[s], _isHW[s], _isHH[s], _islands[t].Round, _isX[t], _isY[t], _isHW[t], _isHH[t]);
                var need = PadNeed(sa.Net, _islands[t].Net);
                if (d < need) v += need - d;
            }
            foreach (var l in b.GroundLeads)
            {
                var d = Geometry.PointToIsland(_gX[l], _gY[l], sa.Round, _isX[s], _isY[s], _isHW[s], _isHH[s]);
                if (d < _groundNeed) v += _groundNeed - d;
            }
        }
        foreach (var l in a.GroundLeads)
            foreach (var t in b.Islands)
            {
                var d = Geometry.PointToIsland(_gX[l], _gY[l], _islands[t].Round, _isX[t], _isY[t], _isHW[t], _isHH[t]);
                if (d < _groundNeed) v += _groundNeed - d;
            }
        return v;
    }

    /// <summary>How deep a body reaches over another item's islands: allowed, but a body over a pad hides the joint and may rest on it.</summary>
    private double BodyOverIslands(int flat, ProblemItem other)
    {
        var depth = 0.0;
        foreach (var t in other.Islands)
            depth += Geometry.BoxIntrusion(_bMinX[flat], _bMinY[flat], _bMaxX[flat], _bMaxY[flat], _isX[t] - _isHW[t], _isY[t] - _isHH[t], _isX[t] + _isHW[t], _isY[t] + _isHH[t], 0);
        return depth;
    }

    /// <summary>How deep a body reaches over another item's islands and ground landings that leads come down onto, where the body sits too low to clear those leads by the lead gap.</summary>
    private double LowBodyOverLeads(int body, ProblemItem other)
    {
        var bottom = _items[body].BodyBottom;
        var depth = 0.0;
        foreach (var t in other.Islands)
            if (bottom < _islands[t].Clearance)
                depth += Geometry.BoxIntrusion(_bMinX[body], _bMinY[body], _bMaxX[body], _bMaxY[body], _isX[t] - _isHW[t], _isY[t] - _isHH[t], _isX[t] + _isHW[t], _isY[t] + _isHH[t], _slack);
        if (bottom < other.LeadLevel + _p.Rules.LeadGap)
            foreach (var l in other.GroundLeads)
            {
                // The ground lead's level run from its exit to above its landing, then its drop onto the plane.
                var r = _leads[l].Diameter / 2 + _slack;
                depth += Geometry.ClippedLength(_exX[l], _exY[l], _gX[l], _gY[l], _bMinX[body] - r, _bMinY[body] - r, _bMaxX[body] + r, _bMaxY[body] + r);
                depth += Geometry.BoxIntrusion(_bMinX[body], _bMinY[body], _bMaxX[body], _bMaxY[body], _gX[l] - r, _gY[l] - r, _gX[l] + r, _gY[l] + r, 0);
            }
        return depth;
    }

    /// <summary>Pair violations between item a (and b, when two move together) and every other item.</summary>
    private double PairsOf(int a, int b)
    {
        var v = PairsNear(a, b);
        if (b >= 0) v += PairsNear(b, a) + Pair(a, b);
        return v;
    }

    /// <summary>All violations an item takes part in: its own, its pairs, and the reach problems of its nets.</summary>
    public double ViolationOf(int i)
    {
        EvalUnary(i, out _, out var v);
        v += PairsOf(i, -1) + CrossingOf(i);
        foreach (var n in _items[i].Nets) v += _netViol[n];
        return v;
    }
}
