using System.Diagnostics;
using PadPlan.Planning;

namespace PadPlan.Bench;

/// <summary>Times the stages of one run (annealing, legalising) for a synthetic case: `--profile N`.</summary>
internal static class Profile
{
    public static void Run(int parts, PlacerSettings settings)
    {
        var project = SyntheticCircuit.Make(parts, 1000 + parts);
        var problem = ProblemBuilder.Build(project, settings, CostWeights.Default);
        var state = new AnnealState(problem);
        var annealer = new Annealer(state, settings.Seed);
        var clock = Stopwatch.StartNew();
        annealer.Scatter();
        var steps = 0;
        annealer.Run(settings.MovesFactor, (step, cost, v) => { steps = step; if (step % 8 == 0) Console.WriteLine($"  step {step}: total {cost:0.0}, violation {v:0.00}"); });
        var anneal = clock.Elapsed.TotalSeconds;
        var violation = state.Violation;
        foreach (var line in state.Problems().Take(8)) Console.WriteLine("  " + line);
        foreach (var net in problem.Nets)
        {
            var bad = net.Leads.Select(l => (l, isl: state.IslandOf(l))).Where(x => x.isl >= 0).Select(x => (x.l, x.isl, len: state.Land(x.l, x.isl, out _, out _, out var v), v)).ToList();
            if (bad.All(b => b.v <= 1e-9) && bad.Count == net.Leads.Length) continue;
            Console.WriteLine($"  net {net.Net.Name}: islands {string.Join(",", net.Islands.Select(i => problem.Islands[i].Id + "/cap" + problem.Islands[i].Capacity))}");
            foreach (var b in bad) Console.WriteLine($"    {problem.Items[problem.Leads[b.l].Item].Name}.{problem.Leads[b.l].Pin} -> {problem.Islands[b.isl].Id}: {b.len:0.00} mm, violation {b.v:0.00}, max {problem.Leads[b.l].MaxReach}");
        }
        var e = state.Extent();
        Console.WriteLine($"  region {problem.Region.Width:0.0} x {problem.Region.Height:0.0}, extent {e.Width:0.0} x {e.Height:0.0}, raw area {problem.RawArea:0}");
        clock.Restart();
        var legal = Legaliser.Finish(state);
        var legalise = clock.Elapsed.TotalSeconds;
        Console.WriteLine($"{parts} parts, {problem.Items.Length} items: anneal {anneal:0.00} s ({annealer.Stats.TotalTried} moves, {steps} steps, {annealer.Stats.TotalTried / anneal:0} moves/s), violation after anneal {violation:0.###}; legalise {legalise:0.00} s, legal {legal}");
        Console.WriteLine(annealer.Stats);
    }
}
