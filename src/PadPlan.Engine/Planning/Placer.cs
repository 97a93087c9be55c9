using System.Diagnostics;
using System.Globalization;
using PadPlan.Model;
using PadPlan.Model.Standards;

namespace PadPlan.Planning;

/// <summary>The placement engine's one entry point: plans pads, anneals several seeded runs (in parallel when allowed), keeps the best legal one, and returns the placed project or the reason it cannot be placed.</summary>
public static class Placer
{
    public static PlacementResult Place(Project project, PlacerSettings settings, IProgress<PlacerProgress>? progress = null)
    {
        var clock = Stopwatch.StartNew();
        if (project.Parts.Count == 0)
            return PlacementResult.Failed(new PlacementFailure("the project has no parts to place.", "Import a netlist into the project first ('padplan import')."));
        if (StockTooThin(project) is { } thin) return PlacementResult.Failed(thin);
        try
        {
            var problem = ProblemBuilder.Build(project, settings, CostWeights.Default);
            var outcome = problem.AutoBoard ? PlaceOnAutoBoard(problem, settings, progress) : PlaceOnBoard(problem, settings, progress);
            var board = project.Board;
            double shiftX = 0, shiftY = 0;
            if (problem.AutoBoard)
            {
                var e = outcome.State.Extent();
                var m = board.Margin + PlacerLimits.Safety;
                if (problem.Items.Any(i => i.Fixed))
                    board = board.WithSize(Math.Ceiling(e.MaxX + m), Math.Ceiling(e.MaxY + m));
                else
                {
                    var (w, h) = (Math.Ceiling(e.Width + 2 * m), Math.Ceiling(e.Height + 2 * m));
                    shiftX = Math.Round(m + (w - e.Width - 2 * m) / 2 - e.MinX, 2);
                    shiftY = Math.Round(m + (h - e.Height - 2 * m) / 2 - e.MinY, 2);
                    board = board.WithSize(w, h);
                }
            }
            var placed = project with { Board = board, Layout = LayoutWriter.Write(outcome.State, shiftX, shiftY) };
            return PlacementResult.Placed(placed, PlacementSummary.Of(placed, outcome.State, outcome.Moves, outcome.Runs, clock.Elapsed, settings, problem.AutoBoard));
        }
        catch (PlacementImpossibleException e)
        {
            return PlacementResult.Failed(e.Failure);
        }
    }

    /// <summary>
    /// A pad is separated from the plane only by the edge of its own stock, so the stock must be as thick as IPC-2221 Table 6-1 (B2)
    /// asks for the net's voltage. No placement can mend thin stock: say so before annealing.
    /// </summary>
    private static PlacementFailure? StockTooThin(Project project)
    {
        var worst = project.Nets.Where(n => !n.Ground && n.Voltage is not null)
            .Select(n => (Net: n, Need: ConductorSpacing.B2(n.Voltage!.Value)))
            .Where(x => x.Need > project.Toolkit.StockThickness + 1e-9)
            .OrderByDescending(x => x.Need).ThenBy(x => x.Net.Name, StringComparer.Ordinal)
            .FirstOrDefault();
        if (worst.Net is null) return null;
        var mm = worst.Need.ToString("0.##", CultureInfo.InvariantCulture);
        return new PlacementFailure(
            string.Create(CultureInfo.InvariantCulture, $"net {worst.Net.Name} at {worst.Net.Voltage:0.#} V needs pads cut from stock at least {mm} mm thick ({ConductorSpacing.Revision}, B2: the pad's edge is its only insulation from the plane); the toolkit's stock is {project.Toolkit.StockThickness:0.##} mm."),
            $"Set toolkit.stockThickness to {mm} or more in the project, or stand the high-voltage nodes off the board; mains safety standards come first.");
    }

    /// <summary>
    /// The best of several runs: legal first, then lowest cost, then lowest run number. Independent runs go first, in fixed batches;
    /// on a circuit of more than <see cref="PlacerSettings.SteadyCircuit"/> parts they stop early once the two best legal ones
    /// agree on the cost. Then, when the best is legal, refining runs anneal the best layout so far again, a batch at a time.
    /// Seeds and batches are fixed per run, so threads never change the answer.
    /// </summary>
    internal static RunOutcome RunAll(PlacementProblem problem, PlacerSettings settings, IProgress<PlacerProgress>? progress)
    {
        var parts = problem.Project.Parts.Count;
        var independent = settings.IndependentRunsFor(parts);
        var refines = settings.RefinesFor(parts);
        var results = new RunOutcome?[independent + refines];
        RunOutcome? best = null;
        void One(int k)
        {
            var state = new AnnealState(problem);
            var annealer = new Annealer(state, settings.Seed * 7919L + k);
            if (k < independent) annealer.Start(settings.Start, k);
            else annealer.Resume(best!.State);
            annealer.Run(settings.MovesFactor, (step, cost, violation) => progress?.Report(new PlacerProgress(k + 1, "annealing", step, cost, violation)));
            var legal = Finished(state, annealer, settings);
            progress?.Report(new PlacerProgress(k + 1, legal ? "legal" : "not legal", 0, state.Cost, state.Violation));
            results[k] = new RunOutcome(state, legal, annealer.Stats.TotalTried) { Stats = annealer.Stats };
        }
        void Pool(int[] runs)
        {
            var workers = settings.AllowThreads ? Math.Min(Environment.ProcessorCount, runs.Length) : 1;
            var next = -1;
            Parallel.For(0, workers, new ParallelOptions { MaxDegreeOfParallelism = workers }, _ =>
            {
                int i;
                while ((i = Interlocked.Increment(ref next)) < runs.Length) One(runs[i]);
            });
            best = Best(results);
        }
        void Batches(int from, int to, Func<bool> enough)
        {
            for (var first = from; first < to; first += PlacerLimits.RunBatch)
            {
                Pool([.. Enumerable.Range(first, Math.Min(first + PlacerLimits.RunBatch, to) - first)]);
                if (enough()) return;
            }
        }
        // Run k's result depends on k alone. Where no early stop looks at a batch (refining runs follow), the independent runs
        // share the cores as a pool, those from a scatter (the longest) first, so no core waits for the other at a batch's end.
        if (refines > 0) Pool([.. Enumerable.Range(0, independent).OrderBy(k => Annealer.Scatters(settings.Start, k, parts) ? 0 : 1).ThenBy(k => k)]);
        else Batches(0, independent, () => Agree(results));
        if (best!.Legal) Batches(independent, independent + refines, () => false);
        var finished = results.Where(r => r is not null).Select(r => r!).ToArray();
        var moves = finished.Sum(r => r.Moves);
        if (best.Legal && parts <= PlacerSettings.SteadyCircuit)
        {
            (best, var descent) = Descended(problem, settings, best);
            moves += descent;
        }
        return best with { Moves = moves, Runs = finished.Length };
    }

    /// <summary>
    /// The end of a run: legalised, reworked up to <see cref="PlacerLimits.ReworkTries"/> times when the legaliser leaves it a
    /// little short (each time from the least broken layout so far, which a run that stays short also ends with), and when
    /// legal polished (the polish kept only if it stays legal). True when the layout breaks no rule.
    /// </summary>
    private static bool Finished(AnnealState state, Annealer annealer, PlacerSettings settings)
    {
        var items = state.Problem.Items.Length;
        var legal = Legaliser.Finish(state);
        AnnealState? least = null;
        for (var rework = 0; !legal && rework < PlacerLimits.ReworkTries && state.Violation <= PlacerLimits.ReworkViolationPerItem * items; rework++)
        {
            // each rework starts from the least broken layout so far: a warm rework can undo what the one before mended
            least ??= new AnnealState(state.Problem) { Slack = 0, Penalty = Legaliser.Penalty }; // measured as the legaliser measures
            if (rework == 0 || state.Violation < least.Violation) least.CopyFrom(state);
            else state.CopyFrom(least);
            annealer.Rework(settings.MovesFactor, rework);
            legal = Legaliser.Finish(state);
        }
        if (!legal)
        {
            if (least is not null && least.Violation < state.Violation) state.CopyFrom(least);
            return false;
        }
        var kept = new AnnealState(state.Problem);
        kept.CopyFrom(state);
        annealer.Polish(settings.MovesFactor);
        if (!Legaliser.Finish(state)) state.CopyFrom(kept);
        return true;
    }

    /// <summary>
    /// After a failed try whose broken nets were planned again (<see cref="Replanned"/>): the failed layout carried over to the
    /// new plan (<see cref="LayoutCarry"/>: every part, and every pad the old plan also had, where it was; each new pad beside
    /// the lead of its net that fell shortest), then finished as a run is. The new pads sit where the leads could not reach,
    /// so a layout that was nearly legal is kept instead of annealed again from the start. Null when it does not come out legal.
    /// </summary>
    private static RunOutcome? CarriedOver(PlacementProblem problem, RunOutcome failed, PlacerSettings settings)
    {
        var old = failed.State;
        old.Slack = 0;
        old.Recompute();
        if (old.Violation > PlacerLimits.HopelessViolationPerItem * old.Problem.Items.Length) return null;
        var state = new AnnealState(problem);
        LayoutCarry.Into(old, state);
        var annealer = new Annealer(state, settings.Seed * 7919L + PlacerLimits.CarryRun);
        if (!Finished(state, annealer, settings)) return null;
        return new RunOutcome(state, true, failed.Moves + annealer.Stats.TotalTried) { Stats = annealer.Stats, Runs = failed.Runs };
    }

    /// <summary>
    /// The final descent of the kept layout (<see cref="Annealer.Descend"/>), on circuits placed for steadiness: its result
    /// replaces the layout only when it is legal and costs no more. With the moves it tried.
    /// </summary>
    private static (RunOutcome Kept, long Moves) Descended(PlacementProblem problem, PlacerSettings settings, RunOutcome best)
    {
        var state = new AnnealState(problem);
        state.CopyFrom(best.State);
        var moves = new Annealer(state, settings.Seed * 7919L + PlacerLimits.DescentRun).Descend(settings.MovesFactor);
        var kept = Legaliser.Finish(state) && state.Cost <= best.State.Cost ? best with { State = state } : best;
        return (kept, moves);
    }

    /// <summary>Legal first, then least broken, then lowest cost, then lowest run number.</summary>
    private static RunOutcome Best(IEnumerable<RunOutcome?> results) =>
        results.Select((r, k) => (r, k)).Where(x => x.r is not null)
            .OrderBy(x => x.r!.Legal ? 0 : 1).ThenBy(x => x.r!.Legal ? 0 : x.r!.State.Violation).ThenBy(x => x.r!.State.Cost).ThenBy(x => x.k).First().r!;

    /// <summary>The two cheapest legal runs are within <see cref="PlacerLimits.RunsAgree"/> of each other: more seeds would find little more.</summary>
    private static bool Agree(IEnumerable<RunOutcome?> runs)
    {
        var costs = runs.Where(r => r is { Legal: true }).Select(r => r!.State.Cost).Order().Take(2).ToArray();
        return costs.Length == 2 && costs[1] - costs[0] <= PlacerLimits.RunsAgree * Math.Max(1e-9, costs[0]);
    }

    private static RunOutcome PlaceOnAutoBoard(PlacementProblem problem, PlacerSettings settings, IProgress<PlacerProgress>? progress)
    {
        var region = problem.Region;
        var replan = new PadReplan();
        RunOutcome? outcome = null;
        for (var attempt = 0; attempt <= PlacerLimits.AutoGrowTries; attempt++)
        {
            outcome = RunAll(problem.WithRegion(region), settings, progress);
            if (outcome.Legal) return outcome;
            if (Replanned(ref problem, outcome, replan, settings))
            {
                if (CarriedOver(problem.WithRegion(region), outcome, settings) is { } carried) return carried;
                outcome = RunAll(problem.WithRegion(region), settings, progress);
                if (outcome.Legal) return outcome;
            }
            region = region with { MaxX = region.MinX + region.Width * PlacerLimits.AutoGrowFactor, MaxY = region.MinY + region.Height * PlacerLimits.AutoGrowFactor };
        }
        throw new PlacementImpossibleException(new PlacementFailure(
            "no legal layout found even on a generous automatic board: " + string.Join("; ", outcome!.State.Problems().Take(3)) + ".",
            "Check the named nets' lead limits (maxLead, rules.maxLead*) and pad gaps; try --effort thorough or another --seed."));
    }

    /// <summary>
    /// After a failed try: what it left broken joins <paramref name="replan"/> (<see cref="PadReplan"/>), and the problem is
    /// planned again: nets broken at an IC's strip segments (a lead that does not reach one, or runs under a body to get there)
    /// with pads of their own for every lead from elsewhere, so such a lead can land beside its part and a wire link joins the
    /// pad to the segment; nets whose leads lie in groups too far apart with a pad for each group. False when nothing new was
    /// learnt (the problem stays as it was). Only a failing try changes anything, so layouts that place without it stay the same.
    /// </summary>
    private static bool Replanned(ref PlacementProblem problem, RunOutcome failed, PadReplan replan, PlacerSettings settings)
    {
        if (!replan.Learn(failed.State)) return false;
        problem = ProblemBuilder.Build(problem.Project, settings, problem.Weights, replan.OwnPads, replan.Split);
        return true;
    }

    private static RunOutcome PlaceOnBoard(PlacementProblem problem, PlacerSettings settings, IProgress<PlacerProgress>? progress)
    {
        var region = problem.Region;
        var board = problem.Project.Board;
        if (region.Width > 0 && region.Height > 0 && problem.RawArea <= region.Width * region.Height)
        {
            var outcome = RunAll(problem, settings, progress);
            if (outcome.Legal) return outcome;
            if (Replanned(ref problem, outcome, new PadReplan(), settings))
            {
                if (CarriedOver(problem, outcome, settings) is { } carried) return carried;
                outcome = RunAll(problem, settings, progress);
                if (outcome.Legal) return outcome;
            }
        }
        // Find how big the board would have to be, keeping its proportions, with a quick search.
        var quick = settings with { Effort = Effort.Quick };
        var scale = Math.Max(1.1, Math.Sqrt(problem.RawArea * PlacerLimits.AutoAreaFactor(problem.Project.Parts.Count) / Math.Max(1, region.Width * region.Height)));
        RunOutcome? trial = null;
        for (var attempt = 0; attempt <= PlacerLimits.AutoGrowTries; attempt++, scale *= 1.15)
        {
            var (w, h) = (Math.Ceiling(board.Width!.Value * scale), Math.Ceiling(board.Height!.Value * scale));
            trial = RunAll(problem.WithRegion(Region.OfBoard(w, h, board.Margin)), quick, progress);
            if (!trial.Legal) continue;
            var e = trial.State.Extent();
            var needW = Math.Ceiling(e.MaxX + board.Margin);
            var needH = Math.Ceiling(e.MaxY + board.Margin);
            throw new PlacementImpossibleException(new PlacementFailure(
                string.Create(CultureInfo.InvariantCulture, $"board too small: the parts do not fit on {board.Width} x {board.Height} mm; a quick search fitted them on {needW} x {needH} mm."),
                string.Create(CultureInfo.InvariantCulture, $"Place with --board {needW}x{needH} (or --board auto to let the placer size it), or remove parts."),
                BoardTooSmall: true));
        }
        throw new PlacementImpossibleException(new PlacementFailure(
            "no legal layout found: " + string.Join("; ", trial!.State.Problems().Take(3)) + ".",
            "Check the named nets' lead limits (maxLead, rules.maxLead*), keep-outs and pad gaps; try --effort thorough, another --seed or a larger board."));
    }
}
