using PadPlan.Model;
using PadPlan.Simulation;

namespace PadPlan.Output.Tables;

/// <summary>
/// The power-up section of the test plan: the bench supply's current limit (the simulated supply current with a stated
/// margin) and the first voltages to measure at named pads, each with a tolerance band; without a simulator, upper
/// bounds only, and said so.
/// </summary>
public static class PowerUpTable
{
    /// <summary>The current limit is the simulated current times this, and at least <see cref="LimitFloor"/> above it. Common practice, no source.</summary>
    public const double LimitFactor = 1.5;

    /// <summary>Least headroom of the current limit over the simulated current (A). Common practice, no source.</summary>
    public const double LimitFloor = 0.005;

    /// <summary>The tolerance band of a measured voltage, as a fraction of the simulated one (see the table's notes). Common practice, no source.</summary>
    public const double Band = 0.10;

    /// <summary>The least band (V): a handheld meter's last digit and the probes' contact on a 2 V range. Common practice, no source.</summary>
    public const double BandFloor = 0.05;

    /// <summary>Most nets listed for measuring: the first ones a builder checks.</summary>
    public const int MaxNets = 30;

    public const string Title = "Power-up: current limit and first voltages";

    public static ReportTable For(Project project, SimulationResult? simulation)
    {
        var rows = new List<string[]>();
        var islands = project.Layout?.Islands().OrderBy(i => i.Id, NaturalOrder.Comparer).ToList() ?? [];
        string PadOf(string net) => islands.FirstOrDefault(i => i.Net == net)?.Id ?? $"net {net}";
        var op = simulation?.Point;
        var supplies = op?.Supplies.Where(s => s.Amps > 0).ToList() ?? [];
        if (op is not null && supplies.Count > 0)
        {
            foreach (var s in supplies)
            {
                var limit = Math.Max(s.Amps * LimitFactor, s.Amps + LimitFloor);
                rows.Add(Row(rows, $"Set the bench supply for {s.Net}", PadOf(s.Net),
                    $"{NetVoltage.Simulated(s.Volts)}, current limit {NetVoltage.Amps(limit)}",
                    $"simulated supply current {NetVoltage.Amps(s.Amps)} x {LimitFactor}, at least {NetVoltage.Amps(LimitFloor)} above it"));
                rows.Add(Row(rows, "Switch on and read the supply current first", PadOf(s.Net),
                    $"about {NetVoltage.Amps(s.Amps)} (sim.)",
                    "at the limit: switch off, look for a short or a reversed part"));
            }
        }
        else
        {
            rows.Add(Row(rows, "Set the bench supply's current limit low", "supply landing",
                "start at 20-50 mA, raise it slowly while watching the current",
                (simulation ?? SimulationResult.Without("not simulated")).Label));
        }
        var supplyNets = supplies.Select(s => s.Net).ToHashSet(StringComparer.Ordinal);
        // highest voltages first: the rails, then what hangs from them
        foreach (var net in project.Nets.Where(n => !n.Ground && !supplyNets.Contains(n.Name))
            .OrderByDescending(n => Math.Abs(op?.Volts(n.Name) ?? n.Voltage ?? 0)).ThenBy(n => n.Name, NaturalOrder.Comparer).Take(MaxNets))
        {
            if (op?.Volts(net.Name) is { } v)
            {
                var band = Math.Max(Math.Abs(v) * Band, BandFloor);
                rows.Add(Row(rows, $"Measure {net.Name} to the plane", PadOf(net.Name),
                    $"{NetVoltage.Simulated(v)} \u00b1 {NetVoltage.Simulated(band)} (sim.)", $"{NetVoltage.Simulated(v - band)} to {NetVoltage.Simulated(v + band)}"));
            }
            else if (op is null && net.Voltage is { } bound)
                rows.Add(Row(rows, $"Measure {net.Name} to the plane", PadOf(net.Name),
                    net.VoltageEstimated ? $"\u2264 {bound:0.#} V (upper bound)" : $"{bound:0.#} V (stated)",
                    net.VoltageEstimated ? SimulationResult.UpperBound : "as the netlist states"));
        }
        var notes = new List<string>
        {
            Cautions.PoweredBoard,
            NetVoltage.Summary(simulation),
            op is null
                ? "Without a simulator the figures are upper bounds: a node fed through resistors sits at or below the supply it reaches; the real value can be much lower."
                : $"Tolerance band: \u00b1{Band:P0} of the simulated voltage, at least \u00b1{BandFloor:0.00} V. A voltage set by the ratio of two 5 % resistors moves by up to the sum of their tolerances, and the generic transistor and zener models differ from the part in hand by about as much (common practice, no source). Measure each at its pad with the black probe on the plane.",
        };
        if (Cautions.HighVoltageWarning(project) is { } hv) notes.Insert(0, "Caution: " + hv);
        return ReportTable.Create(Title, ["#", "Step", "Where", "Expect", "How it is found", "Done"], rows, notes);
    }

    private static string[] Row(List<string[]> rows, string step, string where, string expect, string how) =>
        [(rows.Count + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), step, where, expect, how, ""];
}
