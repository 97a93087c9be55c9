namespace PadPlan.Planning;

/// <summary>The last step of a run: rounds coordinates to the written step, then moves each item that still breaks a rule to the nearest spot on that step (and turn, and ground landing) where it breaks none, or trades places with the item whose lead its own crosses, and checks again.</summary>
internal static class Legaliser
{
    /// <summary>Grid steps (mm) and ring counts of the spot search: 0.3 mm around at 0.1 mm (a lead a few hundredths too near another), 4 mm around at 0.5 mm, then 15 mm around at 1.5 mm.</summary>
    private static readonly (double Step, int Rings)[] Searches = [(0.1, 3), (0.5, 8), (1.5, 10)];
    private const int Passes = 6;
    private const double Clean = 1e-9;

    /// <summary>The violation penalty while legalising: any broken rule outweighs any lead length.</summary>
    public const double Penalty = 1e4;

    /// <summary>Returns true when the layout breaks no rule after rounding.</summary>
    public static bool Finish(AnnealState s)
    {
        s.Penalty = Penalty;
        s.Slack = 0;
        s.Recompute();
        // Annealing that ends far from legal is not mended by local moves; searching spots for every item would only take long.
        if (s.Violation > PlacerLimits.HopelessViolationPerItem * s.Problem.Items.Length) return false;
        // On the written grid from the start, and every spot searched on it too: what is judged legal is what is written
        // (rounding a layout that touches its limits afterwards broke them by a few thousandths of a millimetre).
        RoundPositions(s);
        s.Recompute();
        for (var attempt = 0; attempt < 3; attempt++)
        {
            Repair(s);
            RoundPositions(s);
            s.Recompute();
            if (s.Violation <= Clean) return true;
        }
        return false;
    }

    private static void RoundPositions(AnnealState s)
    {
        var items = s.Problem.Items;
        for (var i = 0; i < items.Length; i++)
        {
            if (items[i].Fixed) continue;
            s.X[i] = OnGrid(s.X[i]);
            s.Y[i] = OnGrid(s.Y[i]);
        }
    }

    private static double OnGrid(double v) => Math.Round(v / PlacerLimits.WriteStep) * PlacerLimits.WriteStep;

    private static void Repair(AnnealState s)
    {
        var items = s.Problem.Items;
        var last = double.PositiveInfinity;
        for (var pass = 0; pass < Passes; pass++)
        {
            s.Recompute();
            // A pass that mended nothing leaves the next one the same searches from nearly the same layout: stop.
            if (s.Violation <= Clean || s.Violation >= last - Clean) return;
            last = s.Violation;
            // A held part stays where it is, but where its ground leads meet the plane may still change.
            var bad = Enumerable.Range(0, items.Length).Where(i => !items[i].Fixed || items[i].GroundLeads.Length > 0)
                .Select(i => (Item: i, V: s.ViolationOf(i))).Where(x => x.V > Clean)
                .OrderByDescending(x => x.V).ThenBy(x => x.Item).Select(x => x.Item).ToList();
            foreach (var i in bad)
            {
                if (s.ViolationOf(i) <= Clean) continue;
                TryGroundLandings(s, i);
                if (items[i].Fixed || s.ViolationOf(i) <= Clean) continue;
                TryNearbySpots(s, i, s.ViolationOf(i));
                if (s.ViolationOf(i) <= Clean) continue;
                Untangle(s, i);
            }
        }
    }

    /// <summary>
    /// For a part whose leads still cross another's where no spot of its own clears them: the two parts trading places, the
    /// two pads the leads land on trading places, then spots for those pads and the other part, in turn.
    /// </summary>
    private static void Untangle(AnnealState s, int i)
    {
        var p = s.Problem;
        foreach (var l in p.Items[i].Leads)
        {
            var (v, q) = s.CrossingAt(l);
            if (v <= Clean || q < 0) continue;
            var other = p.Leads[q].Item;
            if (TryTrade(s, i, other) || TryTrade(s, s.HolderOf(l), s.HolderOf(q))) continue;
            foreach (var c in (ReadOnlySpan<int>)[s.HolderOf(l), s.HolderOf(q), other])
            {
                if (c < 0 || c == i || p.Items[c].Fixed) continue;
                TryNearbySpots(s, c, s.CrossingAt(l).V);
                if (s.CrossingAt(l).V <= Clean) break;
            }
        }
    }

    /// <summary>Two items trade places when that lowers the broken rules; false (and nothing changed) otherwise.</summary>
    private static bool TryTrade(AnnealState s, int a, int b)
    {
        var items = s.Problem.Items;
        if (a < 0 || b < 0 || a == b || items[a].Fixed || items[b].Fixed) return false;
        s.BeginTrade(a, b);
        if (s.EvaluateWithin(-Clean) && s.DeltaViolation < -Clean) { s.Commit(); return true; }
        s.Rollback();
        return false;
    }

    private static void TryGroundLandings(AnnealState s, int i)
    {
        foreach (var l in s.Problem.Items[i].GroundLeads)
        {
            var best = -1;
            double bestV = 0, bestC = 0;
            var count = s.Problem.Leads[l].GroundX.Length;
            for (var c = 0; c < count; c++)
            {
                s.Begin(i);
                s.SetGroundChoice(l, c);
                if (s.EvaluateWithin(bestV + Clean) && Better(s.DeltaViolation, s.DeltaCost, bestV, bestC)) { best = c; bestV = s.DeltaViolation; bestC = s.DeltaCost; }
                s.Rollback();
            }
            if (best < 0) continue;
            s.Begin(i);
            s.SetGroundChoice(l, best);
            s.Evaluate();
            s.Commit();
        }
    }

    /// <summary>Searches square rings of spots on the written grid around the item, nearest first and in every allowed turn: a fine grid close by, then a coarse one further out. Stops at the first ring that takes <paramref name="own"/> off the total.</summary>
    private static void TryNearbySpots(AnnealState s, int i, double own)
    {
        var item = s.Problem.Items[i];
        var turns = item.IsPart ? 4 : item.CanTurn ? 2 : 1;
        var (x0, y0, r0) = (s.X[i], s.Y[i], s.Rot[i]);
        double bestV = 0, bestC = 0;
        (double X, double Y, int R)? best = null;
        foreach (var (step, rings) in Searches)
        {
            for (var ring = 0; ring <= rings; ring++)
            {
                for (var dx = -ring; dx <= ring; dx++)
                    for (var dy = -ring; dy <= ring; dy++)
                    {
                        if (Math.Max(Math.Abs(dx), Math.Abs(dy)) != ring) continue;
                        for (var t = 0; t < turns; t++)
                        {
                            if (ring == 0 && t == 0) continue;
                            var rot = (r0 + t) % (item.IsPart ? 4 : 2);
                            s.Begin(i);
                            s.X[i] = OnGrid(x0 + dx * step);
                            s.Y[i] = OnGrid(y0 + dy * step);
                            s.Rot[i] = rot;
                            if (s.EvaluateWithin(bestV + Clean) && Better(s.DeltaViolation, s.DeltaCost, bestV, bestC)) { best = (s.X[i], s.Y[i], rot); bestV = s.DeltaViolation; bestC = s.DeltaCost; }
                            s.Rollback();
                        }
                    }
                if (best is not null && bestV <= -own + Clean) goto found;
            }
        }
        found:
        if (best is null) return;
        s.Begin(i);
        (s.X[i], s.Y[i], s.Rot[i]) = best.Value;
        s.Evaluate();
        s.Commit();
    }

    /// <summary>Less violation, or as little and less cost. A move whose violation change is above bestV + Clean is never better, so a search stops measuring it there (<see cref="AnnealState.EvaluateWithin"/>).</summary>
    private static bool Better(double dv, double dc, double bestV, double bestC) =>
        dv < bestV - Clean || (Math.Abs(dv - bestV) <= Clean && dc < bestC - 1e-9);
}
