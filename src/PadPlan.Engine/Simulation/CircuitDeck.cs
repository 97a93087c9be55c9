using System.Globalization;
using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Model.Spice;

namespace PadPlan.Simulation;

/// <summary>
/// The deck PadPlan runs for the operating point, written from the parsed model only: every node name is generated here
/// (ground nets are 0, other nets n1, n2, ... in name order), parts with an imported SPICE line keep its element name and
/// value, parts without one get a generic model (<see cref="DeviceModels"/>), supplies on wire landings become DC
/// sources, and a 0 V sense source in series with each lead of resistors, diodes and transistors gives its current.
/// The deck ends with `.options rshunt` (a 1 TΩ resistor from every node to ground, so a node that only capacitors or
/// an open lead reach still has a solution) and `.op`. Every line is an entry of a <see cref="SpiceDeck"/>, the validated
/// deck writer: checked words only, carried lines parsed and written back, no control block ever.
/// </summary>
public sealed class CircuitDeck
{
    /// <summary>Resistance from every node to ground that makes floating nodes solvable (Ω). At 1 TΩ it moves a node fed through 1 MΩ by 1 µV per volt.</summary>
    public const double Shunt = 1e12;

    private CircuitDeck(SpiceDeck deck, IReadOnlyDictionary<string, string> nodes, IReadOnlyList<Sense> senses, IReadOnlyList<(string Source, string Plus, string Minus, string Label)> supplies, IReadOnlyList<string> unmodelled)
    {
        Deck = deck;
        Text = deck.Text;
        Nodes = nodes;
        Senses = senses;
        Supplies = supplies;
        Unmodelled = unmodelled;
    }

    /// <summary>One sense source: its name and the part lead whose current it carries (into the part).</summary>
    public sealed record Sense(string Source, string Ref, string Pin);

    public SpiceDeck Deck { get; }
    public string Text { get; }
    /// <summary>Project net name to deck node.</summary>
    public IReadOnlyDictionary<string, string> Nodes { get; }
    public IReadOnlyList<Sense> Senses { get; }
    /// <summary>Voltage sources that feed the board: source name (lower case), the nets of its + and - ends, and what a builder calls it.</summary>
    public IReadOnlyList<(string Source, string Plus, string Minus, string Label)> Supplies { get; }
    /// <summary>Parts that touch a net but have no model: the operating point would be wrong without them.</summary>
    public IReadOnlyList<string> Unmodelled { get; }

    /// <summary>The deck of the powered circuit; unpowered, every independent source is left off (the board on the bench with its supply and signal wires removed).</summary>
    public static CircuitDeck Of(Project project, bool powered = true)
    {
        var kinds = project.Parts.ToDictionary(p => p.Ref, p => PartKinds.Of(p, project.FindFootprint(p.Footprint)), StringComparer.Ordinal);
        var nodes = NodeNames(project);
        var body = new List<DeckEntry>();
        var models = new SortedDictionary<string, DeviceModels.Model>(StringComparer.Ordinal);
        var senses = new List<Sense>();
        var senseLines = new List<DeckEntry>();
        var supplies = new List<(string, string, string, string)>();
        var unmodelled = new List<string>();
        var record = project.Imported ?? ImportRecord.Empty;

        string NetNode(string net) => nodes.TryGetValue(net, out var n) ? n : NetNames.IsGround(net) ? "0" : nodes[net] = $"x{nodes.Count + 1}";
        string LeadNode(Part part, string pin, bool sensed)
        {
            var net = NetNode(part.NetOf(pin) ?? $"open {part.Ref} {pin}");
            if (!sensed) return net;
            var source = $"vpp_s{senses.Count + 1}";
            var inner = $"pp_s{senses.Count + 1}";
            senses.Add(new Sense(source, part.Ref, pin));
            senseLines.Add(new DeckElement(source, [net, inner], ["0"]));
            return inner;
        }
        bool Sensed(string reference) => kinds.TryGetValue(reference, out var k) && k is PartKind.Resistor or PartKind.Diode or PartKind.Led or PartKind.Bjt or PartKind.Jfet or PartKind.Mosfet or PartKind.Trimmer;

        body.AddRange(record.DeckLines.Select(l => new DeckCarried(l)));
        var written = new HashSet<string>(StringComparer.Ordinal);
        foreach (var e in record.Elements)
        {
            var letter = char.ToUpperInvariant(e.Name[0]);
            if (e.Ref is null && e.Nodes.Count == 0)
            {
                if (letter == 'K') body.Add(new DeckElement(e.Name, [], ElementWords.Words(e.Tail)));
                continue;
            }
            if (e.Ref is null && letter is 'V' or 'I') continue; // a wire on the board: the importer joined its nets
            // at power-up only the supplies are connected: a signal source (an antenna, a generator) or an output port is not
            if (letter is 'V' or 'I' && (!powered || !Supply(project, e))) continue;
            var part = e.Ref is null ? null : project.FindPart(e.Ref);
            if (part is not null) written.Add(part.Ref);
            var sensed = part is not null && Sensed(part.Ref);
            var list = e.Nodes.Select(n => part is not null && n.Pin is not null ? LeadNode(part, n.Pin, sensed) : NetNode(n.Net)).ToList();
            body.Add(new DeckElement(e.Name, list, ElementWords.Of(e, part)));
            if (letter == 'V' && list.Count >= 2 && part is not null) supplies.Add((e.Name.ToLowerInvariant(), e.Nodes[0].Net, e.Nodes[1].Net, $"{e.Name} (landing {part.Ref})"));
        }

        foreach (var part in project.Parts.Where(p => !written.Contains(p.Ref)).OrderBy(p => p.Ref, NaturalOrder.Comparer))
        {
            var kind = kinds[part.Ref];
            var lines = PartLines(part, kind, pin => LeadNode(part, pin, Sensed(part.Ref)), models);
            if (lines.Count > 0) body.AddRange(lines);
            else if (!Silent(kind) && part.Pins.Select(p => p.Net).Distinct().Count() > 1) unmodelled.Add(part.Ref);
        }

        // supplies of a text netlist: a stated power-rail voltage on a wire landing
        var fed = new HashSet<string>(supplies.Select(s => s.Item2), StringComparer.Ordinal);
        foreach (var landing in project.Parts.Where(p => kinds[p.Ref] == PartKind.Landing && !written.Contains(p.Ref)).OrderBy(p => p.Ref, NaturalOrder.Comparer))
            foreach (var pin in landing.Pins)
            {
                var net = project.FindNet(pin.Net);
                if (!powered || net is null || net.Ground || net.Voltage is not { } volts || net.VoltageEstimated || net.Class is not (NetClass.Power or NetClass.Hv) || !fed.Add(net.Name)) continue;
                var name = $"vpp_supply{supplies.Count + 1}";
                body.Add(new DeckElement(name, [NetNode(net.Name), "0"], ["DC", Num(volts)]));
                supplies.Add((name, net.Name, NetNames.Ground, $"landing {landing.Ref}"));
            }

        var entries = new List<DeckEntry> { new DeckComment("written by padplan from the parsed project: nodes n1.. are nets, 0 is ground; vpp_s sources sense lead currents") };
        foreach (var model in models.Values)
        {
            entries.Add(new DeckComment(model.Note));
            entries.Add(new DeckCarried(CarriedLine.Parse(model.Line)));
        }
        entries.AddRange(body);
        entries.AddRange(senseLines);
        entries.Add(DeckCommand.Option("rshunt", Shunt));
        entries.Add(DeckCommand.OperatingPoint);
        var deck = new SpiceDeck($"operating point of {project.Name}", entries.ToValueList());
        return new CircuitDeck(deck, nodes, senses, supplies, unmodelled);
    }

    // A source that feeds the board: its + node's net is a power or high-voltage rail, or has a stated voltage and is no signal input.
    private static bool Supply(Project project, SpiceElement e)
    {
        if (e.Nodes.Count < 2 || project.FindNet(e.Nodes[0].Net) is not { Ground: false } net || net.Role == SignalRole.Input) return false;
        return net.Class is NetClass.Power or NetClass.Hv || net.Voltage is not null && !net.VoltageEstimated;
    }

    /// <summary>
    /// This deck with a meter's diode-test source between two nets: 3 V open-circuit behind 2.4 kΩ (about 1.2 mA into a
    /// short), + on the first net. The reading is V(first) - V(second). Common practice for handheld meters, no source.
    /// </summary>
    public string WithDiodeTest(string plusNet, string minusNet)
    {
        string Node(string net) => Nodes.TryGetValue(net, out var n) ? n : "0";
        var entries = Deck.Entries.ToList();
        entries.InsertRange(entries.FindIndex(e => e is DeckCommand),
            [new DeckElement("vpp_meter", ["pp_meter", Node(minusNet)], ["DC", "3"]), new DeckElement("rpp_meter", ["pp_meter", Node(plusNet)], ["2400"])]);
        return (Deck with { Entries = entries.ToValueList() }).Text;
    }

    // Parts that are open at DC (capacitors, crystals, trimmer capacitors) need no line; landings are wires off the board.
    private static bool Silent(PartKind kind) => kind is PartKind.Capacitor or PartKind.TrimmerCap or PartKind.Crystal or PartKind.Landing;

    private static List<DeckEntry> PartLines(Part part, PartKind kind, Func<string, string> node, SortedDictionary<string, DeviceModels.Model> models)
    {
        string Use(DeviceModels.Model m) { models[m.Name] = m; return m.Name; }
        string? Pin(params string[] names) => part.Pins.Select(p => p.Pin).FirstOrDefault(p => names.Any(n => n.Equals(p, StringComparison.OrdinalIgnoreCase)));
        DeckElement E(string letter, string suffix, IEnumerable<string> nodes, params string[] words) => new($"{letter}pp_{Safe(part.Ref)}{suffix}", nodes, words);
        var value = PartValue.Read(part, kind);
        var two = part.Pins.Count == 2 ? new[] { part.Pins[0].Pin, part.Pins[1].Pin } : null;
        switch (kind)
        {
            case PartKind.Resistor or PartKind.Inductor when two is not null && value is { Number: > 0 } v:
                return [E(kind == PartKind.Resistor ? "R" : "L", "", two.Select(node), Num(v.Number))];
            case PartKind.FerriteBead or PartKind.Fuse when two is not null:
                return [E("R", "", two.Select(node), "0.01")];
            case PartKind.Trimmer when part.Pins.Count == 3 && value is { Number: > 0 } v:
                // taken at mid-travel: half the track each side of the wiper (pin 2)
                return [E("R", "a", [node(part.Pins[0].Pin), node(part.Pins[1].Pin)], Num(v.Number / 2)), E("R", "b", [node(part.Pins[1].Pin), node(part.Pins[2].Pin)], Num(v.Number / 2))];
            case PartKind.Trimmer when two is not null && value is { Number: > 0 } v:
                return [E("R", "", two.Select(node), Num(v.Number / 2))];
            case PartKind.Diode or PartKind.Led when two is not null && DeviceModels.ForDiode(part, kind) is { } m:
                var a = Pin("A", "anode", "+") ?? two[0];
                var k = two.First(p => p != a);
                return [E("D", "", [node(a), node(k)], Use(m))];
            case PartKind.Bjt when Pin("C") is { } c && Pin("B") is { } b && Pin("E") is { } e:
                return [E("Q", "", [node(c), node(b), node(e)], Use(DeviceModels.ForTransistor(part, kind)))];
            case PartKind.Jfet when Pin("D") is { } d && Pin("G") is { } g && Pin("S") is { } s:
                return [E("J", "", [node(d), node(g), node(s)], Use(DeviceModels.ForTransistor(part, kind)))];
            case PartKind.Mosfet when Pin("D") is { } d && Pin("G") is { } g && Pin("S") is { } s:
                var source = node(s);
                var bulk = Pin("B") is { } bk ? node(bk) : source;
                return [E("M", "", [node(d), node(g), source, bulk], Use(DeviceModels.ForTransistor(part, kind)))];
            case PartKind.Transformer when part.Pins.Count >= 2:
                // windings at DC: a few tenths of an ohm between the wire ends of each winding (pins 1-2, 3-4, ...; a
                // three-ended part is one tapped winding 1-2-3), the usual wiring of the library's toroids
                var pins = part.Pins.Select(p => p.Pin).ToList();
                var pairs = pins.Count == 3 ? [(0, 1), (1, 2)] : Enumerable.Range(0, pins.Count / 2).Select(i => (2 * i, 2 * i + 1)).ToList();
                return pairs.Select((x, i) => (DeckEntry)E("R", $"w{i + 1}", [node(pins[x.Item1]), node(pins[x.Item2])], "0.2")).ToList();
            default:
                return [];
        }
    }

    private static Dictionary<string, string> NodeNames(Project project)
    {
        var nodes = new Dictionary<string, string>(StringComparer.Ordinal);
        var i = 0;
        foreach (var net in project.Nets.OrderBy(n => n.Name, StringComparer.Ordinal))
            nodes[net.Name] = net.Ground || NetNames.IsGround(net.Name) ? "0" : $"n{++i}";
        foreach (var net in project.Parts.SelectMany(p => p.Pins).Select(p => p.Net).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal))
            if (!nodes.ContainsKey(net)) nodes[net] = NetNames.IsGround(net) ? "0" : $"n{++i}";
        return nodes;
    }

    // Element names made from a reference: letters and digits only.
    private static string Safe(string reference) => new(reference.Select(c => char.IsAsciiLetterOrDigit(c) ? char.ToLowerInvariant(c) : '_').ToArray());

    internal static string Num(double x) => ElementWords.Plain(x);
}
