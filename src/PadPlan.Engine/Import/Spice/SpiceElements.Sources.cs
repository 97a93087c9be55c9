using PadPlan.Model;
using PadPlan.Model.Values;

namespace PadPlan.Import;

// Independent sources (ngspice manual, "Independent Sources for Voltage or Current"): what each becomes on the board,
// and the end of the read, where sources get their landings and nets their facts.
internal sealed partial class SpiceElements
{
    private void Source(ElementLine e, bool current)
    {
        var words = e.Words;
        if (words.Count < 2) throw e.Bad("missing nodes: a source line is NAME PLUS-NODE MINUS-NODE [DC value] [AC mag] [SIN(...)].");
        var spec = SpiceSource.Parse(words.Skip(2).ToList(), scan.Parameters);
        var (plusNode, minusNode) = (words[0], words[1]);
        var name = NetlistText.Echo(e.Name);
        if (spec.Unevaluated is { } expression)
            notes.Add(new ImportNote(file, e.Line, $"{name}: {NetlistText.Echo(expression)} cannot be evaluated (PadPlan evaluates numbers, + - * /, parentheses and .param names), so it is taken as 0. Give the net's voltage in a parts map: \"nets\": {{\"{NetlistText.Echo(plusNode)}\": {{\"voltage\": 1.5}}}}, or write the number in the deck."));
        var bothLive = !NetNames.IsGround(plusNode) && !NetNames.IsGround(minusNode);
        if (!current && (spec.IsWire || spec.IsLoopProbe && bothLive))
        {
            // SPICE's 0 V ammeter, or a loop-gain probe: on the board it is a plain connection.
            _nodes.Join(Net(plusNode), Net(minusNode));
            var became = spec.IsWire ? "current probe: nodes joined" : "loop probe: nodes joined";
            notes.Add(new ImportNote(file, e.Line, spec.IsWire
                ? $"{name}: a 0 V source is a current probe in SPICE; its nodes {NetlistText.Echo(plusNode)} and {NetlistText.Echo(minusNode)} are joined as one net."
                : $"{name}: a 0 V source with only an AC stimulus between {NetlistText.Echo(plusNode)} and {NetlistText.Echo(minusNode)} is a loop-gain probe; on the board it is a wire, so the two nodes are joined as one net and the loop is closed."));
            _summary.Add(new ImportSummaryLine("source", name, $"{became} ({NetlistText.Echo(plusNode)} = {NetlistText.Echo(minusNode)})"));
            Record(e.Name, null, [(null, plusNode), (null, minusNode)], e.TailFrom(2));
            return;
        }
        _sources.Add(new PendingSource(e.Name, spec, Net(plusNode), Net(minusNode), current, e.Line, _elements.Count));
        Record(e.Name, null, [("1", plusNode), ("2", minusNode)], e.TailFrom(2));
    }

    public Netlist Finish(string title, IEnumerable<string> openEnded, IEnumerable<(string Node, int Line)> rfMarked)
    {
        var parts = _parts.Select(p => p with { Pins = p.Pins.Select(x => x with { Net = _nodes.Resolve(x.Net) }).ToValueList() }).ToList();
        var elements = _elements.Select(el => el with { Nodes = el.Nodes.Select(n => new SpiceNode(n.Pin, _nodes.Resolve(n.Net))).ToValueList() }).ToList();
        var offBoard = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        parts = LeaveOffSimulationOnly(parts, elements, offBoard);
        // "XU2A" names part U2A: drop the X that SPICE needs when a letter follows and no other part has that name.
        var names = new HashSet<string>(parts.Select(p => p.Ref), StringComparer.OrdinalIgnoreCase);
        var renamed = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        foreach (var p in parts.Where(p => p.Kind == PartKind.Subcircuit && p.Ref.Length > 2 && char.IsLetter(p.Ref[1]) && !names.Contains(p.Ref[1..])))
            renamed[p.Ref] = p.Ref[1..];
        parts = parts.Select(p => renamed.TryGetValue(p.Ref, out var to) ? p with { Ref = to } : p).ToList();
        elements = elements.Select(el => el.Ref is not null && renamed.TryGetValue(el.Ref, out var to) ? el with { Ref = to } : el).ToList();
        // landings take names no part and no element of the deck has (a left-off W1 switch keeps its name in messages)
        var used = new HashSet<string>(parts.Select(p => p.Ref).Concat(elements.Select(el => el.Name)), StringComparer.OrdinalIgnoreCase);
        var next = 1;
        var built = _sources.Where(s => !LeftOffSource(s, elements, offBoard)).ToList();
        var rf = RfNets.Find(parts, rfMarked.Select(m => (_nodes.Resolve(Net(m.Node)), $"marked *padplan rf (line {m.Line})")),
            built.Select(s => (s.Ref, s.Spec, _nodes.Resolve(s.Plus), _nodes.Resolve(s.Minus))));
        foreach (var (net, why) in rf)
        {
            Fact(new NetFacts(net, Class: NetClass.Rf));
            _summary.Add(new ImportSummaryLine("rf", NetlistText.Echo(net), why));
        }
        foreach (var source in built)
        {
            while (used.Contains($"W{next}")) next++;
            var landing = $"W{next}";
            used.Add(landing);
            parts.Add(Landing(source, landing));
            elements[source.Element] = elements[source.Element] with { Ref = landing };
        }
        foreach (var node in openEnded) Fact(new NetFacts(_nodes.Resolve(Net(node)), OpenEnded: true));
        return new Netlist(file, title, parts.ToValueList(), _facts.Values.ToValueList(), _couplings.ToValueList(), notes.ToValueList(),
            Elements: elements.ToValueList(), DeckLines: scan.DeckLines.ToValueList(), Summary: _summary.ToValueList());
    }

    // A subcircuit of only behavioural sources and passive parts whose nodes reach no lead of a real part (a thermal
    // network on a transistor's thermal nodes) has nothing to build; a source does not make a node physical, so a
    // network driven by an ambient-temperature source is left off too. The left-off nets are gathered in offBoard.
    private List<NetlistPart> LeaveOffSimulationOnly(List<NetlistPart> parts, List<SpiceElement> elements, HashSet<string> offBoard)
    {
        bool SimulationOnly(NetlistPart p) => p.Kind == PartKind.Subcircuit && p.Model is not null && scan.Subckts.TryGetValue(p.Model, out var def) && def.SimulationOnly;
        var physical = parts.Where(p => !SimulationOnly(p)).SelectMany(p => p.Pins.Select(x => x.Net)).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var kept = new List<NetlistPart>();
        foreach (var p in parts)
        {
            if (!SimulationOnly(p) || p.Pins.Any(x => !NetNames.IsGround(x.Net) && physical.Contains(x.Net))) { kept.Add(p); continue; }
            offBoard.UnionWith(p.Pins.Select(x => x.Net).Where(n => !NetNames.IsGround(n)));
            notes.Add(new ImportNote(file, p.Line, $"{NetlistText.Echo(p.Ref)}: subcircuit {NetlistText.Echo(p.Model!)} holds only behavioural sources and passive parts, and its nodes ({NetlistText.Echo(string.Join(" ", p.Pins.Select(x => x.Net)))}) reach no part on the board (a thermal network or a model); it is left off the board."));
            _summary.Add(new ImportSummaryLine("left off", NetlistText.Echo(p.Ref), $"simulation-only subcircuit {NetlistText.Echo(p.Model!)}"));
            var at = elements.FindIndex(el => string.Equals(el.Ref, p.Ref, StringComparison.Ordinal));
            if (at >= 0) elements[at] = elements[at] with { Ref = null, Nodes = elements[at].Nodes.Select(n => n with { Pin = null }).ToValueList() };
        }
        return kept;
    }

    // A source whose nodes reach only left-off networks (and ground) drives the simulation only: an ambient temperature at any value.
    private bool LeftOffSource(PendingSource source, List<SpiceElement> elements, HashSet<string> offBoard)
    {
        var nodes = new[] { _nodes.Resolve(source.Plus), _nodes.Resolve(source.Minus) };
        if (!nodes.Any(offBoard.Contains) || !nodes.All(n => NetNames.IsGround(n) || offBoard.Contains(n))) return false;
        var name = NetlistText.Echo(source.Ref);
        notes.Add(new ImportNote(file, source.Line, $"{name}: its nodes ({NetlistText.Echo(string.Join(" ", nodes))}) reach only a network left off the board (a thermal network's ambient, say), so it is no supply and gets no landing; it stays in the simulation only."));
        _summary.Add(new ImportSummaryLine("left off", name, $"source on simulation-only nets ({NetlistText.Echo(string.Join(", ", nodes))})"));
        elements[source.Element] = elements[source.Element] with { Ref = null, Nodes = elements[source.Element].Nodes.Select(n => n with { Pin = null }).ToValueList() };
        return true;
    }

    private NetlistPart Landing(PendingSource source, string landing)
    {
        var (reference, spec, current, line) = (source.Ref, source.Spec, source.Current, source.Line);
        var (plus, minus) = (_nodes.Resolve(source.Plus), _nodes.Resolve(source.Minus));
        var name = NetlistText.Echo(reference);
        var heater = new[] { reference, plus, minus }.Any(s => HeaterName().IsMatch(s));
        var unit = current ? "A" : "V";
        var settled = spec.Settled;
        // A current source of 0 A drives nothing: SPICE users put one on a node only to mark a port (an output).
        var port = current && settled is 0;
        var role = heater ? "heater" : port ? "output" : current ? "current source" : settled is null ? "input" : "supply";
        var size = port ? ""
            : settled is { } s ? $"{new ComponentValue(s, unit).ToDisplay()}{(spec.Function == SourceFunction.None ? " DC" : " settled")}"
            : $"{new ComponentValue(spec.Peak, unit).ToDisplay()} peak";
        var live = new[] { plus, minus }.Where(n => n != NetNames.Ground).ToList();
        var apart = live.Count == 2;
        _summary.Add(new ImportSummaryLine("source", name, $"{role}{(size.Length > 0 ? " " + size : "")}, landing {landing} ({NetlistText.Echo(plus)}, {NetlistText.Echo(minus)}){(apart ? ", nodes kept apart" : "")}"));
        if (apart)
            notes.Add(new ImportNote(file, line, $"{name}: neither node is ground, so {NetlistText.Echo(plus)} and {NetlistText.Echo(minus)} are kept apart, with landing {landing} for the two wires, and its voltage is not given to a net. If it is only a probe, join them: write {name} {NetlistText.Echo(plus)} {NetlistText.Echo(minus)} 0, which PadPlan reads as a wire."));
        else if (live.Count == 1)
        {
            var hot = live[0];
            var sign = hot == plus ? 1 : -1; // the voltage of the hot node against ground, sign kept
            if (current) { if (!port) Fact(new NetFacts(hot, Current: spec.Peak)); }
            else if (settled is { } dc) Fact(new NetFacts(hot, Voltage: sign * dc, Supply: true));
            else Fact(new NetFacts(hot, Voltage: spec.Peak, Role: heater ? null : SignalRole.Input));
        }
        return new NetlistPart(landing, PartKind.Landing, $"{role} wires ({name}{(size.Length > 0 ? ", " + size : "")})", null, null, null, null,
            ValueList.Of(new NetlistPin("1", plus), new NetlistPin("2", minus)), Positional: true, line);
    }
}
