using PadPlan.Model;

namespace PadPlan.Tests.Planning;

/// <summary>Projects built in code for the placement tests.</summary>
public static class TestCircuits
{
    public static Part Part(string reference, string footprint, params (string Pin, string Net)[] pins) =>
        new(reference, "", footprint, pins.Select(p => new PinNet(p.Pin, p.Net)).ToValueList());

    public static Project Project(string name, Board board, IEnumerable<Net> nets, IEnumerable<Part> parts, RuleSettings? rules = null) =>
        new(name, board, Toolkit.Default, rules ?? RuleSettings.Default, nets.ToValueList(), parts.ToValueList(), TestFootprints.All);

    /// <summary>A small amplifier stage around a DIP-8 with a grounded pin and an unconnected pin, input and output wire landings.</summary>
    public static Project DipStage(Board board) => Project("dip-stage", board,
        [new Net("GND", Ground: true), new Net("VCC", Class: NetClass.Power), new Net("IN", Class: NetClass.Audio, Role: SignalRole.Input),
         new Net("INV"), new Net("OUT", Class: NetClass.Audio, Role: SignalRole.Output), new Net("REF")],
        [
            Part("J1", "landing-1", ("1", "IN")),
            Part("C1", "cap-disc-5mm", ("1", "IN"), ("2", "REF")),
            Part("R1", "res-axial-250mw", ("1", "VCC"), ("2", "REF")),
            Part("R2", "res-axial-250mw", ("1", "REF"), ("2", "GND")),
            Part("U1", "dip8", ("1", "OUT"), ("2", "INV"), ("3", "REF"), ("4", "GND"), ("7", "VCC")),
            Part("R3", "res-axial-250mw", ("1", "INV"), ("2", "OUT")),
            Part("R4", "res-axial-250mw", ("1", "INV"), ("2", "GND")),
            Part("C2", "cap-disc-5mm", ("1", "VCC"), ("2", "GND")),
            Part("J2", "landing-1", ("1", "OUT")),
            Part("J3", "landing-1", ("1", "VCC")),
        ]);

    /// <summary>A random circuit of two-lead parts, transistors and now and then a DIP: nets of two or more leads and one ground net.</summary>
    public static Project Random(int seed, int parts)
    {
        var rng = new Random(seed);
        var netCount = Math.Max(2, parts * 2 / 3);
        var nets = new List<Net> { new("GND", Ground: true) };
        for (var i = 1; i <= netCount; i++)
            nets.Add(new Net($"N{i}", Class: i == 1 ? NetClass.Rf : NetClass.General, Role: i == 2 ? SignalRole.Input : i == 3 ? SignalRole.Output : SignalRole.None));
        string NetFor() => rng.Next(5) == 0 ? "GND" : $"N{1 + rng.Next(netCount)}";
        var list = new List<Part>();
        for (var i = 1; i <= parts; i++)
        {
            var kind = rng.Next(10);
            list.Add(kind switch
            {
                < 4 => Part($"R{i}", "res-axial-250mw", ("1", NetFor()), ("2", NetFor())),
                < 7 => Part($"C{i}", "cap-disc-5mm", ("1", NetFor()), ("2", NetFor())),
                < 9 => Part($"Q{i}", "to92", ("E", NetFor()), ("B", NetFor()), ("C", NetFor())),
                _ => Part($"U{i}", "dip8", ("1", NetFor()), ("2", NetFor()), ("3", NetFor()), ("4", "GND"), ("6", NetFor()), ("7", NetFor()), ("8", NetFor())),
            });
        }
        // A net the dice gave one pin only is taken as a test point (open-ended), so the checker judges the layout, not the dice.
        var uses = list.SelectMany(p => p.Pins).GroupBy(p => p.Net).ToDictionary(g => g.Key, g => g.Count());
        nets = [.. nets.Select(n => uses.GetValueOrDefault(n.Name) == 1 ? new Net(n.Name, n.Ground, n.Class, n.Voltage, n.VoltageEstimated, n.Current, n.MaxLead, n.Role, OpenEnded: true) : n)];
        return Project($"random-{seed}", Board.Auto, nets, list);
    }

    /// <summary>
    /// A long signal chain like a builder's larger boards: parts in a row of stages, each net joining two to four leads of
    /// parts at most a few places apart, every sixth lead to ground, an input landing at the start and an output at the end.
    /// </summary>
    public static Project Chain(int seed, int parts)
    {
        var rng = new Random(seed);
        var kinds = new List<(string Ref, string Footprint, string[] Pins)>();
        for (var i = 1; i <= parts; i++)
        {
            var roll = i == 1 || i == parts ? -1 : rng.Next(20);
            kinds.Add(roll switch
            {
                < 0 => ($"J{i}", "landing-1", ["1"]),
                < 8 => ($"R{i}", "res-axial-250mw", ["1", "2"]),
                < 14 => ($"C{i}", "cap-disc-5mm", ["1", "2"]),
                < 19 => ($"Q{i}", "to92", ["E", "B", "C"]),
                _ => ($"U{i}", "dip8", ["1", "2", "3", "4", "5", "6", "7", "8"]),
            });
        }
        var slots = new List<(int Part, string Pin)>();
        var pins = kinds.Select(_ => new List<(string Pin, string Net)>()).ToList();
        for (var i = 0; i < kinds.Count; i++)
            foreach (var pin in kinds[i].Pins)
            {
                if (kinds[i].Footprint == "dip8" && pin == "4") pins[i].Add((pin, "GND"));
                else if (kinds[i].Footprint != "landing-1" && rng.Next(6) == 0) pins[i].Add((pin, "GND"));
                else slots.Add((i, pin));
            }
        // Nets take consecutive slots after a shuffle within short windows, so each joins nearby parts only.
        for (var start = 0; start < slots.Count; start += 6)
        {
            var end = Math.Min(slots.Count, start + 8);
            for (var k = end - 1; k > start; k--)
            {
                var j = start + rng.Next(k - start + 1);
                (slots[k], slots[j]) = (slots[j], slots[k]);
            }
        }
        var nets = new List<Net> { new("GND", Ground: true) };
        for (var at = 0; at < slots.Count;)
        {
            var size = Math.Min(2 + rng.Next(3), slots.Count - at);
            if (slots.Count - at - size == 1) size++;
            var name = $"N{nets.Count}";
            var members = slots.Skip(at).Take(size).ToList();
            var role = members.Any(m => m.Part == 0) ? SignalRole.Input : members.Any(m => m.Part == kinds.Count - 1) ? SignalRole.Output : SignalRole.None;
            nets.Add(new Net(name, Role: role));
            foreach (var (part, pin) in members) pins[part].Add((pin, name));
            at += size;
        }
        return Project($"chain-{seed}-{parts}", Board.Auto, nets, kinds.Select((k, i) => Part(k.Ref, k.Footprint, [.. pins[i].OrderBy(p => p.Pin, StringComparer.Ordinal)])));
    }
}
