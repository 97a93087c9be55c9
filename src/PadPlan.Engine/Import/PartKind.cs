namespace PadPlan.Import;

/// <summary>What a netlist part is, which decides its default footprint and symbol pin names.</summary>
public enum PartKind
{
    Resistor,
    Capacitor,
    Inductor,
    Diode,
    Led,
    Bjt,
    Jfet,
    Mosfet,
    /// <summary>An IC or module: a SPICE subcircuit call, or a U/IC part of the own format.</summary>
    Subcircuit,
    Crystal,
    Trimmer,
    TrimmerCap,
    /// <summary>Coupled windings on one core: a toroid or transformer.</summary>
    Transformer,
    /// <summary>Off-board wires: supply, signal input, heater, output.</summary>
    Landing,
}
