namespace PadPlan.Materials;

/// <summary>What sort of component a part is, as far as gathering, soldering and continuity testing care.</summary>
public enum PartKind
{
    Resistor,
    Potentiometer,
    TrimmerCapacitor,
    Capacitor,
    Inductor,
    FerriteBead,
    Transformer,
    Diode,
    Transistor,
    IntegratedCircuit,
    Crystal,
    Fuse,
    Wire,
    Other,
}
