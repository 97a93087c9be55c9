namespace PadPlan.Materials;

/// <summary>What a continuity tester shows between two nets because of the parts between them, with the board built right.</summary>
public enum DcReading
{
    /// <summary>No DC path below the beep threshold: silent.</summary>
    Open,
    /// <summary>A DC path below the threshold through windings, beads, fuses or low resistors: beeps, and that is no fault.</summary>
    Low,
    /// <summary>Through a forward diode or transistor junction: may beep with the probes one way round and not the other.</summary>
    OneWay,
    /// <summary>Depends on something the netlist does not say (which winding a pin is on, a potentiometer's setting).</summary>
    Maybe,
}
