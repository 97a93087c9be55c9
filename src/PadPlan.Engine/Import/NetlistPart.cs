using PadPlan.Model;
using PadPlan.Model.Values;

namespace PadPlan.Import;

/// <summary>A part as read from a netlist, before it is mapped onto a footprint.</summary>
/// <param name="Ref">Reference, e.g. "R1" or "U2A".</param>
/// <param name="Kind">What the part is.</param>
/// <param name="Value">BOM text: a normalised value ("4k7", "100n") or free text ("NPN small-signal").</param>
/// <param name="Number">The parsed value, when the part has one (resistance, capacitance, inductance).</param>
/// <param name="Model">The SPICE model or subcircuit name, when given.</param>
/// <param name="Footprint">A footprint named in the netlist itself, else null for the default.</param>
/// <param name="Variant">A pin-order variant named in the netlist, else null.</param>
/// <param name="Pins">Symbol pins and their nets, in the netlist's order.</param>
/// <param name="Positional">True when the pins are only an order (SPICE two-terminal parts, subcircuit calls): they map onto the footprint's pins in turn.</param>
/// <param name="Line">1-based line in the netlist, for messages.</param>
public sealed record NetlistPart(
    string Ref,
    PartKind Kind,
    string Value,
    ComponentValue? Number,
    string? Model,
    string? Footprint,
    string? Variant,
    ValueList<NetlistPin> Pins,
    bool Positional,
    int Line);
