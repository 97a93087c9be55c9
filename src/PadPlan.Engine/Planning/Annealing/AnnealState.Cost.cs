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

    /// <summary>Lead length to an island for one lead, with its landing point (on the island's bare copper) and any broken reach limit.</summary>
    public double Land(int l, int s, out double ax, out double ay, out double violation) => Land(l, s, out ax, out ay, out violation, out _);

    /// <param name="blocked">How far the run passes under the body of the part whose strip segment it lands on, when no way onto
    /// that segment clears the body (mm; 0 otherwise). The run term charges it; the choice of islands reads it, so a lead from
    /// beyond an IC takes another island of its net when there is one.</param>
    private double Land(int l, int s, out double ax, out double ay, out double violation, out double blocked)
    {
        var lead = _leads[l];
        var island = _islands[s];
        LandingsFound++;
        blocked = 0;
        var len = Landing.Find(_exX[l], _exY[l], _ouX[l], _ouY[l], island.Round, _laX[s], _laY[s], _laHW[s], _laHH[s],
            lead.Diameter + 2 * _slack, lead.MinReach, lead.MaxReach - _slack, out ax, out ay, out violation);
        return island.Covered ? PastOwnBody(l, s, len, ref ax, ref ay, ref violation, out blocked) : len;
    }

    /// <summary>
    /// A lead landing on a strip segment beside its own part's body comes in past that body: when the run to the nearest
    /// point would graze the body (its corner, mostly), the nearest corner of the bare copper whose run clears it is taken
    /// instead, if there is one; if none, the landing stays and <paramref name="blocked"/> says how far the run passes under.
    /// </summary>
    private double PastOwnBody(int l, int s, double len, ref double ax, ref double ay, ref double violation, out double blocked)
    {
        blocked = 0;
        var j = _islands[s].Item;
        var lead = _leads[l];
        if (!_lowBody[j] || _items[j].BodyBottom >= _runNeed[l]) return len;
        // with the annealing's slack whatever the slack now, so the legaliser and the polish land the lead where the annealing did
        var r = lead.Diameter / 2 + PlacerLimits.AnnealSlack;
        var (x0, y0, x1, y1) = (_bMinX[j] - r, _bMinY[j] - r, _bMaxX[j] + r, _bMaxY[j] + r);
        var (ex, ey) = (_exX[l], _exY[l]);
        if (Geometry.ClippedLength(ex, ey, ax, ay, x0, y0, x1, y1) <= 0) return len;
        var inset = r + PlacerLimits.Safety;
        var (rw, rh) = (Math.Max(0, _laHW[s] - inset), Math.Max(0, _laHH[s] - inset));
        var best = double.MaxValue;
        var (bx, by) = (ax, ay);
        for (var k = 0; k < 4; k++)
        {
            var (cx, cy) = (_laX[s] + ((k & 1) == 0 ? -rw : rw), _laY[s] + ((k & 2) == 0 ? -rh : rh));
            var d = Math.Sqrt((cx - ex) * (cx - ex) + (cy - ey) * (cy - ey));
            if (d < best && Geometry.ClippedLength(ex, ey, cx, cy, x0, y0, x1, y1) <= 0) (best, bx, by) = (d, cx, cy);
        }
        if (best == double.MaxValue)
        {
            blocked = Geometry.ClippedLength(ex, ey, ax, ay, x0, y0, x1, y1);
            return len;
        }
        (ax, ay) = (bx, by);
        violation = Landing.ReachViolation(best, lead.MinReach, lead.MaxReach - _slack);
        return best;
    }

    /// <summary>Cost of one net: weighted lead lengths to the islands they are given (nearest first, within capacity) and the jumpers joining its islands.</summary>
    private void EvalNet(int n, int[] assign, double[] lx, double[] ly, out double cost, out double viol)
    {
        var net = _nets[n];
        var isl = net.Islands;
        var count = isl.Length;
        NetEvaluations++;
        cost = 0;
        viol = 0;
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
                viol += v;
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
                    var len = Land(free[a], isl[k], out _pairAx[id], out _pairAy[id], out var v, out var blocked);
                    _pairLen[id] = len;
                    _pairViol[id] = v;
                    // an island within reach always beats one out of reach, and a segment whose run passes under its own part's body
                    _pairKey[m] = len + 1000 * (v + blocked);
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
                viol += _pairViol[id];
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
            total += Math.Sqrt(_mstDist[best]);
            var s = isl[best];
            var (sx, sy) = (_isX[s], _isY[s]);
            for (var k = 0; k < count; k++)
            {
                if (_mstIn[k]) continue;
                var t = isl[k];
                var d = (sx - _isX[t]) * (sx - _isX[t]) + (sy - _isY[t]) * (sy - _isY[t]); // squared: the same tree, one root per edge taken
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

    /// <summary>Pair violations between item a (and b, when two move together) and every other item.</summary>
    private double PairsOf(int a, int b)
    {
        var v = PairsNear(a, b);
        if (b >= 0) v += PairsNear(b, a) + Pair(a, b);
        return v;
    }

    /// <summary>All violations an item takes part in: its own, its pairs, its leads' crossings and runs under bodies, and the reach problems of its nets.</summary>
    public double ViolationOf(int i)
    {
        EvalUnary(i, out _, out var v);
        v += PairsOf(i, -1) + CrossingOf(i) + RunsOf(i);
        foreach (var n in _items[i].Nets) v += _netViol[n];
        return v;
    }
}
