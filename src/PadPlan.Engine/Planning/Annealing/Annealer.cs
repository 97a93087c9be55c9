namespace PadPlan.Planning;

/// <summary>One simulated-annealing run (Kirkpatrick, Gelatt and Vecchi, 1983) over part positions, turns, pad positions and ground landings, cooled by <see cref="AnnealSchedule"/>.</summary>
internal sealed class Annealer
{
    private readonly AnnealState _s;
    private readonly PlacerRandom _rng;
    private readonly int[] _parts, _pads, _grounded;
    private readonly MoveKind[] _kinds;
    private readonly double[] _cumulative;

    public MoveStats Stats { get; } = new();

    public Annealer(AnnealState state, long seed)
    {
        _s = state;
        _rng = new PlacerRandom(seed);
        var items = state.Problem.Items;
        _parts = [.. items.Where(i => !i.Fixed && i.IsPart).Select(i => i.Index)];
        _pads = [.. items.Where(i => !i.Fixed && !i.IsPart).Select(i => i.Index)];
        // A held part keeps its place, but where its ground leads meet the plane may still change: the annealer keeps them off the
        // new pads around it (a swap or --keep-existing). With nothing held this is the parts' own list, so layouts stay the same.
        _grounded = [.. items.Where(i => i.IsPart && i.GroundLeads.Length > 0).Select(i => i.Index)];
        var table = new List<(MoveKind, double)>();
        if (_parts.Length > 0) table.AddRange([(MoveKind.ShiftPart, 0.3), (MoveKind.TurnPart, 0.08), (MoveKind.PartToPads, 0.1)]);
        if (_parts.Length > 1) table.Add((MoveKind.SwapParts, 0.07));
        if (_pads.Length > 0) table.AddRange([(MoveKind.ShiftPad, 0.3), (MoveKind.PadToLeads, 0.1)]);
        if (_grounded.Length > 0) table.Add((MoveKind.GroundLanding, 0.1));
        if (_parts.Length > 0 || _pads.Length > 0) table.AddRange([(MoveKind.MendReach, PlacerLimits.MendShare), (MoveKind.MendCrowding, PlacerLimits.MendShare / 2)]);
        _kinds = [.. table.Select(t => t.Item1)];
        var sum = table.Sum(t => t.Item2);
        var run = 0.0;
        _cumulative = [.. table.Select(t => run += t.Item2 / sum)];
    }

    public bool HasMoves => _kinds.Length > 0;

    /// <summary>Cell size (mm) of the spring start's spread, 0 after a scatter: the annealing then starts cool and close by.</summary>
    private double _startCell;

    /// <summary>Places the items as <paramref name="start"/> says; a mixed start takes the spring start on even runs and a scatter on odd ones on a small circuit, the spring start on every run of a larger one (where a scatter seldom legalises; docs/benchmarks.md).</summary>
    public void Start(StartKind start, int run)
    {
        if (Scatters(start, run, _s.Problem.Project.Parts.Count)) Scatter();
        else SpringStart();
    }

    /// <summary>Whether run <paramref name="run"/> of a circuit of <paramref name="parts"/> parts starts from a scatter (see <see cref="Start"/>).</summary>
    public static bool Scatters(StartKind start, int run, int parts) =>
        start == StartKind.Scatter || (start == StartKind.Mixed && run % 2 == 1 && parts <= PlacerSettings.SmallCircuit);

    /// <summary>An analytic start: parts where their springs (nets) pull them, spread over the region in that order; pads then at their nets' leads.</summary>
    public void SpringStart()
    {
        _startCell = SpringLayout.Place(_s, _parts, _rng);
        PadsToLeads();
    }

    /// <summary>
    /// Starts from a finished layout (the best of the runs so far) to anneal it again cool and close by, as after the spring
    /// start: at one standard deviation of the cost change of moves within half a cell, with a move range of two cells (a cell
    /// being the spring start's share of area per part), so neighbours can trade places and the layout can leave its local minimum.
    /// </summary>
    public void Resume(AnnealState from)
    {
        _s.CopyFrom(from);
        var p = _s.Problem;
        _startCell = Math.Sqrt(PlacerLimits.SpringSpreadArea * p.RawArea / Math.Max(1, _parts.Length));
    }

    /// <summary>Movable items scattered over the region; pads then sent to the middle of their nets' leads.</summary>
    public void Scatter()
    {
        _startCell = 0;
        var r = _s.Problem.Region;
        foreach (var i in _parts)
        {
            _s.X[i] = _rng.Between(r.MinX, r.MaxX);
            _s.Y[i] = _rng.Between(r.MinY, r.MaxY);
            _s.Rot[i] = _rng.Next(4);
        }
        PadsToLeads();
    }

    private void PadsToLeads()
    {
        var r = _s.Problem.Region;
        _s.Recompute();
        foreach (var i in _pads)
        {
            var (x, y) = LeadCentre(i);
            _s.X[i] = Math.Clamp(x + _rng.Between(-2, 2), r.MinX, r.MaxX);
            _s.Y[i] = Math.Clamp(y + _rng.Between(-2, 2), r.MinY, r.MaxY);
        }
        _s.Recompute();
    }

    /// <summary>Anneals until the schedule says the run has converged, then quenches; reports after every temperature.</summary>
    public void Run(double movesFactor, Action<int, double, double>? report)
    {
        if (!HasMoves) return;
        var w = _s.Problem.Weights;
        _s.Penalty = w.PenaltyStart;
        _s.Slack = PlacerLimits.AnnealSlack;
        _s.Recompute();
        var perTemperature = MovesPerTemperature(movesFactor);
        var region = _s.Problem.Region;
        var maxRange = Math.Max(region.Width, region.Height);
        // From a spring start, anneal cool and close by, so the start's order survives; from a scatter, hot and far (VPR).
        var startRange = _startCell > 0 ? PlacerLimits.SpringStartRangeCells * _startCell : maxRange;
        var start = _startCell > 0
            ? PlacerLimits.SpringStartSigmas * CostChangeSpread(perTemperature, PlacerLimits.SpringProbeCells * _startCell, softOnly: true)
            : PlacerLimits.StartTemperatureSigmas * CostChangeSpread(perTemperature, startRange, softOnly: false);
        var steady = _s.Problem.Project.Parts.Count <= PlacerSettings.SteadyCircuit;
        var schedule = new AnnealSchedule(start, maxRange, startRange, steady ? PlacerLimits.SteadyCooling : PlacerLimits.MiddleCooling);
        var nets = Math.Max(1, _s.Problem.Nets.Length + _grounded.Length);
        while (!schedule.Done(_s.Cost, _s.Violation, nets))
        {
            var kept = Moves(perTemperature, schedule.Temperature, schedule.Range);
            _s.Recompute();
            schedule.Update((double)kept / perTemperature, _s.Total);
            _s.Penalty = Math.Min(w.PenaltyEnd, _s.Penalty * w.PenaltyGrowth);
            report?.Invoke(schedule.Step, _s.Total, _s.Violation);
        }
        Stats.Temperatures = schedule.Step;
        _lastTemperature = schedule.Temperature;
        // Clean-up: while rules are still broken, keep the last temperature and double the penalty, so the layout can
        // still climb out of the last overlaps instead of freezing with them.
        for (var extra = 0; extra < PlacerLimits.CleanupSteps && _s.Violation > 1e-9; extra++)
        {
            _s.Penalty = Math.Min(w.PenaltyEnd * 64, _s.Penalty * 2);
            Moves(perTemperature, schedule.Temperature, Math.Max(schedule.Range, 2.0));
            _s.Recompute();
            report?.Invoke(schedule.Step + extra + 1, _s.Total, _s.Violation);
        }
        _s.Penalty = Math.Max(_s.Penalty, w.PenaltyEnd);
        _s.Recompute();
        Moves(2 * perTemperature, 0, PlacerLimits.MinRange * 2);
        _s.Recompute();
        TryHalfTurn();
    }

    /// <summary>
    /// Turns the whole layout half round about the middle of the region when that is cheaper. Every gap, reach and overlap stays
    /// the same, only the pulls to the edges change; annealing cannot find this by itself, as it would have to move every
    /// item at once (an input that ended up on the right stays there).
    /// </summary>
    private void TryHalfTurn()
    {
        var p = _s.Problem;
        if (p.Items.Any(i => i.Fixed)) return;
        var r = p.Region;
        var before = _s.Total;
        void Turn()
        {
            for (var i = 0; i < p.Items.Length; i++)
            {
                _s.X[i] = r.MinX + r.MaxX - _s.X[i];
                _s.Y[i] = r.MinY + r.MaxY - _s.Y[i];
                if (p.Items[i].IsPart) _s.Rot[i] = (_s.Rot[i] + 2) & 3;
            }
            _s.Recompute();
        }
        Turn();
        if (_s.Total < before - 1e-9) return;
        Turn();
    }

    /// <summary>VPR's moves per temperature, N^(4/3) for N movable items, scaled by the effort; a small floor for tiny boards.</summary>
    public int MovesPerTemperature(double movesFactor) =>
        (int)Math.Max(PlacerLimits.MinMovesPerTemperature * movesFactor, movesFactor * Math.Pow(_parts.Length + _pads.Length, 4.0 / 3.0));

    /// <summary>The inner loop: trial moves at one temperature. Returns how many were kept; counts the bytes it allocated (it must be none).</summary>
    private int Moves(int count, double temperature, double range)
    {
        var before = GC.GetAllocatedBytesForCurrentThread();
        var kept = 0;
        for (var k = 0; k < count; k++)
            if (TryMove(temperature, range)) kept++;
        Stats.InnerLoopBytes += GC.GetAllocatedBytesForCurrentThread() - before;
        Stats.InnerLoopMoves += count;
        return kept;
    }

    private double _lastTemperature;

    /// <summary>
    /// For a run the legaliser left a little short, from the legaliser's layout. The first time: greedy moves with no slack
    /// and the legaliser's penalty, which clear a lead a few hundredths too near another where every neighbour already
    /// touches its limit (a nudge of one item breaks another rule; two small moves in turn do not). Later times: a few steps
    /// at a tenth of the final temperature with the annealing's slack and clean-up penalty, for crossed leads that only
    /// a pad or part trading places, or a part turned half round, undo. Either is far cheaper than a new run on a larger region.
    /// </summary>
    public void Rework(double movesFactor, int attempt)
    {
        if (!HasMoves) return;
        var greedy = attempt == 0;
        _s.Slack = greedy ? 0 : PlacerLimits.AnnealSlack;
        _s.Penalty = greedy ? Legaliser.Penalty : _s.Problem.Weights.PenaltyEnd * 64;
        _s.Recompute();
        var perTemperature = MovesPerTemperature(movesFactor);
        var temperature = greedy ? 0 : _lastTemperature * PlacerLimits.ReworkCooling;
        for (var step = 0; step < PlacerLimits.ReworkSteps && _s.Violation > 1e-9; step++)
        {
            Moves(perTemperature, temperature, greedy ? 1.0 : 2.0);
            _s.Recompute();
        }
        Moves(perTemperature, 0, PlacerLimits.MinRange * 2);
        _s.Recompute();
    }

    /// <summary>After legalising: greedy moves with no slack and a prohibitive penalty, so leads shrink into the room the annealing slack kept free while no rule may break.</summary>
    public void Polish(double movesFactor)
    {
        if (!HasMoves) return;
        BeginGreedy();
        Moves(GreedyMoves(2, movesFactor), 0, 1.0);
        _s.Recompute();
    }

    /// <summary>No slack and a prohibitive penalty: from here on no kept move breaks a rule.</summary>
    private void BeginGreedy()
    {
        _s.Slack = 0;
        _s.Penalty = PlacerLimits.ProhibitivePenalty;
        _s.Recompute();
    }

    /// <summary>Moves of one greedy pass: <paramref name="perUnit"/> N^(4/3) per unit of the effort's move factor, at least <see cref="PlacerLimits.GreedyMinMoves"/>.</summary>
    private int GreedyMoves(double perUnit, double movesFactor) =>
        (int)Math.Max(PlacerLimits.GreedyMinMoves, perUnit * movesFactor * Math.Pow(_parts.Length + _pads.Length, 4.0 / 3.0));

    /// <summary>
    /// Greedy descent of a legal layout to a local minimum: rounds of zero-temperature moves with no slack and a prohibitive
    /// penalty, at move ranges shrinking from <see cref="PlacerLimits.DescentRanges"/>' first to its last, repeated until a
    /// whole round gains less than <see cref="PlacerLimits.DescentGain"/> of the cost. The annealing ends with a short
    /// quench, the polish with one more; both leave room a longer descent still takes (docs/benchmarks.md, "The final descent").
    /// </summary>
    /// <returns>The moves it tried.</returns>
    public long Descend(double movesFactor)
    {
        if (!HasMoves) return 0;
        var before = Stats.TotalTried;
        BeginGreedy();
        var count = GreedyMoves(PlacerLimits.DescentMoves, movesFactor);
        for (var round = 0; round < PlacerLimits.DescentRounds; round++)
        {
            var start = _s.Total;
            foreach (var range in PlacerLimits.DescentRanges)
            {
                Moves(count, 0, range);
                _s.Recompute();
            }
            if (start - _s.Total < PlacerLimits.DescentGain * Math.Abs(start)) break;
        }
        return Stats.TotalTried - before;
    }

    /// <summary>VPR's start: the spread (standard deviation) of the cost changes of random trial moves within a range.</summary>
    /// <param name="softOnly">Leave the violation penalty out: a start that already has good order should not be shaken up by the cost of small overlaps, which downhill moves clear anyway.</param>
    private double CostChangeSpread(int samples, double range, bool softOnly)
    {
        double sum = 0, sumSq = 0;
        var n = Math.Min(samples, 2000);
        for (var k = 0; k < n; k++)
        {
            var d = Propose(range, out _);
            if (softOnly) d = _s.DeltaCost;
            sum += d;
            sumSq += d * d;
            _s.Rollback();
        }
        var mean = sum / n;
        var sigma = Math.Sqrt(Math.Max(0, sumSq / n - mean * mean));
        return Math.Max(1e-4, sigma);
    }

    /// <summary>
    /// One trial move, kept by Metropolis' rule. The move is measured in stages, cheapest first; a stage that bounds the
    /// move's cost change above the draw's threshold rolls it back without the rest (<see cref="AnnealState.EvaluateNets"/>).
    /// The draw is the one the whole move would have made, and each bound is below the whole change, so every decision, and
    /// so every layout, is the same as measuring every move whole.
    /// </summary>
    private bool TryMove(double temperature, double range)
    {
        var kind = Open(range);
        var draw = double.NaN;
        var keep = Passes(_s.EvaluateNets(), temperature, ref draw)
            && Passes(_s.EvaluatePairs(), temperature, ref draw)
            && Passes(_s.EvaluateRunsStage(), temperature, ref draw);
        if (keep)
        {
            _s.EvaluateCrossings();
            keep = Passes(_s.DeltaCost + _s.Penalty * _s.DeltaViolation, temperature, ref draw);
        }
        if (keep) _s.Commit();
        else _s.Rollback();
        Stats.Count(kind, keep);
        return keep;
    }

    /// <summary>Metropolis' rule for a cost change d (or a lower bound of it): downhill always; uphill with chance exp(-d / T), drawn once per move, the first time it is needed.</summary>
    private bool Passes(double d, double temperature, ref double draw)
    {
        if (d <= 0) return true;
        if (temperature <= 0) return false;
        if (double.IsNaN(draw)) draw = _rng.NextDouble();
        return draw < Math.Exp(-d / temperature);
    }

    /// <summary>Makes one random move and returns its change of annealing cost; the move stays open for commit or rollback.</summary>
    private double Propose(double range, out MoveKind kind)
    {
        kind = Open(range);
        _s.Evaluate();
        return _s.DeltaCost + _s.Penalty * _s.DeltaViolation;
    }

    /// <summary>Opens one random move (positions set, not yet evaluated) and returns its kind.</summary>
    private MoveKind Open(double range)
    {
        var pick = _rng.NextDouble();
        var k = 0;
        while (k < _cumulative.Length - 1 && pick >= _cumulative[k]) k++;
        var kind = _kinds[k];
        var r = _s.Problem.Region;
        if (kind is MoveKind.MendReach or MoveKind.MendCrowding)
        {
            if (kind == MoveKind.MendReach ? MendReach(range, r) : MendCrowding(range, r)) return kind;
            kind = _parts.Length > 0 ? MoveKind.ShiftPart : MoveKind.ShiftPad;
        }
        switch (kind)
        {
            case MoveKind.ShiftPart:
            case MoveKind.ShiftPad:
            {
                var pool = kind == MoveKind.ShiftPart ? _parts : _pads;
                Shift(pool[_rng.Next(pool.Length)], range, 0.15, 0.2, r);
                break;
            }
            case MoveKind.TurnPart:
            {
                var i = _parts[_rng.Next(_parts.Length)];
                _s.Begin(i);
                _s.Rot[i] = (_s.Rot[i] + 1 + _rng.Next(3)) & 3;
                break;
            }
            case MoveKind.PadToLeads:
            {
                var i = _pads[_rng.Next(_pads.Length)];
                JumpNear(i, LeadCentre(i), range, r);
                break;
            }
            case MoveKind.PartToPads:
            {
                var i = _parts[_rng.Next(_parts.Length)];
                JumpNear(i, PadCentre(i), range, r);
                break;
            }
            case MoveKind.SwapParts:
            {
                var ia = _rng.Next(_parts.Length);
                var ib = _rng.Next(_parts.Length - 1);
                if (ib >= ia) ib++;
                _s.BeginTrade(_parts[ia], _parts[ib]);
                break;
            }
            default:
            {
                var i = _grounded[_rng.Next(_grounded.Length)];
                var leads = _s.Problem.Items[i].GroundLeads;
                var l = leads[_rng.Next(leads.Length)];
                _s.Begin(i);
                _s.SetGroundChoice(l, _rng.Next(_s.Problem.Leads[l].GroundX.Length));
                break;
            }
        }
        return kind;
    }

    /// <summary>
    /// Opens a directed move on a net that breaks its reach: its worst lead's island moves to the middle of the exits it serves
    /// (when it is a free pad), or the lead's part and the island's part (an IC on its strip) move toward each other until the
    /// lead's exit is half its reach limit from the island. False when no net is broken
    /// or the chosen items are locked; nothing is opened then.
    /// </summary>
    private bool MendReach(double range, Region r)
    {
        if (_s.BrokenNetCount == 0) return false;
        var net = _s.BrokenNet(_rng.Next(_s.BrokenNetCount));
        var (lead, island) = _s.WorstLead(net);
        if (lead < 0) return false;
        var p = _s.Problem;
        var holder = p.Islands[island].Item;
        var partItem = p.Leads[lead].Item;
        var moveHolder = !p.Items[holder].Fixed && (_rng.NextDouble() < 0.5 || p.Items[partItem].Fixed);
        if (!moveHolder && p.Items[partItem].Fixed) return false;
        var (ix, iy, _, _) = _s.IslandBox(island);
        if (moveHolder && !p.Items[holder].IsPart)
        {
            JumpNear(holder, LeadCentre(holder), range, r);
            return true;
        }
        if (!moveHolder && p.Islands[island].Covered && RoundToBareCopper(lead, island, range, r)) return true;
        // The lead's part toward the island, or the part that carries the island (an IC on its strip) toward the lead: along
        // the line between them, until the exit is half the lead's reach limit from the island.
        var (ex, ey) = _s.Exit(lead);
        var d = Math.Sqrt((ex - ix) * (ex - ix) + (ey - iy) * (ey - iy));
        var shift = d < 1e-9 ? 0 : Math.Max(0, d - p.Leads[lead].MaxReach / 2) / d;
        var (dx, dy) = ((ix - ex) * shift, (iy - ey) * shift);
        if (moveHolder) JumpNear(holder, (_s.X[holder] - dx, _s.Y[holder] - dy), range, r);
        else JumpNear(partItem, (_s.X[partItem] + dx, _s.Y[partItem] + dy), range, r);
        return true;
    }

    /// <summary>
    /// Opens a shift of an item that broke a gap or overlap rule at the last recount, by up to the move range but at least
    /// <see cref="PlacerLimits.MendCrowdingShift"/>; sometimes turned. A part with a lead that runs under the body of the IC
    /// whose strip segment it lands on is taken round to that segment's bare side instead, half the time: a shift seldom
    /// carries it past the IC. False when there is none.
    /// </summary>
    private bool MendCrowding(double range, Region r)
    {
        var count = _s.CrowdedCount;
        if (count == 0) return false;
        if (_s.TangledCount > 0 && _rng.NextDouble() < 0.5) return Untangle();
        var i = _s.Crowded(_rng.Next(count));
        var p = _s.Problem;
        if (p.Items[i].Fixed) return false;
        if (BlockedLead(i) is var (lead, island) && _rng.NextDouble() < 0.5 && RoundToBareCopper(lead, island, range, r)) return true;
        Shift(i, Math.Max(range, PlacerLimits.MendCrowdingShift), 0.25, 0.25, r);
        return true;
    }

    /// <summary>A lead of part i whose run passes under the body of the IC whose strip segment it lands on, with that segment; null when none does.</summary>
    private (int Lead, int Island)? BlockedLead(int i)
    {
        var p = _s.Problem;
        if (!p.Items[i].IsPart) return null;
        foreach (var l in p.Items[i].Leads)
            if (_s.IslandOf(l) is var s and >= 0 && p.Islands[s].Covered && _s.RunViolation(l) > 0) return (l, s);
        return null;
    }

    /// <summary>
    /// Opens a jump of a lead's part round to the bare copper of the strip segment it lands on, which its own IC's body partly
    /// covers: out beyond the bare end by half the lead's reach, so the lead need not cross that body. False when the segment
    /// has no bare side to go to.
    /// </summary>
    private bool RoundToBareCopper(int lead, int island, double range, Region r)
    {
        var part = _s.Problem.Leads[lead].Item;
        var (ix, iy, _, _) = _s.IslandBox(island);
        var (bx, by) = _s.LandCentre(island);
        var (ux, uy) = (bx - ix, by - iy);
        var u = Math.Sqrt(ux * ux + uy * uy);
        if (u <= 1e-9) return false;
        var (ex, ey) = _s.Exit(lead);
        var reach = _s.Problem.Leads[lead].MaxReach / 2;
        var (tx, ty) = (bx + ux / u * reach, by + uy / u * reach);
        JumpNear(part, (_s.X[part] + tx - ex, _s.Y[part] + ty - ey), range, r);
        return true;
    }

    /// <summary>
    /// Opens a move that can undo two crossed leads, which small shifts rarely do: the two parts trading places, the two pads
    /// the leads land on trading places, or one of the two parts turned half round in place (its leads leave from the other
    /// ends). False when the chosen items may not move.
    /// </summary>
    private bool Untangle()
    {
        var (l, q) = _s.Tangled(_rng.Next(_s.TangledCount));
        var p = _s.Problem;
        var pick = _rng.Next(3);
        if (pick < 2)
        {
            var (a, b) = pick == 0 ? (p.Leads[l].Item, p.Leads[q].Item) : (_s.HolderOf(l), _s.HolderOf(q));
            if (a < 0 || b < 0 || a == b || p.Items[a].Fixed || p.Items[b].Fixed) return false;
            _s.BeginTrade(a, b);
            return true;
        }
        var i = p.Leads[_rng.NextDouble() < 0.5 ? l : q].Item;
        if (p.Items[i].Fixed) return false;
        _s.Begin(i);
        _s.Rot[i] = (_s.Rot[i] + 2) & 3;
        return true;
    }

    /// <summary>Opens a move of one item by up to <paramref name="reach"/> in x and y, kept inside the region; a part is sometimes turned to any quarter, a rectangular pad sometimes a quarter.</summary>
    private void Shift(int i, double reach, double partTurn, double padTurn, Region r)
    {
        var item = _s.Problem.Items[i];
        _s.Begin(i);
        _s.X[i] = Math.Clamp(_s.X[i] + _rng.Between(-reach, reach), r.MinX, r.MaxX);
        _s.Y[i] = Math.Clamp(_s.Y[i] + _rng.Between(-reach, reach), r.MinY, r.MaxY);
        if (item.IsPart && _rng.NextDouble() < partTurn) _s.Rot[i] = _rng.Next(4);
        else if (item.CanTurn && _rng.NextDouble() < padTurn) _s.Rot[i] ^= 1;
    }

    /// <summary>Moves an item to a target point, jittered by up to 2 mm (less when the move range is smaller), kept inside the region.</summary>
    private void JumpNear(int i, (double X, double Y) target, double range, Region r)
    {
        _s.Begin(i);
        var jitter = Math.Min(range, 2.0);
        _s.X[i] = Math.Clamp(target.X + _rng.Between(-jitter, jitter), r.MinX, r.MaxX);
        _s.Y[i] = Math.Clamp(target.Y + _rng.Between(-jitter, jitter), r.MinY, r.MaxY);
    }

    /// <summary>Where a part would sit if each of its free leads' exits lay on the island it lands on, averaged; its position when it has none.</summary>
    private (double X, double Y) PadCentre(int partItem)
    {
        var p = _s.Problem;
        double sx = 0, sy = 0;
        var n = 0;
        foreach (var l in p.Items[partItem].Leads)
        {
            var island = _s.IslandOf(l);
            if (p.Leads[l].OwnIsland >= 0 || island < 0) continue;
            var (ix, iy, _, _) = _s.IslandBox(island);
            var (ex, ey) = _s.Exit(l);
            sx += ix - (ex - _s.X[partItem]);
            sy += iy - (ey - _s.Y[partItem]);
            n++;
        }
        return n == 0 ? (_s.X[partItem], _s.Y[partItem]) : (sx / n, sy / n);
    }

    /// <summary>The middle of the lead exits a pad serves now (or of all its net's leads when it serves none).</summary>
    private (double X, double Y) LeadCentre(int padItem)
    {
        var p = _s.Problem;
        var island = p.Items[padItem].Islands[0];
        var net = p.Nets[p.Islands[island].Net];
        double sx = 0, sy = 0;
        var n = 0;
        foreach (var l in net.Leads)
            if (_s.IslandOf(l) == island) { var (x, y) = _s.Exit(l); sx += x; sy += y; n++; }
        if (n == 0)
            foreach (var l in net.Leads) { var (x, y) = _s.Exit(l); sx += x; sy += y; n++; }
        return n == 0 ? (_s.X[padItem], _s.Y[padItem]) : (sx / n, sy / n);
    }
}
