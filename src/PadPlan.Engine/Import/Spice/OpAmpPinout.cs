namespace PadPlan.Import;

/// <summary>The usual DIP pinouts of single, dual and quad op-amps (common practice, no source), and how to recognise op-amp pins by name.</summary>
public static class OpAmpPinout
{
    public enum Role { NonInverting, Inverting, PositiveSupply, NegativeSupply, Output }

    /// <summary>The order most op-amp macromodels give their pins in: +in, -in, V+, V-, out (common practice, no source).</summary>
    public static IReadOnlyList<Role> MacromodelOrder { get; } = [Role.NonInverting, Role.Inverting, Role.PositiveSupply, Role.NegativeSupply, Role.Output];

    private static readonly Dictionary<string, Role> Names = new(StringComparer.OrdinalIgnoreCase)
    {
        ["in+"] = Role.NonInverting, ["+in"] = Role.NonInverting, ["inp"] = Role.NonInverting, ["in_p"] = Role.NonInverting, ["+"] = Role.NonInverting,
        ["noninv"] = Role.NonInverting, ["non_inv"] = Role.NonInverting, ["vin+"] = Role.NonInverting, ["vinp"] = Role.NonInverting, ["plus"] = Role.NonInverting,
        ["in-"] = Role.Inverting, ["-in"] = Role.Inverting, ["inn"] = Role.Inverting, ["in_n"] = Role.Inverting, ["-"] = Role.Inverting,
        ["inv"] = Role.Inverting, ["vin-"] = Role.Inverting, ["vinn"] = Role.Inverting, ["minus"] = Role.Inverting,
        ["v+"] = Role.PositiveSupply, ["vcc"] = Role.PositiveSupply, ["vdd"] = Role.PositiveSupply, ["vpos"] = Role.PositiveSupply, ["vs+"] = Role.PositiveSupply, ["vp"] = Role.PositiveSupply,
        ["v-"] = Role.NegativeSupply, ["vee"] = Role.NegativeSupply, ["vss"] = Role.NegativeSupply, ["vneg"] = Role.NegativeSupply, ["vs-"] = Role.NegativeSupply, ["vn"] = Role.NegativeSupply,
        ["out"] = Role.Output, ["output"] = Role.Output, ["vout"] = Role.Output, ["vo"] = Role.Output, ["o"] = Role.Output,
    };

    /// <summary>The role of each of five subcircuit pins when their names say it unambiguously, else null.</summary>
    public static IReadOnlyList<Role>? FromNames(IReadOnlyList<string> pins)
    {
        if (pins.Count != 5) return null;
        var roles = new List<Role>();
        foreach (var p in pins)
        {
            if (!Names.TryGetValue(p, out var role)) return null;
            roles.Add(role);
        }
        return roles.Distinct().Count() == 5 ? roles : null;
    }

    // Lead of each role per section: (out, -in, +in) per section, then the two supply leads.
    private static readonly int[][] DualSections = [[1, 2, 3], [7, 6, 5]];
    private static readonly int[][] QuadSections = [[1, 2, 3], [7, 6, 5], [8, 9, 10], [14, 13, 12]];

    /// <summary>The footprint and the DIP lead of a role in a section (0 = A): single (section count 0) on DIP-8, dual on DIP-8, quad on DIP-14.</summary>
    public static (string Footprint, int Lead) Lead(int sectionsInPackage, int section, Role role)
    {
        if (sectionsInPackage <= 1)
            return ("dip-8", role switch { Role.Inverting => 2, Role.NonInverting => 3, Role.NegativeSupply => 4, Role.Output => 6, _ => 7 });
        var quad = sectionsInPackage > 2;
        var leads = (quad ? QuadSections : DualSections)[section];
        return (quad ? "dip-14" : "dip-8", role switch
        {
            Role.Output => leads[0],
            Role.Inverting => leads[1],
            Role.NonInverting => leads[2],
            Role.PositiveSupply => quad ? 4 : 8,
            _ => quad ? 11 : 4,
        });
    }
}
