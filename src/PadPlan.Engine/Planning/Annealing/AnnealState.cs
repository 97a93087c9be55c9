using PadPlan.Model.Standards;
namespace PadPlan.Planning;

/// <summary>The mutable working layout of one annealing run: item positions and turns, cached board geometry, and the cost split into a soft part (lead and jumper length, area, flow) and a hard part (rule violations in mm).</summary>
/// <remarks>Costs are kept incrementally per net and per item; pair violations are found by scanning. <see cref="Recompute"/> rebuilds everything from scratch to stop drift.</remarks>
internal sealed partial class AnnealState
{
    private readonly PlacementProblem _p;
    private readonly ProblemItem[] _items;
    private readonly ProblemIsland[] _islands;
    private readonly ProblemLead[] _leads;
    private readonly ProblemNet[] _nets;
    private readonly CostWeights _w;
    private double _padNeed, _groundNeed, _bodyNeed, _slack, _cull;
    // Extra spacing (mm, beyond the pad gap) that IPC-2221 Table 6-1 (B2) asks between islands of two nets; null when no net has a voltage.
    private readonly double[,]? _hvExtra;
    private Region _inside;

    public readonly double[] X, Y;
    public readonly int[] Rot;
    public readonly int[] GroundChoice;

    // board geometry of the current positions
    private readonly double[] _isX, _isY, _isHW, _isHH;
    // where leads from other items land on each island (its bare copper)
    private readonly double[] _laX, _laY, _laHW, _laHH;
    private readonly double[] _bMinX, _bMinY, _bMaxX, _bMaxY;
    private readonly double[] _eMinX, _eMinY, _eMaxX, _eMaxY;
    private readonly double[] _exX, _exY, _ouX, _ouY, _gX, _gY;

    private readonly double[] _netCost, _netViol, _unaryCost, _unaryViol;
    private readonly int[] _leadIsland;

    public PlacementProblem Problem => _p;
    public double Cost { get; private set; }
    public double Violation { get; private set; }
    /// <summary>Weight of violations in the annealing cost.</summary>
    public double Penalty { get; set; }
    public double Total => Cost + Penalty * Violation;

    /// <summary>Extra room (mm) demanded on every gap and reach while annealing, so that the finished layout keeps the exact rules with a little to spare. Set it to 0 for the final check; call <see cref="Recompute"/> after changing it.</summary>
    public double Slack
    {
        get => _slack;
        set
        {
            _slack = value;
            _padNeed = _p.Rules.PadGap + PlacerLimits.Safety + value;
            _groundNeed = _p.Rules.GroundGap + PlacerLimits.Safety + value;
            _bodyNeed = PlacerLimits.BodyGap + value;
            _cull = Math.Max(Math.Max(_padNeed + MaxHvExtra(), _groundNeed), _bodyNeed) + 0.01;
            var r = _p.Region;
            var inset = PlacerLimits.Safety + value;
            _inside = new Region(r.MinX + inset, r.MinY + inset, r.MaxX - inset, r.MaxY - inset);
        }
    }

    public AnnealState(PlacementProblem problem)
    {
        _p = problem;
        _items = problem.Items;
        _islands = problem.Islands;
        _leads = problem.Leads;
        _nets = problem.Nets;
        _w = problem.Weights;
        _hvExtra = HvExtra(problem);
        Slack = 0;
        var n = _items.Length;
        X = new double[n]; Y = new double[n]; Rot = new int[n];
        GroundChoice = new int[_leads.Length];
        _isX = new double[_islands.Length]; _isY = new double[_islands.Length]; _isHW = new double[_islands.Length]; _isHH = new double[_islands.Length];
        _laX = new double[_islands.Length]; _laY = new double[_islands.Length]; _laHW = new double[_islands.Length]; _laHH = new double[_islands.Length];
        _bMinX = new double[n]; _bMinY = new double[n]; _bMaxX = new double[n]; _bMaxY = new double[n];
        _eMinX = new double[n]; _eMinY = new double[n]; _eMaxX = new double[n]; _eMaxY = new double[n];
        _exX = new double[_leads.Length]; _exY = new double[_leads.Length]; _ouX = new double[_leads.Length]; _ouY = new double[_leads.Length];
        _gX = new double[_leads.Length]; _gY = new double[_leads.Length];
        _netCost = new double[_nets.Length]; _netViol = new double[_nets.Length];
        _unaryCost = new double[n]; _unaryViol = new double[n];
        _leadIsland = new int[_leads.Length];
        Array.Fill(_leadIsland, -1);
        _broken = new int[_nets.Length];
        _brokenAt = new int[_nets.Length];
        Array.Fill(_brokenAt, -1);
        _crowded = new int[n];
        _crowdedStamp = new int[n];
        _netCostNew = new double[_nets.Length]; _netViolNew = new double[_nets.Length];
        _leadIslandNew = new int[_leads.Length];
        _netStamp = new int[_nets.Length];
        _affected = new int[_nets.Length];
        var maxPairs = 1;
        foreach (var net in _nets) maxPairs = Math.Max(maxPairs, net.FreeLeads.Length * Math.Max(1, net.Islands.Length));
        _pairKey = new double[maxPairs]; _pairId = new int[maxPairs]; _pairLen = new double[maxPairs]; _pairViol = new double[maxPairs];
        _pairAx = new double[maxPairs]; _pairAy = new double[maxPairs];
        var maxIslands = _nets.Select(x => x.Islands.Length).DefaultIfEmpty(1).Max() + 1;
        _use = new int[maxIslands];
        _mstDist = new double[maxIslands];
        _mstIn = new bool[maxIslands];
        _taken = new bool[_nets.Select(x => x.FreeLeads.Length).DefaultIfEmpty(1).Max() + 1];
        BuildGrid();
        BuildCrossing();
        BuildRuns();
        for (var i = 0; i < n; i++)
        {
            var item = _items[i];
            if (!item.Fixed) continue;
            (X[i], Y[i], Rot[i]) = (item.StartX, item.StartY, item.StartRot);
            foreach (var l in item.GroundLeads) GroundChoice[l] = _leads[l].StartChoice;
        }
    }

    /// <summary>The island each lead lands on (for leads on nets), as last evaluated.</summary>
    public int IslandOf(int lead) => _leads[lead].OwnIsland >= 0 ? _leads[lead].OwnIsland : _leadIsland[lead];

    public (double X, double Y) Exit(int lead) => (_exX[lead], _exY[lead]);
    public (double X, double Y) Outward(int lead) => (_ouX[lead], _ouY[lead]);
    public (double X, double Y) GroundPoint(int lead) => (_gX[lead], _gY[lead]);
    public (double X, double Y, double HalfW, double HalfH) IslandBox(int island) => (_isX[island], _isY[island], _isHW[island], _isHH[island]);
    /// <summary>The middle of the copper leads from elsewhere land on (an island's bare copper).</summary>
    public (double X, double Y) LandCentre(int island) => (_laX[island], _laY[island]);

    /// <summary>Extent of everything placed: bodies, islands and ground landings.</summary>
    public Region Extent()
    {
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        for (var i = 0; i < _items.Length; i++)
        {
            minX = Math.Min(minX, _eMinX[i]); minY = Math.Min(minY, _eMinY[i]);
            maxX = Math.Max(maxX, _eMaxX[i]); maxY = Math.Max(maxY, _eMaxY[i]);
        }
        return new Region(minX, minY, maxX, maxY);
    }

    /// <summary>Copies positions, turns and ground choices from another state of the same problem.</summary>
    public void CopyFrom(AnnealState other)
    {
        Array.Copy(other.X, X, X.Length);
        Array.Copy(other.Y, Y, Y.Length);
        Array.Copy(other.Rot, Rot, Rot.Length);
        Array.Copy(other.GroundChoice, GroundChoice, GroundChoice.Length);
        Recompute();
    }

    /// <summary>Rebuilds all cached geometry and costs from the positions.</summary>
    public void Recompute()
    {
        for (var i = 0; i < _items.Length; i++) UpdateGeometry(i);
        double cost = 0, viol = 0;
        _soft = 0;
        _recount++;
        _crowdedCount = 0;
        for (var n = 0; n < _nets.Length; n++)
        {
            EvalNet(n, _leadIsland, _lx, _ly, out _netCost[n], out _netViol[n]);
            MarkNet(n);
            cost += _netCost[n];
            viol += _netViol[n];
        }
        _crossViolation = RecomputeCrossing();
        _runViolation = RecomputeRuns();
        viol += _crossViolation;
        viol += _runViolation;
        for (var i = 0; i < _items.Length; i++)
        {
            EvalUnary(i, out _unaryCost[i], out _unaryViol[i]);
            cost += _unaryCost[i];
            viol += _unaryViol[i];
            for (var j = i + 1; j < _items.Length; j++)
            {
                var v = Pair(i, j);
                if (v <= 0) continue;
                viol += v;
                MarkCrowded(i);
                MarkCrowded(j);
            }
        }
        Cost = cost + _soft;
        Violation = viol;
    }

    /// <summary>Refreshes the board geometry of one item from its position and turn.</summary>
    private void UpdateGeometry(int i)
    {
        var item = _items[i];
        var x = X[i];
        var y = Y[i];
        var rot = Rot[i];
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        if (item.HasBody)
        {
            var (ax, ay) = Geometry.Rotate(rot, item.BodyMinX, item.BodyMinY);
            var (bx, by) = Geometry.Rotate(rot, item.BodyMaxX, item.BodyMaxY);
            _bMinX[i] = x + Math.Min(ax, bx); _bMaxX[i] = x + Math.Max(ax, bx);
            _bMinY[i] = y + Math.Min(ay, by); _bMaxY[i] = y + Math.Max(ay, by);
            minX = _bMinX[i]; minY = _bMinY[i]; maxX = _bMaxX[i]; maxY = _bMaxY[i];
        }
        foreach (var l in item.Leads)
        {
            var lead = _leads[l];
            var (ex, ey) = Geometry.Rotate(rot, lead.ExitX, lead.ExitY);
            _exX[l] = x + ex; _exY[l] = y + ey;
            (_ouX[l], _ouY[l]) = Geometry.Rotate(rot, lead.OutX, lead.OutY);
        }
        foreach (var l in item.GroundLeads)
        {
            var lead = _leads[l];
            var c = GroundChoice[l];
            var (gx, gy) = Geometry.Rotate(rot, lead.GroundX[c], lead.GroundY[c]);
            _gX[l] = x + gx; _gY[l] = y + gy;
            minX = Math.Min(minX, _gX[l]); maxX = Math.Max(maxX, _gX[l]);
            minY = Math.Min(minY, _gY[l]); maxY = Math.Max(maxY, _gY[l]);
        }
        var turned = item.IsPart ? (rot & 1) == 1 : item.CanTurn && rot == 1;
        foreach (var s in item.Islands)
        {
            var island = _islands[s];
            var (lx, ly) = item.IsPart ? Geometry.Rotate(rot, island.LocalX, island.LocalY) : (island.LocalX, island.LocalY);
            _isX[s] = x + lx; _isY[s] = y + ly;
            (_isHW[s], _isHH[s]) = turned ? (island.HalfH, island.HalfW) : (island.HalfW, island.HalfH);
            var (ax, ay) = item.IsPart ? Geometry.Rotate(rot, island.LandX, island.LandY) : (island.LandX, island.LandY);
            _laX[s] = x + ax; _laY[s] = y + ay;
            (_laHW[s], _laHH[s]) = turned ? (island.LandHalfH, island.LandHalfW) : (island.LandHalfW, island.LandHalfH);
            minX = Math.Min(minX, _isX[s] - _isHW[s]); maxX = Math.Max(maxX, _isX[s] + _isHW[s]);
            minY = Math.Min(minY, _isY[s] - _isHH[s]); maxY = Math.Max(maxY, _isY[s] + _isHH[s]);
        }
        _eMinX[i] = minX; _eMinY[i] = minY; _eMaxX[i] = maxX; _eMaxY[i] = maxY;
        Register(i);
    }

    /// <summary>Per pair of nets, how much more than the pad gap IPC-2221 Table 6-1 (B2) asks for the voltage between them.</summary>
    private static double[,]? HvExtra(PlacementProblem problem)
    {
        var nets = problem.Nets;
        if (!nets.Any(n => n.Net.Voltage is not null)) return null;
        var extra = new double[nets.Length, nets.Length];
        for (var a = 0; a < nets.Length; a++)
            for (var b = 0; b < nets.Length; b++)
                if (a != b)
                    extra[a, b] = Math.Max(0, ConductorSpacing.B2(ConductorSpacing.Between(nets[a].Net.Voltage, nets[b].Net.Voltage)) - problem.Rules.PadGap);
        return extra;
    }

    private double MaxHvExtra()
    {
        if (_hvExtra is null) return 0;
        var max = 0.0;
        foreach (var e in _hvExtra) max = Math.Max(max, e);
        return max;
    }

    /// <summary>The edge-to-edge gap two islands need: the pad gap, or more between nets at high voltage.</summary>
    private double PadNeed(int netA, int netB) =>
        _hvExtra is null || netA < 0 || netB < 0 ? _padNeed : _padNeed + _hvExtra[netA, netB];
}
