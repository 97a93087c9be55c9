using PadPlan.Model.Standards;
using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>Gives a net its class and role when the netlist does not state them. Deliberately simple, and documented in docs/netlist-format.md.</summary>
public static class NetClassifier
{
    public static Net ToNet(NetFacts f)
    {
        var ground = f.Ground ?? NetNames.IsGround(f.Name);
        var cls = f.Class ?? (ground ? NetClass.Power
            : f.Voltage is { } v && HighVoltage.Applies(v) ? NetClass.Hv
            : f.Supply ? NetClass.Power
            : NetClass.General);
        var role = f.Role ?? (NetNames.LooksLikeOutput(f.Name) ? SignalRole.Output : SignalRole.None);
        return new Net(f.Name, ground, cls, f.Voltage, f.Voltage is not null && f.VoltageEstimated, f.Current, f.MaxLead, role, f.OpenEnded);
    }
}
