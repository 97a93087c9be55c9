using System.Globalization;
using PadPlan.Model;

namespace PadPlan.Simulation;

/// <summary>
/// The one place that says which voltage to print for a net and what it is: the simulated operating point (to 0.01 V,
/// marked "sim."), or without one the importer's figure: a stated voltage as stated, an estimate as an upper bound
/// from DC paths (marked "≤ ... bound"). Sheets, tables and cautions all print through here.
/// </summary>
public static class NetVoltage
{
    /// <summary>" (8.27 V sim.)", " (≤ 12 V bound)", " (12 V stated)", or "" when nothing is known.</summary>
    public static string Short(Net? net, SimulationResult? simulation)
    {
        if (net is null || net.Ground) return "";
        if (simulation?.Point?.Volts(net.Name) is { } v) return $" ({Simulated(v)} sim.)";
        if (net.Voltage is not { } bound) return "";
        return net.VoltageEstimated ? string.Create(CultureInfo.InvariantCulture, $" (\u2264 {bound:0.#} V bound)") : string.Create(CultureInfo.InvariantCulture, $" ({bound:0.#} V stated)");
    }

    /// <summary>A simulated voltage as printed: two decimals.</summary>
    public static string Simulated(double volts) => volts.ToString("0.00", CultureInfo.InvariantCulture) + " V";

    /// <summary>What the voltages on a sheet are, in one line: simulated with the supply current, or the reason with "upper bound from DC paths".</summary>
    public static string Summary(SimulationResult? simulation)
    {
        if (simulation?.Point is not { } op)
            return $"Voltages: {(simulation ?? SimulationResult.Without("not simulated")).Label}; 'stated' ones are as the netlist gives them.";
        var supplies = op.Supplies.Count == 0 ? "no supply on a wire landing"
            : string.Join(", ", op.Supplies.Select(s => $"{s.Net} {Simulated(s.Volts)} at {Amps(s.Amps)}"));
        return $"Voltages: simulated by ngspice at the DC operating point (sim.); supply {supplies}.";
    }

    public static string Amps(double amps) => Math.Abs(amps) < 1
        ? (amps * 1000).ToString("0.##", CultureInfo.InvariantCulture) + " mA"
        : amps.ToString("0.###", CultureInfo.InvariantCulture) + " A";
}
