using System.Diagnostics;
using System.Globalization;
using System.Text;
using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Simulation;

namespace PadPlan.Bench;

/// <summary>
/// The operating point as a command runs it once: deck, ngspice process, parse, in wall-clock time. Cases: a chain of
/// common-emitter stages of our own (5 parts each, plus the supply landing) of about the size asked for, and the
/// examples that simulate.
/// </summary>
public static class OperatingPointBench
{
    public static void Run(int parts, int repeat, string examples)
    {
        Console.WriteLine($"load average before: {LoadAverage()}");
        var program = NgspiceProgram.Find(SimulationOptions.Default);
        Console.WriteLine($"ngspice: {program ?? "not found"}");
        if (program is null) return;
        Time($"{parts / 5} common-emitter stages, {parts / 5 * 5 + 1} parts", Stages(parts / 5), repeat);
        foreach (var (name, project) in ExampleNetlists.ImportAll(examples)) Time(name + $", {project.Parts.Count} parts", project, repeat);
        Console.WriteLine($"load average after: {LoadAverage()}");
    }

    /// <summary>N common-emitter stages on one 12 V rail, each 47k/10k divider, 4k7 collector, 1k emitter, an NPN (our own circuit).</summary>
    public static Project Stages(int stages)
    {
        var text = new StringBuilder("title bench stages\nnet GND ground\nnet V12 power 12V\nJ1 \"12 V supply\" landing-2 1=V12 2=GND\n");
        for (var i = 1; i <= stages; i++)
            text.Append(CultureInfo.InvariantCulture, $"""
                R{5 * i - 4} 47k 1=V12 2=B{i}
                R{5 * i - 3} 10k 1=B{i} 2=GND
                R{5 * i - 2} 4k7 1=V12 2=C{i}
                R{5 * i - 1} 1k 1=E{i} 2=GND
                Q{i} "NPN small-signal" to92/EBC C=C{i} B=B{i} E=E{i}

                """);
        return NetlistImporter.Import(Encoding.UTF8.GetBytes(text.ToString()), "stages.ppn", new ImportOptions(FootprintLibrary.Load(), null)).Project;
    }

    private static void Time(string name, Project project, int repeat)
    {
        var times = new List<double>();
        SimulationResult? last = null;
        for (var i = 0; i < repeat + 2; i++)
        {
            var clock = Stopwatch.StartNew();
            last = Simulator.Run(project);
            if (i >= 2) times.Add(clock.Elapsed.TotalMilliseconds); // the first two include JIT warm-up
        }
        times.Sort();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{name}: {(last!.Simulated ? "simulated" : last.Reason)}; {repeat} runs: median {times[times.Count / 2]:0} ms, worst {times[^1]:0} ms"));
    }

    private static string LoadAverage()
    {
        try { return string.Join(" ", File.ReadAllText("/proc/loadavg").Split(' ').Take(3)); }
        catch (IOException) { return "unknown"; }
    }
}
