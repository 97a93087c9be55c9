namespace PadPlan.Model;

/// <summary>
/// What sort of component a part is: one name for the importer (default footprint, symbol pins), the materials
/// (gathering, soldering order, continuity readings) and the simulation (which model a part gets).
/// </summary>
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
    /// <summary>A potentiometer or trimmer resistor.</summary>
    Trimmer,
    TrimmerCap,
    /// <summary>Coupled windings on one core: a toroid or transformer.</summary>
    Transformer,
    FerriteBead,
    Fuse,
    /// <summary>Off-board wires: supply, signal input, heater, output.</summary>
    Landing,
    Other,
}
