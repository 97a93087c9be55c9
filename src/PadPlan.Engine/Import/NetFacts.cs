using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>What a netlist says about one net; null fields were not said.</summary>
public sealed record NetFacts(
    string Name,
    bool? Ground = null,
    NetClass? Class = null,
    double? Voltage = null,
    bool VoltageEstimated = false,
    double? Current = null,
    double? MaxLead = null,
    SignalRole? Role = null,
    bool Supply = false,
    bool OpenEnded = false)
{
    /// <summary>These facts with the other's stated fields laid over them.</summary>
    public NetFacts Merge(NetFacts other) => new(
        Name,
        other.Ground ?? Ground,
        other.Class ?? Class,
        other.Voltage is null ? Voltage : Voltage is null || Math.Abs(other.Voltage.Value) > Math.Abs(Voltage.Value) ? other.Voltage : Voltage,
        other.Voltage is null ? VoltageEstimated : other.VoltageEstimated,
        other.Current ?? Current,
        other.MaxLead ?? MaxLead,
        other.Role ?? Role,
        Supply || other.Supply,
        OpenEnded || other.OpenEnded);
}
