using System.Diagnostics;
using PadPlan.Planning;

namespace PadPlan.Bench;

/// <summary>Times the stages of one run (start, annealing, legalising, polishing) for a synthetic case and counts the work per move: `--profile N`.</summary>
internal static class Profile
{
    /// <summary>Every this many temperatures the trace prints a line.</summary>
    private const int Trace = 10;

    public static void Run(int parts, PlacerSettings settings)
    {
        var project = SyntheticCircuit.Make(parts, 1000 + parts);
        var cpu = Process.GetCurrentProcess();
        var clock = Stopwatch.StartNew();
        var problem = ProblemBuilder.Build(project, settings, CostWeights.Default);
        var state = new AnnealState(problem);
        var annealer = new Annealer(state, settings.Seed);
        var build = Lap(clock);
        annealer.Start(settings.Start == StartKind.Mixed ? StartKind.Spring : settings.Start, 0);
        var start = Lap(clock);
        (state.NetEvaluations, state.LandingsFound, state.PairTests) = (0, 0, 0);
        var cpuBefore = cpu.TotalProcessorTime;
        long lastTried = 0, lastKept = 0;
        annealer.Run(settings.MovesFactor, (step, total, v) =>
        {
            if (step % Trace != 0) return;
            var (tried, kept) = (annealer.Stats.TotalTried, annealer.Stats.Kept.Sum());
            Console.WriteLine($"  step {step}: total {total:0.0}, violation {v:0.00}, kept {(double)(kept - lastKept) / Math.Max(1, tried - lastTried):P0}");
            (lastTried, lastKept) = (tried, kept);
        });
        var anneal = Lap(clock);
        cpu.Refresh();
        var annealCpu = (cpu.TotalProcessorTime - cpuBefore).TotalSeconds;
        var moves = annealer.Stats.TotalTried;
        var (nets, landings, pairs) = (state.NetEvaluations, state.LandingsFound, state.PairTests);
        var violation = state.Violation;
        foreach (var line in state.Problems().Take(violation > 1e-9 ? 6 : 0)) Console.WriteLine("  still broken: " + line);
        for (var k = 0; k < Math.Min(8, state.BrokenNetCount); k++)
            {
                var net = problem.Nets[state.BrokenNet(k)];
                string Where(int isl) => problem.Islands[isl].StripGroup >= 0 ? "strip of " + problem.Items[problem.Islands[isl].Item].Name : "pad";
                Console.WriteLine($"  broken net {net.Net.Name} (max lead {net.MaxLead} mm): islands {string.Join(", ", net.Islands.Select(i => $"{Where(i)} cap {problem.Islands[i].Capacity}"))}; leads {string.Join(", ", net.FreeLeads.Select(l => { var s = state.IslandOf(l); if (s < 0) return "-"; var len = state.Land(l, s, out _, out _, out var v); return $"{problem.Items[problem.Leads[l].Item].Name}.{problem.Leads[l].Pin} {len:0.0}{(v > 1e-9 ? $" OVER {v:0.0}" : "")}"; }))}");
            }
        Console.WriteLine("  broken after annealing: " + Broken(state));
        var legal = Legaliser.Finish(state);
        var legalise = Lap(clock);
        Console.WriteLine("  broken after the legaliser: " + Broken(state));
        if (legal) { annealer.Polish(settings.MovesFactor); legal = Legaliser.Finish(state); }
        var polish = Lap(clock);
        var e = state.Extent();
        Console.WriteLine($"{parts} parts, {problem.Items.Length} items ({problem.Leads.Length} leads, {problem.Nets.Length} nets), start {settings.Start}, effort {settings.Effort}, one run on one thread");
        var big = problem.Nets.OrderByDescending(n => n.Islands.Length).First();
        Console.WriteLine($"  largest net by islands: {big.Net.Name}, {big.Leads.Length} leads ({big.FreeLeads.Length} free) on {big.Islands.Length} islands; largest by leads: {problem.Nets.Max(n => n.Leads.Length)} leads");
        Console.WriteLine($"  moves per temperature {annealer.MovesPerTemperature(settings.MovesFactor)}, temperatures {annealer.Stats.Temperatures}, moves {moves} ({moves / anneal:0} moves/s wall, {moves / Math.Max(1e-9, annealCpu):0} per CPU s)");
        Console.WriteLine($"  stages (wall s): build {build:0.000}, start {start:0.000}, anneal {anneal:0.000} (CPU {annealCpu:0.000}), legalise {legalise:0.000}, polish {polish:0.000}");
        Console.WriteLine($"  inner loop: {annealer.Stats.InnerLoopBytes} bytes allocated over {annealer.Stats.InnerLoopMoves} moves ({(double)annealer.Stats.InnerLoopBytes / Math.Max(1, annealer.Stats.InnerLoopMoves):0.###} per move)");
        Console.WriteLine($"  work per move (annealing, incl. the recount after each temperature): {(double)nets / moves:0.00} net evaluations, {(double)landings / moves:0.0} lead landings, {(double)pairs / moves:0.0} item pairs");
        Console.WriteLine($"  violation after annealing {violation:0.###}; legal {legal}; cost {state.Cost:0}; lead {state.LeadTotal():0} mm; extent {e.Width:0} x {e.Height:0} mm in region {problem.Region.Width:0} x {problem.Region.Height:0}");
        Console.WriteLine("  " + annealer.Stats);
    }

    /// <summary>The items that still break a rule, worst first, with what each breaks (mm): where a run's failures sit.</summary>
    private static string Broken(AnnealState s)
    {
        var items = s.Problem.Items;
        var broken = Enumerable.Range(0, items.Length).Select(i => (Item: i, V: s.ViolationOf(i))).Where(x => x.V > 1e-9).OrderByDescending(x => x.V).ThenBy(x => x.Item).ToList();
        return broken.Count == 0 ? "none" : $"{s.Violation:0.###} mm over {broken.Count} items: " + string.Join(", ", broken.Take(12).Select(x => $"{items[x.Item].Name} {x.V:0.00}"));
    }

    private static double Dist(AnnealState s, int l)
    {
        var (ex, ey) = s.Exit(l);
        var (ix, iy, _, _) = s.IslandBox(s.IslandOf(l));
        return Math.Sqrt((ex - ix) * (ex - ix) + (ey - iy) * (ey - iy));
    }

    private static double Lap(Stopwatch clock)
    {
        var s = clock.Elapsed.TotalSeconds;
        clock.Restart();
        return s;
    }
}
