namespace PadPlan.Planning;

internal sealed partial class AnnealState
{
    private readonly double[] _netCostNew, _netViolNew;
    private readonly int[] _leadIslandNew;
    private readonly int[] _netStamp;
    private readonly int[] _affected;
    private int _stamp, _affectedCount;

    // the open transaction: at most two items and one ground choice change
    private int _ta = -1, _tb = -1, _tLead = -1, _tOldChoice;
    private double _oldXa, _oldYa, _oldXb, _oldYb;
    private int _oldRa, _oldRb;
    private double _beforeCost, _beforeViol, _uaCost, _uaViol, _ubCost, _ubViol;
    public double DeltaCost { get; private set; }
    public double DeltaViolation { get; private set; }
    /// <summary>The open move's cost and violation terms summed by the stages of <see cref="Evaluate"/> so far.</summary>
    private double _evalCost, _evalViol;
    /// <summary>The committed violation of the changed lead runs as the move opened, their violation after it with that of the unchanged runs the move changes, and the move's change to the crossing violation.</summary>
    private double _beforeRuns, _runsNew, _crossDelta;
    /// <summary>The committed violation of lead runs under bodies, and of lead crossings, kept move by move like <see cref="Violation"/>.</summary>
    private double _runViolation, _crossViolation;
    /// <summary>The lower bound of the open move's violation change after the last stage evaluated.</summary>
    private double _violationBound;
    /// <summary><see cref="_violationBound"/>, for the verify test.</summary>
    internal double ViolationBound => _violationBound;
    /// <summary>The committed violation of lead runs under bodies and of lead crossings, as kept move by move: for the verify test.</summary>
    internal (double Runs, double Crossings) LeadPathViolation => (_runViolation, _crossViolation);
    /// <summary>Relative margin of the stages' bounds: far above the rounding of a few sums of doubles (about 1e-16 each) and the drift of kept sums between recounts, far below any cost change a move makes.</summary>
    private const double RoundingMargin = 1e-10;

    /// <summary>Opens a move in which items a and b trade places (each keeps its turn).</summary>
    public void BeginTrade(int a, int b)
    {
        Begin(a, b);
        (X[a], X[b]) = (X[b], X[a]);
        (Y[a], Y[b]) = (Y[b], Y[a]);
    }

    /// <summary>Opens a move of item a (and b, when two move together): remembers where they are and what their terms cost now.</summary>
    public void Begin(int a, int b = -1)
    {
        _ta = a;
        _tb = b;
        _tLead = -1;
        (_oldXa, _oldYa, _oldRa) = (X[a], Y[a], Rot[a]);
        if (b >= 0) (_oldXb, _oldYb, _oldRb) = (X[b], Y[b], Rot[b]);
        _stamp++;
        _affectedCount = 0;
        AddNets(a);
        if (b >= 0) AddNets(b);
        double cost = 0, viol = 0;
        for (var k = 0; k < _affectedCount; k++)
        {
            cost += _netCost[_affected[k]];
            viol += _netViol[_affected[k]];
        }
        cost += _unaryCost[a];
        viol += _unaryViol[a];
        if (b >= 0) { cost += _unaryCost[b]; viol += _unaryViol[b]; }
        _soft = 0;
        viol += PairsOf(a, b);
        cost += _soft;
        CollectChanged();
        KeepChangedExits();
        _beforeRuns = BeginRuns(a, b);
        viol += _beforeRuns;
        _beforeCost = cost;
        _beforeViol = viol;
    }

    private void AddNets(int item)
    {
        foreach (var n in _items[item].Nets)
        {
            if (_netStamp[n] == _stamp) continue;
            _netStamp[n] = _stamp;
            _affected[_affectedCount++] = n;
        }
    }

    /// <summary>Changes which ground landing one ground lead of the open move's part uses.</summary>
    public void SetGroundChoice(int lead, int choice)
    {
        _tLead = lead;
        _tOldChoice = GroundChoice[lead];
        GroundChoice[lead] = choice;
    }

    /// <summary>Works out the cost change of the open move after positions were set; leaves the move applied.</summary>
    public void Evaluate()
    {
        EvaluateNets();
        EvaluatePairs();
        EvaluateRunsStage();
        EvaluateCrossings();
    }

    // Evaluate in stages, cheapest first. After each but the last, a lower bound of the annealing cost change (cost plus
    // Penalty times violation) that the whole evaluation can give: what is still to come can only add cost and violation
    // (every term is at least 0), except that it can mend what is committed now. The item pairs, and the soft cost of bodies
    // over pads measured with them, can mend at most what the moved items' pairs hold now (already taken off in Begin); lead
    // runs under bodies at most the committed violation of the runs the move does not measure anew (those it does were taken
    // off in Begin too); lead crossings at most that of all crossings, and nothing when no lead the move can change crosses
    // now. A caller that would reject the move at a bound rolls it back without the rest, and so decides exactly as the
    // whole evaluation would.

    /// <summary>
    /// <see cref="Evaluate"/>, stopped after the first stage whose lower bound of the violation change already exceeds
    /// <paramref name="violationLimit"/>: false then, and the move must be rolled back; true when evaluated whole. For a
    /// search that wants only moves that change the violation by at most the limit (the legaliser's).
    /// </summary>
    public bool EvaluateWithin(double violationLimit)
    {
        EvaluateNets();
        if (_violationBound > violationLimit) return false;
        EvaluatePairs();
        if (_violationBound > violationLimit) return false;
        EvaluateRunsStage();
        if (_violationBound > violationLimit) return false;
        EvaluateCrossings();
        return true;
    }

    /// <summary>The first stage of <see cref="Evaluate"/>: the moved items' nets and own terms. Returns a lower bound of the whole move's annealing cost change.</summary>
    public double EvaluateNets()
    {
        UpdateGeometry(_ta);
        if (_tb >= 0) UpdateGeometry(_tb);
        double cost = 0, viol = 0;
        for (var k = 0; k < _affectedCount; k++)
        {
            var n = _affected[k];
            EvalNet(n, _leadIslandNew, _lxNew, _lyNew, out _netCostNew[n], out _netViolNew[n]);
            cost += _netCostNew[n];
            viol += _netViolNew[n];
        }
        EvalUnary(_ta, out _uaCost, out _uaViol);
        cost += _uaCost;
        viol += _uaViol;
        if (_tb >= 0)
        {
            EvalUnary(_tb, out _ubCost, out _ubViol);
            cost += _ubCost;
            viol += _ubViol;
        }
        (_evalCost, _evalViol) = (cost, viol);
        return Bound(_runViolation - _beforeRuns + MendableCrossings);
    }

    /// <summary>The second stage of <see cref="Evaluate"/>: the moved items' pairs with every other item. Returns a lower bound of the whole move's annealing cost change.</summary>
    public double EvaluatePairs()
    {
        _soft = 0;
        _evalViol += PairsOf(_ta, _tb);
        _evalCost += _soft;
        for (var i = 0; i < _changedCount; i++)
        {
            var l = _changed[i];
            if (_leads[l].Ground || _leads[l].OwnIsland >= 0) OwnLanding(l, _lxNew, _lyNew);
        }
        return Bound(_runViolation - _beforeRuns + MendableCrossings);
    }

    /// <summary>The third stage of <see cref="Evaluate"/>: lead runs under bodies. Returns a lower bound of the whole move's annealing cost change.</summary>
    public double EvaluateRunsStage()
    {
        _runsNew = EvaluateRuns();
        _evalViol += _runsNew;
        return Bound(MendableCrossings);
    }

    /// <summary>The last stage of <see cref="Evaluate"/>: lead crossings. Sets <see cref="DeltaCost"/> and <see cref="DeltaViolation"/>.</summary>
    public void EvaluateCrossings()
    {
        DeltaCost = _evalCost - _beforeCost;
        _crossDelta = CrossingChange();
        DeltaViolation = _evalViol - _beforeViol + _crossDelta;
    }

    /// <summary>What the crossing stage can mend at most: the committed crossing violation, or 0 when no lead the move can change comes too near another (each of its old pairs is then exactly 0).</summary>
    private double MendableCrossings => _changedCross ? _crossViolation : 0;

    /// <summary>The lower bound after a stage: the cost and violation so far, less all that the stages to come could mend, less a margin for rounding.</summary>
    private double Bound(double mendable)
    {
        mendable = Math.Max(0, mendable);
        var margin = RoundingMargin * (1 + Math.Abs(_evalViol) + Math.Abs(_beforeViol) + mendable);
        _violationBound = _evalViol - _beforeViol - mendable - margin;
        return _evalCost - _beforeCost + Penalty * _violationBound;
    }

    /// <summary>Keeps the evaluated move.</summary>
    public void Commit()
    {
        for (var k = 0; k < _affectedCount; k++)
        {
            var n = _affected[k];
            _netCost[n] = _netCostNew[n];
            _netViol[n] = _netViolNew[n];
            MarkNet(n);
            foreach (var l in _nets[n].FreeLeads) _leadIsland[l] = _leadIslandNew[l];
        }
        for (var i = 0; i < _changedCount; i++)
        {
            var l = _changed[i];
            (_lx[l], _ly[l]) = (_lxNew[l], _lyNew[l]);
            RegisterLead(l);
        }
        CommitRuns();
        _unaryCost[_ta] = _uaCost;
        _unaryViol[_ta] = _uaViol;
        if (_tb >= 0) { _unaryCost[_tb] = _ubCost; _unaryViol[_tb] = _ubViol; }
        Cost += DeltaCost;
        Violation += DeltaViolation;
        _runViolation += _runsNew - _beforeRuns;
        _crossViolation += _crossDelta;
        CommitCrossCounts();
        _ta = _tb = -1;
    }

    /// <summary>Puts everything back as it was before the open move.</summary>
    public void Rollback()
    {
        (X[_ta], Y[_ta], Rot[_ta]) = (_oldXa, _oldYa, _oldRa);
        if (_tb >= 0) (X[_tb], Y[_tb], Rot[_tb]) = (_oldXb, _oldYb, _oldRb);
        if (_tLead >= 0) GroundChoice[_tLead] = _tOldChoice;
        UpdateGeometry(_ta);
        if (_tb >= 0) UpdateGeometry(_tb);
        _ta = _tb = -1;
    }
}
