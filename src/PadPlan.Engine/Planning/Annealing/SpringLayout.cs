namespace PadPlan.Planning;

/// <summary>
/// The analytic start: a quadratic (spring) placement, as the analytic VLSI placers begin. Every lead pulls its part toward
/// each island of its net with a spring, pads being free nodes, so the positions that minimise the squared spring lengths
/// are solved by Gauss-Seidel sweeps; input and output nets are anchored to the left and right edges and locked items stay
/// put. The solution bunches in the middle, so it is spread: parts are sorted into columns by x and within each column by
/// y, and each takes the next slot of an even grid over the region. Only the order of the solution survives the spread,
/// which is what annealing needs from it.
/// </summary>
internal static class SpringLayout
{
    /// <summary>Places the movable parts; returns the grid's cell size (mm), the natural move range for the annealing that follows.</summary>
    public static double Place(AnnealState s, int[] parts, PlacerRandom rng)
    {
        var p = s.Problem;
        var items = p.Items;
        var r = p.Region;
        if (parts.Length == 0) return Math.Max(r.Width, r.Height);
        var springs = Springs(p);
        var x = new double[items.Length];
        var y = new double[items.Length];
        for (var i = 0; i < items.Length; i++)
        {
            // Locked items stay; free ones start near the middle with a seeded nudge that breaks ties between twins.
            x[i] = items[i].Fixed ? s.X[i] : r.CentreX + rng.Between(-1, 1);
            y[i] = items[i].Fixed ? s.Y[i] : r.CentreY + rng.Between(-1, 1);
        }
        Solve(items, springs, x, r.MinX, r.MaxX, r.CentreX, useFlow: true);
        Solve(items, springs, y, r.CentreY, r.CentreY, r.CentreY, useFlow: true);
        Decorrelate(parts, x, y);

        // Spread over a box in the middle no larger than the parts need, so leads start short; a fixed board may be roomier.
        var scale = Math.Min(1, Math.Sqrt(PlacerLimits.SpringSpreadArea * p.RawArea / Math.Max(1e-9, r.Width * r.Height)));
        var (w, h) = (r.Width * scale, r.Height * scale);
        var (x0, y0) = (r.CentreX - w / 2, r.CentreY - h / 2);
        var cols = Math.Max(1, (int)Math.Round(Math.Sqrt(parts.Length * w / Math.Max(1e-9, h))));
        var rows = (parts.Length + cols - 1) / cols;
        var byX = parts.OrderBy(i => x[i]).ThenBy(i => i).ToArray();
        var cellW = w / cols;
        for (var c = 0; c < cols; c++)
        {
            var column = byX.Skip(c * rows).Take(rows).OrderBy(i => y[i]).ThenBy(i => i).ToArray();
            var cellH = h / Math.Max(1, column.Length);
            for (var k = 0; k < column.Length; k++)
            {
                var i = column[k];
                s.X[i] = x0 + (c + 0.5) * cellW;
                s.Y[i] = y0 + (k + 0.5) * cellH;
                s.Rot[i] = 0;
            }
        }
        return Math.Min(cellW, h / Math.Max(1, rows));
    }

    /// <summary>Springs of every net as lists per item: each lead's item to each item holding an island of the net, weighted so a net pulls as hard whatever its number of islands.</summary>
    private static List<(int To, double W)>[] Springs(PlacementProblem p)
    {
        var springs = new List<(int To, double W)>[p.Items.Length];
        for (var i = 0; i < springs.Length; i++) springs[i] = [];
        foreach (var net in p.Nets)
        {
            var holders = net.Islands.Select(i => p.Islands[i].Item).Distinct().ToArray();
            var members = net.Leads.Select(l => p.Leads[l].Item).Distinct().ToArray();
            foreach (var m in members)
                foreach (var h in holders)
                    if (m != h)
                    {
                        springs[m].Add((h, 1.0 / holders.Length));
                        springs[h].Add((m, 1.0 / holders.Length));
                    }
        }
        return springs;
    }

    /// <summary>Gauss-Seidel sweeps of one coordinate: each free item moves to the weighted mean of its spring partners, its anchor (input nets to <paramref name="low"/>, output nets to <paramref name="high"/>) and a weak pull to the middle.</summary>
    private static void Solve(ProblemItem[] items, List<(int To, double W)>[] springs, double[] v, double low, double high, double middle, bool useFlow)
    {
        for (var sweep = 0; sweep < PlacerLimits.SpringSweeps; sweep++)
            for (var i = 0; i < items.Length; i++)
            {
                if (items[i].Fixed) continue;
                var sum = PlacerLimits.SpringCentrePull * middle;
                var weight = PlacerLimits.SpringCentrePull;
                if (useFlow && items[i].Flow != 0) { sum += items[i].Flow < 0 ? low : high; weight += 1; }
                foreach (var (to, w) in springs[i]) { sum += w * v[to]; weight += w; }
                v[i] = sum / weight;
            }
    }

    /// <summary>Without anchors both coordinates drift toward the same slowest mode of the springs; take that part out of y (Gram-Schmidt), as spectral layouts do, so y adds an order of its own.</summary>
    private static void Decorrelate(int[] parts, double[] x, double[] y)
    {
        double mx = parts.Average(i => x[i]), my = parts.Average(i => y[i]);
        double xy = 0, xx = 0;
        foreach (var i in parts) { xy += (x[i] - mx) * (y[i] - my); xx += (x[i] - mx) * (x[i] - mx); }
        if (xx < 1e-12) return;
        var k = xy / xx;
        foreach (var i in parts) y[i] -= k * (x[i] - mx);
    }
}
