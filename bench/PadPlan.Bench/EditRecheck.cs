using System.Diagnostics;
using System.Globalization;
using System.Text.Json;
using PadPlan.Editor.Edits;
using PadPlan.Editor.View;
using PadPlan.Model;
using PadPlan.Planning;

namespace PadPlan.Bench;

/// <summary>
/// What the editor's server does after every change, timed: apply one edit, run the real check, build the page's view
/// and write it as JSON. Two 200-part plans: the checker benchmark's rows of resistors, and a synthetic circuit placed
/// by the placer (a denser, more mixed board).
/// </summary>
public static class EditRecheck
{
    public static void Run(int parts, int edits)
    {
        Console.WriteLine($"load average before: {LoadAverage()}");
        Time($"rows of resistors, {parts} parts", CheckBenchPlan.Build(parts), edits);
        var placed = Placer.Place(SyntheticCircuit.Make(parts, 1000 + parts), new PlacerSettings(1, Effort.Quick));
        if (placed.Succeeded) Time($"synthetic circuit, {parts} parts, placed (quick)", placed.Project!, edits);
        else Console.WriteLine($"synthetic {parts}: placement failed: {placed.Failure!.Message}");
        Console.WriteLine($"load average after: {LoadAverage()}");
    }

    private static void Time(string name, Project plan, int edits)
    {
        var movable = plan.Layout!.Placements.Select(p => p.Ref).ToList();
        var json = new JsonSerializerOptions(JsonSerializerDefaults.Web);
        var times = new List<double>();
        var checks = new List<double>();
        var current = plan;
        for (var i = 0; i < edits + 5; i++)
        {
            var reference = movable[i * 7 % movable.Count];
            var at = current.Layout!.Placements.First(p => p.Ref == reference).Position;
            var shift = i % 2 == 0 ? 0.5 : -0.5;
            var clock = Stopwatch.StartNew();
            current = EditApplier.Apply(current, new EditRequest { Kind = "move-part", Ref = reference, X = at.X + shift, Y = at.Y });
            var view = PlanViews.Build(current);
            var bytes = JsonSerializer.SerializeToUtf8Bytes(view, json);
            if (i >= 5) // the first few include JIT warm-up
            {
                times.Add(clock.Elapsed.TotalMilliseconds);
                checks.Add(view.CheckMilliseconds);
            }
            GC.KeepAlive(bytes);
        }
        times.Sort();
        checks.Sort();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{name}: {edits} edits; edit + check + view + JSON per edit: median {times[times.Count / 2]:0.0} ms, 90th percentile {times[(int)(times.Count * 0.9)]:0.0} ms, worst {times[^1]:0.0} ms; the check alone: median {checks[checks.Count / 2]:0.0} ms, worst {checks[^1]:0.0} ms"));
    }

    private static string LoadAverage()
    {
        try
        {
            return string.Join(" ", File.ReadAllText("/proc/loadavg").Split(' ').Take(3));
        }
        catch (IOException)
        {
            return "unknown";
        }
    }
}
