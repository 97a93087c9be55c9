using System.Globalization;

namespace PadPlan.Import;

/// <summary>
/// Subcircuit calls whose port names say how the part is pinned: ports named by DIP lead numbers (the usual 8-pin
/// op-amp pinouts), and three-port regulators and shunt references by port names. Pinouts are common practice,
/// from memory; the note asks the builder to check the data sheet.
/// </summary>
public static class StandardPinouts
{
    /// <summary>A recognised pinout: its name, footprint, the lead of each port, and the note to show.</summary>
    public sealed record Pinout(string Name, string Footprint, IReadOnlyDictionary<string, string> Leads, string Note);

    private static readonly string[] In = ["in", "vin", "input", "vi", "i"];
    private static readonly string[] Common = ["gnd", "com", "common", "adj", "g", "0"];
    private static readonly string[] Out = ["out", "vout", "output", "vo", "o"];
    private static readonly string[] Cathode = ["k", "cathode", "kat", "cat", "c"];
    private static readonly string[] Anode = ["a", "anode", "an"];
    private static readonly string[] Reference = ["ref", "r", "vref", "fb"];

    public static Pinout? Find(NetlistPart part)
    {
        // only SPICE calls: own-format parts already name their leads
        if (part.Kind != PartKind.Subcircuit || !part.Positional) return null;
        var names = part.Pins.Select(p => p.Name).ToList();
        return ByLeadNumbers(names) ?? ByRoles(names);
    }

    // Ports named 2 3 6 7 4 are DIP leads: the call order is not the lead order.
    private static Pinout? ByLeadNumbers(List<string> names)
    {
        var numbers = names.Select(n => int.TryParse(n, NumberStyles.None, CultureInfo.InvariantCulture, out var k) ? k : 0).ToList();
        if (numbers.Any(k => k is < 1 or > 14) || numbers.Distinct().Count() != numbers.Count) return null;
        if (numbers.SequenceEqual(Enumerable.Range(1, numbers.Count))) return null; // leads in call order: nothing to learn
        var leads = names.ToDictionary(n => n, n => n, StringComparer.OrdinalIgnoreCase);
        var set = numbers.ToHashSet();
        // Numbers are lead numbers only when they fit a standard pinout; otherwise they are the model's own node numbers
        // (a shunt reference "7 6 11"), and the call goes on a generic footprint in call order.
        var (name, footprint, what) = numbers.Max() <= 8 && set.IsSupersetOf([2, 3, 4, 6, 7]) && set.Count <= 7
            ? ("single op-amp pinout", "dip-8", "the usual single op-amp pinout (2 -in, 3 +in, 4 V-, 6 out, 7 V+)")
            : set.SetEquals(Enumerable.Range(1, 8))
            ? ("dual op-amp pinout", "dip-8", "the usual dual op-amp pinout (1 out A, 2 -in A, 3 +in A, 4 V-, 5 +in B, 6 -in B, 7 out B, 8 V+)")
            : set.Count >= 5 && set.IsSupersetOf([4, 11]) && QuadSection(set)
            ? ("quad op-amp pinout", "dip-14", "the usual quad op-amp pinout (4 V+, 11 V-, sections on 1-3, 5-7, 8-10, 12-14)")
            : default;
        if (name is null) return null;
        return new Pinout(name, footprint, leads, $"its ports are named by lead numbers ({string.Join(" ", names)}), so it is put on {footprint} with {what}.");
    }

    // Every lead other than the supplies belongs to a section whose three leads (out, -in, +in) are all there.
    private static bool QuadSection(HashSet<int> set)
    {
        int[][] sections = [[1, 2, 3], [5, 6, 7], [8, 9, 10], [12, 13, 14]];
        return set.All(k => k is 4 or 11 || sections.Any(s => s.Contains(k) && s.All(set.Contains)));
    }

    private static Pinout? ByRoles(List<string> names)
    {
        if (names.Count != 3) return null;
        var regulator = Assign(names, [In, Common, Out]);
        if (regulator is not null)
            return new Pinout("3-pin regulator pinout", "sip-3", regulator,
                "a three-pin regulator by its port names; put on sip-3 in the usual regulator order (1 in, 2 common, 3 out), as in a TO-220 package.");
        var shunt = Assign(names, [Reference, Anode, Cathode]);
        return shunt is null ? null : new Pinout("3-pin shunt reference pinout", "sip-3", shunt,
            "a three-pin shunt reference by its port names; put on sip-3 in the usual order (1 ref, 2 anode, 3 cathode), as in a TO-92 package.");
    }

    // Each role (in lead order 1, 2, 3) must be named by exactly one port.
    private static Dictionary<string, string>? Assign(List<string> names, string[][] roles)
    {
        var leads = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        for (var lead = 0; lead < roles.Length; lead++)
        {
            var matching = names.Where(n => roles[lead].Contains(n, StringComparer.OrdinalIgnoreCase)).ToList();
            if (matching.Count != 1 || leads.ContainsKey(matching[0])) return null;
            leads[matching[0]] = (lead + 1).ToString(CultureInfo.InvariantCulture);
        }
        return leads;
    }
}
