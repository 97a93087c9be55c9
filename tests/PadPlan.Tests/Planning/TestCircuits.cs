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
}
