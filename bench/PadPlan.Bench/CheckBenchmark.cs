using BenchmarkDotNet.Attributes;
using PadPlan.Model;
using PadPlan.Rules;

namespace PadPlan.Bench;

/// <summary>Times a full check of a synthetic plan: rows of axial resistors chained pad to pad, each row ending on a ground landing.</summary>
[MemoryDiagnoser]
public class CheckBenchmark
{
    [Params(200)]
    public int Parts { get; set; }

    private Project _plan = null!;

    [GlobalSetup]
    public void Setup() => _plan = CheckBenchPlan.Build(Parts);

    [Benchmark]
    public CheckReport Check() => Checker.Check(_plan);
}

/// <summary>Builds a valid plan of any size for timing the checker.</summary>
public static class CheckBenchPlan
{
    private const int PerRow = 20;
    private const double Pitch = 12;
    private const double RowPitch = 10;

    public static Project Build(int parts)
    {
        var resistor = new Footprint("res-bench", "resistors", "axial resistor",
            ValueList.Of(new Point(-3.15, -1.2), new Point(3.15, -1.2), new Point(3.15, 1.2), new Point(-3.15, 1.2)), 2.4,
            ValueList.Of(new FootprintLead("1", new Point(-3.15, 0), 0.6, 1.7, 20), new FootprintLead("2", new Point(3.15, 0), 0.6, 1.7, 20)),
            MountStyle.Axial, "typical");
        var rows = (parts + PerRow - 1) / PerRow;
        var nets = new List<Net> { new("GND", Ground: true) };
        var partList = new List<Part>();
        var pads = new List<Pad>();
        var placements = new List<Placement>();
        for (var i = 0; i < parts; i++)
        {
            var row = i / PerRow;
            var col = i % PerRow;
            var y = 6 + row * RowPitch;
            var left = $"N{row}_{col}";
            var last = col == PerRow - 1 || i == parts - 1;
            var right = last ? "GND" : $"N{row}_{col + 1}";
            if (col == 0)
            {
                nets.Add(new Net(left));
                pads.Add(new RoundPad(left, left, new Point(6, y), 4.76));
            }
            if (!last)
            {
                nets.Add(new Net(right));
                pads.Add(new RoundPad(right, right, new Point(6 + (col + 1) * Pitch, y), 4.76));
            }
            var x = 6 + col * Pitch + Pitch / 2;
            partList.Add(new Part($"R{i + 1}", "10k", resistor.Name, ValueList.Of(new PinNet("1", left), new PinNet("2", right))));
            placements.Add(new Placement($"R{i + 1}", new Point(x, y), Rotation.R0, ValueList.Of(
                new LeadLanding("1", left, new Point(x - Pitch / 2 + 1, y)),
                new LeadLanding("2", last ? null : right, new Point(x + Pitch / 2 - (last ? -0 : 1), y)))));
        }
        var board = new Board(12 + PerRow * Pitch, 12 + rows * RowPitch);
        return new Project("bench", board, Toolkit.Default, RuleSettings.Default, nets.ToValueList(), partList.ToValueList(),
            ValueList.Of(resistor), new Layout(pads.ToValueList(), placements.ToValueList(), ValueList<Jumper>.Empty));
    }
}
