namespace PadPlan.Model;

/// <summary>What a net carries, which sets its lead-length limit and parasitic reporting.</summary>
public enum NetClass
{
    General,
    Rf,
    Audio,
    Power,
    Hv,
}

/// <summary>Where a net sits in the signal flow, so input and output are kept apart.</summary>
public enum SignalRole
{
    None,
    Input,
    Output,
}

/// <summary>A node of the circuit with the facts the rules need. OpenEnded marks a net meant to have one connection only (a test point, an antenna lead).</summary>
public sealed record Net(string Name, bool Ground = false, NetClass Class = NetClass.General, double? Voltage = null, bool VoltageEstimated = false, double? Current = null, double? MaxLead = null, SignalRole Role = SignalRole.None, bool OpenEnded = false)
{
    public string Name { get; } = Guard.Name(Name, "net name");
    /// <summary>Largest DC or peak AC voltage to ground (V).</summary>
    public double? Voltage { get; } = Voltage is null || double.IsFinite(Voltage.Value) ? Voltage : throw new ArgumentOutOfRangeException(nameof(Voltage), "net voltage must be finite.");
    /// <summary>Largest current the net carries (A).</summary>
    public double? Current { get; } = Current is null || Current >= 0 ? Current : throw new ArgumentOutOfRangeException(nameof(Current), "net current must be zero or more.");
    /// <summary>Longest lead allowed on this net (mm); null takes the class default from the rule settings.</summary>
    public double? MaxLead { get; } = Guard.PositiveOrNull(MaxLead, "maximum lead length");
}
