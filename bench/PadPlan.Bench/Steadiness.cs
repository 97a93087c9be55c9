using System.Diagnostics;
using System.Globalization;
using System.Text;
using PadPlan.Model;
using PadPlan.Planning;

namespace PadPlan.Bench;

/// <summary>
/// Seed to seed: each case placed with seeds 1 to N at one effort, its total lead, longest lead and longest RF lead, and the
/// total lead against the best known layout (the lowest total lead of many seeds at thorough effort, found in the same run).
/// Lead lengths do not depend on the machine or its load, so these figures hold on a shared machine.
/// </summary>
internal static class Steadiness
{
    public sealed record Seeded(int Seed, double Total, double Longest, double LongestRf, double Cost, int Runs, double Seconds);

    /// <summary>The cases the steadiness target names: every example and synthetic circuits of 50 and 100 parts.</summary>
    public static List<(string Name, Project Project)> Cases(IEnumerable<(string Name, Project Project)> examples) =>
        [.. examples, ("synthetic 50", SyntheticCircuit.Make(50, 1050)), ("synthetic 100", SyntheticCircuit.Make(100, 1100))];

    public static List<Seeded> Place(Project project, PlacerSettings settings, IEnumerable<int> seeds, string name)
    {
        var list = new List<Seeded>();
        foreach (var seed in seeds)
        {
            var clock = Stopwatch.StartNew();
            var result = Placer.Place(project, settings with { Seed = seed });
            var seconds = clock.Elapsed.TotalSeconds;
            if (!result.Succeeded) { Console.Error.WriteLine($"  {name} seed {seed}: failed ({result.Failure!.Message})"); continue; }
            var s = result.Summary!;
            list.Add(new Seeded(seed, s.TotalLead, s.LongestLead, s.LongestRfLead, s.Cost, s.Runs, seconds));
            Console.Error.WriteLine(FormattableString.Invariant($"  {name} {settings.Effort} seed {seed}: lead {s.TotalLead:0.0} longest {s.LongestLead:0.0} rf {s.LongestRfLead:0.0} cost {s.Cost:0.0} runs {s.Runs} {seconds:0.00} s"));
        }
        return list;
    }

    /// <summary>The table: per case the seeds' total lead (median, range, spread), worst over best known, longest lead, longest RF lead.</summary>
    public static string Table(List<(string Name, Project Project)> cases, PlacerSettings settings, int seeds, int bestKnownSeeds)
    {
        var table = new StringBuilder();
        table.AppendLine("| case | parts | total lead (mm) | spread | lead floor (mm) | above the floor: spread | best known (mm) | worst / best known | longest lead (mm) | longest RF lead (mm) | time per seed (s) |");
        table.AppendLine("|---|---|---|---|---|---|---|---|---|---|---|");
        foreach (var (name, project) in cases)
        {
            var runs = Place(project, settings, Enumerable.Range(1, seeds), name);
            if (runs.Count == 0) { table.AppendLine($"| {name} | {project.Parts.Count} | failed | - | - | - | - | - | - | - | - |"); continue; }
            // no layout can beat the floor (WireFloor), so the seeds differ only in the lead above it
            var floor = ProblemBuilder.Build(project, settings, CostWeights.Default).LeadLengthFloor;
            var above = Spread.Of([.. runs.Select(r => r.Total - floor)]);
            var best = bestKnownSeeds > 0 ? Place(project, settings with { Effort = Effort.Thorough }, Enumerable.Range(1, bestKnownSeeds), name) : [];
            var t = Spread.Of([.. runs.Select(r => r.Total)]);
            var l = Spread.Of([.. runs.Select(r => r.Longest)]);
            var rf = Spread.Of([.. runs.Select(r => r.LongestRf)]);
            var known = best.Count > 0 ? Math.Min(best.Min(b => b.Total), t.Min) : double.NaN;
            var knownText = best.Count > 0
                ? FormattableString.Invariant($"{known:0.0} (thorough seed {best.MinBy(b => b.Total)!.Seed} of {best.Count}{(t.Min < best.Min(b => b.Total) ? "; beaten by a normal seed" : "")})")
                : "-";
            table.AppendLine(FormattableString.Invariant(
                $"| {name}{(runs.Count < seeds ? $" ({seeds - runs.Count} seeds failed)" : "")} | {project.Parts.Count} | {t.Median:0.0} ({t.Min:0.0}-{t.Max:0.0}) | {t.Width:P0} | {floor:0.0} | {above.Width:P0} | {knownText} | {(best.Count > 0 ? (t.Max / known).ToString("0.00", CultureInfo.InvariantCulture) : "-")} | {l.Median:0.0} ({l.Min:0.0}-{l.Max:0.0}) | {(rf.Max > 0 ? FormattableString.Invariant($"{rf.Median:0.0} ({rf.Min:0.0}-{rf.Max:0.0})") : "no RF net")} | {Spread.Of([.. runs.Select(r => r.Seconds)]).Median:0.00} |"));
        }
        return table.ToString();
    }
}
