using PadPlan.Model;

namespace PadPlan.Simulation;

/// <summary>What one part does at the operating point: the current into each sensed lead (A, positive into the part) and the power it turns into heat (W).</summary>
public sealed record PartFigures(string Ref, ValueList<LeadCurrent> Leads, double Power)
{
    /// <summary>The current into a lead, or null when the lead was not sensed.</summary>
    public double? CurrentInto(string pin) => Leads.FirstOrDefault(l => string.Equals(l.Pin, pin, StringComparison.OrdinalIgnoreCase))?.Amps;

    /// <summary>The largest current through any one lead.</summary>
    public double LargestCurrent => Leads.Count == 0 ? 0 : Leads.Max(l => Math.Abs(l.Amps));
}

/// <summary>The current into one lead of a part (A).</summary>
public sealed record LeadCurrent(string Pin, double Amps);

/// <summary>One supply of the board at the operating point: its source, the net it drives, its voltage and the current it delivers (A).</summary>
public sealed record SupplyFigure(string Source, string Net, double Volts, double Amps);

/// <summary>
/// The DC operating point of a project's circuit, by ngspice: the voltage of every net (ground nets 0 V), the current each
/// supply delivers, and each sensed part's lead currents and dissipation.
/// </summary>
public sealed record OperatingPoint(
    IReadOnlyDictionary<string, double> NetVolts,
    ValueList<SupplyFigure> Supplies,
    IReadOnlyDictionary<string, PartFigures> Parts)
{
    public double? Volts(string net) => NetVolts.TryGetValue(net, out var v) ? v : null;

    /// <summary>The voltage at a part's lead (that of the net the lead joins).</summary>
    public double? LeadVolts(Part part, string pin) => part.NetOf(pin) is { } net ? Volts(net) : null;

    public PartFigures? Of(string reference) => Parts.GetValueOrDefault(reference);

    /// <summary>All current the supplies deliver (A); a supply that takes current in counts as zero.</summary>
    public double SupplyCurrent => Supplies.Sum(s => Math.Max(0, s.Amps));
}
