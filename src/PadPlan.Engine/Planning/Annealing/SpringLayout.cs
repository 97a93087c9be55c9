namespace PadPlan.Planning;

/// <summary>
/// The analytic start: a quadratic (spring) placement, as the analytic VLSI placers begin. Every lead pulls its part toward
/// each island of its net with a spring, pads being free nodes; input and output nets are anchored to the left and right
/// edges, locked items stay put, and a weak pull toward netlist order positions what no anchor reaches. The x positions
/// that minimise the squared spring lengths solve a sparse symmetric positive-definite system, solved by conjugate
/// gradients (Hestenes and Stiefel, 1952), which converges on a long chain of a thousand parts where plain relaxation
/// sweeps do not. y has no anchors (its exact solution is one line), so y is
/// smoothed seeded noise with the x direction taken out: the slowest modes of the springs, as spectral layouts use.
/// The solution bunches in the middle, so it is spread over an even grid in one of two orders, whichever leaves the
/// springs shorter: columns by x and each column by y, or the x order laid out as a snake (column down, next column up),
/// which keeps neighbours in a long chain neighbours on the board. Only the order survives the spread, which is what
/// annealing needs from it.
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
        SolveX(items, springs, x, r.MinX, r.MaxX, NetlistOrder(items, parts, springs, r.MinX, r.MaxX));
        Smooth(items, springs, y, r.CentreY);
        Decorrelate(parts, x, y);

        // Spread over a box in the middle no larger than the parts need, so leads start short; a fixed board may be roomier.
        var scale = Math.Min(1, Math.Sqrt(PlacerLimits.SpringSpreadArea * p.RawArea / Math.Max(1e-9, r.Width * r.Height)));
        var (w, h) = (r.Width * scale, r.Height * scale);
        var (x0, y0) = (r.CentreX - w / 2, r.CentreY - h / 2);
        var cols = Math.Max(1, (int)Math.Round(Math.Sqrt(parts.Length * w / Math.Max(1e-9, h))));
        var rows = (parts.Length + cols - 1) / cols;
        var byX = parts.OrderBy(i => x[i]).ThenBy(i => i).ToArray();
        var (gx, gy) = (new double[items.Length], new double[items.Length]);
        var (sx, sy) = (new double[items.Length], new double[items.Length]);
        Spread(byX, rows, w / cols, h, x0, y0, column => column.OrderBy(i => y[i]).ThenBy(i => i), gx, gy);
        Spread(byX, rows, w / cols, h, x0, y0, null, sx, sy);
        var snake = Stretch(springs, sx, sy, s) < Stretch(springs, gx, gy, s);
        var (fx, fy) = snake ? (sx, sy) : (gx, gy);
        foreach (var i in parts)
        {
            s.X[i] = fx[i];
            s.Y[i] = fy[i];
            s.Rot[i] = 0;
        }
        return Math.Min(w / cols, h / Math.Max(1, rows));
    }

    /// <summary>Puts the parts, taken in x order, into the slots of an even grid column by column; each column in the given order, or, without one, down the even columns and up the odd ones (a snake).</summary>
    private static void Spread(int[] byX, int rows, double cellW, double h, double x0, double y0, Func<int[], IEnumerable<int>>? order, double[] outX, double[] outY)
    {
        var cols = (byX.Length + rows - 1) / rows;
        for (var c = 0; c < cols; c++)
        {
            var slice = byX.Skip(c * rows).Take(rows).ToArray();
            var column = order is null ? (c % 2 == 0 ? slice : [.. slice.Reverse()]) : [.. order(slice)];
            var cellH = h / Math.Max(1, column.Length);
            for (var k = 0; k < column.Length; k++)
            {
                outX[column[k]] = x0 + (c + 0.5) * cellW;
                outY[column[k]] = y0 + (k + 0.5) * cellH;
            }
        }
    }

    /// <summary>Total weighted spring length (Manhattan) of a spread; items it does not place (pads, locked items) are taken where the state has them, pads at their partners' mean.</summary>
    private static double Stretch(List<(int To, double W)>[] springs, double[] x, double[] y, AnnealState s)
    {
        var items = s.Problem.Items;
        var (px, py) = (new double[items.Length], new double[items.Length]);
        for (var i = 0; i < items.Length; i++)
        {
            if (items[i].IsPart && !items[i].Fixed) { (px[i], py[i]) = (x[i], y[i]); continue; }
            if (items[i].Fixed || springs[i].Count == 0) { (px[i], py[i]) = (s.X[i], s.Y[i]); continue; }
            double mx = 0, my = 0, mw = 0;
            foreach (var (to, wt) in springs[i])
                if (items[to].IsPart) { mx += wt * x[to]; my += wt * y[to]; mw += wt; }
            (px[i], py[i]) = mw > 0 ? (mx / mw, my / mw) : (s.X[i], s.Y[i]);
        }
        var total = 0.0;
        for (var i = 0; i < items.Length; i++)
            foreach (var (to, wt) in springs[i])
                if (to > i) total += wt * (Math.Abs(px[i] - px[to]) + Math.Abs(py[i] - py[to]));
        return total;
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

    /// <summary>
    /// Where netlist order would put each item across the region: the i-th of n movable parts at (i + 1/2) / n of the width,
    /// a pad at the mean of its parts. A builder writes a netlist roughly from input to output, and a part of the circuit
    /// that no input or output anchors (a separate stage, a supply filter) has no position of its own in the spring solve;
    /// the weak pull toward this order gives it one, and breaks ties inside it the way the circuit was written.
    /// </summary>
    private static double[] NetlistOrder(ProblemItem[] items, int[] parts, List<(int To, double W)>[] springs, double low, double high)
    {
        var target = new double[items.Length];
        Array.Fill(target, (low + high) / 2);
        for (var k = 0; k < parts.Length; k++) target[parts[k]] = low + (k + 0.5) / parts.Length * (high - low);
        var isPart = new bool[items.Length];
        foreach (var i in parts) isPart[i] = true;
        for (var i = 0; i < items.Length; i++)
        {
            if (isPart[i]) continue;
            double sum = 0, weight = 0;
            foreach (var (to, w) in springs[i])
                if (isPart[to]) { sum += w * target[to]; weight += w; }
            if (weight > 0) target[i] = sum / weight;
        }
        return target;
    }

    /// <summary>
    /// Solves the x coordinates exactly (to a small residual) by conjugate gradients with a diagonal preconditioner. Each free
    /// item's equation: (c + a + sum of weights) x_i - sum of w x_j = c prior_i + a anchor + sum over locked partners of w x_j,
    /// with c the weak pull toward netlist order and a = 1 for items on input (left edge) or output (right edge) nets.
    /// </summary>
    private static void SolveX(ProblemItem[] items, List<(int To, double W)>[] springs, double[] v, double low, double high, double[] prior)
    {
        var n = items.Length;
        var diag = new double[n];
        var b = new double[n];
        for (var i = 0; i < n; i++)
        {
            if (items[i].Fixed) continue;
            diag[i] = PlacerLimits.SpringOrderPull;
            b[i] = PlacerLimits.SpringOrderPull * prior[i];
            if (items[i].Flow != 0) { diag[i] += 1; b[i] += items[i].Flow < 0 ? low : high; }
            foreach (var (to, w) in springs[i])
            {
                diag[i] += w;
                if (items[to].Fixed) b[i] += w * v[to];
            }
        }
        void Multiply(double[] a, double[] result)
        {
            for (var i = 0; i < n; i++)
            {
                if (items[i].Fixed) { result[i] = 0; continue; }
                var sum = diag[i] * a[i];
                foreach (var (to, w) in springs[i])
                    if (!items[to].Fixed) sum -= w * a[to];
                result[i] = sum;
            }
        }
        var res = new double[n];
        var z = new double[n];
        var dir = new double[n];
        var q = new double[n];
        Multiply(v, q);
        double bNorm = 0, rz = 0;
        for (var i = 0; i < n; i++)
        {
            if (items[i].Fixed) continue;
            res[i] = b[i] - q[i];
            z[i] = res[i] / diag[i];
            dir[i] = z[i];
            rz += res[i] * z[i];
            bNorm += b[i] * b[i];
        }
        var tolerance = PlacerLimits.SpringResidual * PlacerLimits.SpringResidual * Math.Max(1e-12, bNorm);
        for (var iteration = 0; iteration < PlacerLimits.SpringIterations; iteration++)
        {
            var rr = 0.0;
            for (var i = 0; i < n; i++) rr += res[i] * res[i];
            if (rr <= tolerance) break;
            Multiply(dir, q);
            var dq = 0.0;
            for (var i = 0; i < n; i++) dq += dir[i] * q[i];
            if (dq <= 0) break;
            var alpha = rz / dq;
            var rzNext = 0.0;
            for (var i = 0; i < n; i++)
            {
                if (items[i].Fixed) continue;
                v[i] += alpha * dir[i];
                res[i] -= alpha * q[i];
                z[i] = res[i] / diag[i];
                rzNext += res[i] * z[i];
            }
            var beta = rzNext / rz;
            rz = rzNext;
            for (var i = 0; i < n; i++) dir[i] = z[i] + beta * dir[i];
        }
    }

    /// <summary>Gauss-Seidel sweeps toward the mean of each item's spring partners with a weak pull to the middle: on seeded noise this keeps the slowest modes of the springs, an order of the circuit's own.</summary>
    private static void Smooth(ProblemItem[] items, List<(int To, double W)>[] springs, double[] v, double middle)
    {
        for (var sweep = 0; sweep < PlacerLimits.SpringSweeps; sweep++)
            for (var i = 0; i < items.Length; i++)
            {
                if (items[i].Fixed) continue;
                var sum = PlacerLimits.SpringCentrePull * middle;
                var weight = PlacerLimits.SpringCentrePull;
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
