using System.Globalization;
using System.Text.RegularExpressions;
using PadPlan.IO;
using PadPlan.Model;
using PadPlan.Model.Spice;
using PadPlan.Model.Values;

namespace PadPlan.Import;

/// <summary>The second pass over a SPICE deck: each top-level element line becomes a part, a source, a coupling or a warning, and is recorded for the export.</summary>
internal sealed partial class SpiceElements(string file, SpiceScan scan, List<ImportNote> notes)
{
    private readonly List<NetlistPart> _parts = [];
    private readonly List<PendingSource> _sources = [];
    private readonly List<WindingCoupling> _couplings = [];
    private readonly List<SpiceElement> _elements = [];
    private readonly List<ImportSummaryLine> _summary = [];
    private readonly Dictionary<string, NetFacts> _facts = new(StringComparer.Ordinal);
    private readonly SpiceNodes _nodes = new();

    private sealed record PendingSource(string Ref, SpiceSource Spec, string Plus, string Minus, bool Current, int Line, int Element);

    /// <summary>One element line split up: its name, the positional words (before the first name=value), all words, and the text from each word on.</summary>
    private sealed record ElementLine(string Name, List<string> Args, List<string> Words, Func<int, string> TailFrom, int Line, Func<string, InputException> Bad);

    public void Element(SpiceLine line)
    {
        // every word of an element reaches the exported deck: only SPICE deck text gets in (Model/Spice/SpiceText)
        if (SpiceText.Problem(line.Text) is { } problem) throw new InputException(file, $"this line {problem}", line.Line);
        var tokens = SpiceWords.Of(line, file);
        var text = SpiceWords.Normalised(line);
        var name = tokens[0].Text;
        var words = tokens.Skip(1).Select(t => t.Text).ToList();
        var args = words.TakeWhile(w => !w.Contains('=') && !w.Equals("params:", StringComparison.OrdinalIgnoreCase)).ToList();
        string TailFrom(int k) => k < words.Count ? text[(tokens[k + 1].Column - 1)..].Trim() : "";
        var e = new ElementLine(name, args, words, TailFrom, line.Line, message => new InputException(file, $"{NetlistText.Echo(name)}: {message}", line.Line));
        var letter = char.ToUpperInvariant(name[0]);
        switch (letter)
        {
            case 'R': TwoTerminal(PartKind.Resistor, e, "r", "resistance"); break;
            case 'C': TwoTerminal(PartKind.Capacitor, e, "c", "capacitance"); break;
            case 'L': TwoTerminal(PartKind.Inductor, e, "l", "inductance"); break;
            case 'D': Semiconductor(PartKind.Diode, e, ["A", "K"], 2, 2, "anode, cathode"); break;
            case 'Q': Semiconductor(PartKind.Bjt, e, ["C", "B", "E", "S", "TJ"], 3, 5, "collector, base, emitter [substrate]"); break;
            case 'J': Semiconductor(PartKind.Jfet, e, ["D", "G", "S"], 3, 3, "drain, gate, source"); break;
            case 'M': Semiconductor(PartKind.Mosfet, e, ["D", "G", "S", "B"], 3, 6, "drain, gate, source [bulk]"); break;
            case 'X': Subcircuit(e); break;
            case 'K': Coupling(e); break;
            case 'V' or 'I': Source(e, letter == 'I'); break;
            case 'E' or 'F' or 'G' or 'H' or 'B':
                LeftOff(e, "a controlled or behavioural source (E, F, G, H or B line), a simulation model with no part to solder",
                    "If it stands for real circuitry (an amplifier, a sensor), put that circuitry in the netlist, or a subcircuit call (X...) with a footprint in a parts map.");
                break;
            case 'T' or 'O' or 'U':
                LeftOff(e, "a transmission line (T, O or U line)", "Build it as coax or twisted wire off the board, with wire landings: put a subcircuit call (X...) with a landing footprint in a parts map.");
                break;
            case 'S' or 'W':
                LeftOff(e, "a controlled switch (S or W line), a simulation model", "If a real switch or relay is meant, write it as a subcircuit call (X...) and name its footprint in a parts map.");
                break;
            case 'A' or 'N' or 'P' or 'Y' or 'Z':
                LeftOff(e, $"SPICE element '{letter}' (a code model, a lossy line or a device PadPlan does not place)", "Replace it with a subcircuit call (X...) and a parts-map entry.");
                break;
            default:
                throw e.Bad($"unknown element letter '{name[0]}'. Element lines start with R, C, L, D, Q, J, M, X, K, V or I; comments start with * or ;.");
        }
    }

    private string Net(string node) => _nodes.Name(node);

    private void Record(string name, string? reference, IEnumerable<(string? Pin, string Node)> nodes, string tail) =>
        _elements.Add(new SpiceElement(name, reference, nodes.Select(n => new SpiceNode(n.Pin, Net(n.Node))).ToValueList(), tail));

    private void LeftOff(ElementLine e, string what, string how)
    {
        notes.Add(new ImportNote(file, e.Line, $"{NetlistText.Echo(e.Name)}: {what}. It is left off the board, so the board is not the simulated circuit. {how}"));
        _summary.Add(new ImportSummaryLine("left off", NetlistText.Echo(e.Name), what));
        _elements.Add(new SpiceElement(e.Name, null, ValueList<SpiceNode>.Empty, e.TailFrom(0)));
    }

    private void TwoTerminal(PartKind kind, ElementLine e, string shortKey, string longKey)
    {
        var what = kind.ToString().ToLowerInvariant();
        var args = e.Args;
        if (args.Count < 2) throw e.Bad($"missing nodes: a {what} line is {NetlistText.Echo(e.Name)} NODE1 NODE2 VALUE.");
        var valueText = args.Count >= 3 ? args[2] : null;
        string? model = null;
        if (valueText is not null && scan.Models.ContainsKey(valueText)) (model, valueText) = (valueText, args.Count >= 4 ? args[3] : null);
        valueText ??= Parameter(e.Words, shortKey) ?? Parameter(e.Words, longKey);
        ComponentValue? number = null;
        string display;
        if (valueText is null)
        {
            if (model is null) throw e.Bad($"missing value: a {what} line is {NetlistText.Echo(e.Name)} NODE1 NODE2 VALUE.");
            display = model; // a semiconductor resistor or capacitor: its size comes from the model and its geometry
        }
        else if (SpiceExpression.IsExpression(valueText))
        {
            var evaluated = SpiceExpression.Evaluate(valueText, scan.Parameters);
            if (evaluated is { } v && v > 0)
            {
                number = new ComponentValue(v, PartValues.UnitOf(kind));
                display = number.Value.ToIecCode();
                notes.Add(new ImportNote(file, e.Line, $"{NetlistText.Echo(e.Name)}: value {NetlistText.Echo(valueText)} evaluates to {display}."));
                _summary.Add(new ImportSummaryLine("assumed", NetlistText.Echo(e.Name), $"value {NetlistText.Echo(valueText)} = {display}"));
            }
            else
            {
                display = NetlistText.Echo(valueText);
                notes.Add(new ImportNote(file, e.Line, $"{NetlistText.Echo(e.Name)}: value {display} cannot be evaluated (PadPlan evaluates numbers, + - * /, parentheses and .param names), so the part keeps that text and a default footprint. Give the value in a parts map: \"parts\": {{\"{NetlistText.Echo(e.Name)}\": {{\"value\": \"4k7\"}}}}, or write it as a number."));
                _summary.Add(new ImportSummaryLine("assumed", NetlistText.Echo(e.Name), $"value {display} not evaluated; default footprint"));
            }
        }
        else if (!SpiceValues.LooksLikeNumber(valueText))
            throw e.Bad($"bad value \"{NetlistText.Echo(valueText)}\": a SPICE value is a number that starts with a digit (4.7k, 100n, 1meg), or a {{parameter expression}}.");
        else if (PartValues.TryRead(kind, valueText, ValueSyntax.Spice, out var v, out display, out var error))
        {
            number = v;
            SpiceReading(e, valueText, v);
        }
        else throw e.Bad($"bad value. {error.Replace(valueText, NetlistText.Echo(valueText), StringComparison.Ordinal)}");
        Add(new NetlistPart(e.Name, kind, display, number, model, null, null, ValueList.Of(new NetlistPin("1", Net(args[0])), new NetlistPin("2", Net(args[1]))), Positional: true, e.Line));
        Record(e.Name, e.Name, [("1", args[0]), ("2", args[1])], e.TailFrom(2));
    }

    /// <summary>
    /// A value that SPICE reads otherwise than a builder: an IEC 60062 code (4k7, 2R2), which simulators without these
    /// codes read up to the scale factor (4k7 as 4k), or letters after the scale factor that SPICE ignores (4kk7x). The
    /// builder's reading stands (the export writes it as a plain number); the note names the line and SPICE's reading.
    /// </summary>
    private void SpiceReading(ElementLine e, string text, ComponentValue builder)
    {
        if (!ComponentValue.TryReadAsSpice(text, out var spice, out var ignored)) return;
        var asSpice = new ComponentValue(spice, builder.Unit).ToDisplay();
        var name = NetlistText.Echo(e.Name);
        var shown = NetlistText.Echo(text);
        if (ComponentValue.IsIecCode(text) && Math.Abs(spice - builder.Number) > 1e-12 * Math.Abs(builder.Number))
        {
            notes.Add(new ImportNote(file, e.Line, $"{name}: value {shown} is an IEC 60062 code, read as {builder.ToDisplay()} as a builder means it. SPICE simulators without these codes (ngspice among them) read it as {asSpice}: they ignore the letters after the scale factor, so a simulation of this deck as written used {asSpice}. The exported deck writes {SpiceText.Number(builder.Number)}; write that in your deck too, so both agree."));
            _summary.Add(new ImportSummaryLine("assumed", name, $"value {shown} read as {builder.ToDisplay()} (SPICE without IEC codes reads {asSpice})"));
        }
        else if (ignored.Length > 0 && !ComponentValue.IsUnitWord(ignored))
        {
            notes.Add(new ImportNote(file, e.Line, $"{name}: value {shown}: SPICE reads {asSpice} and ignores \"{NetlistText.Echo(ignored)}\" after the scale factor; PadPlan reads it the same. If another value was meant, write it as a plain number."));
            _summary.Add(new ImportSummaryLine("assumed", name, $"value {shown} read as {asSpice} (letters after the scale factor ignored)"));
        }
    }

    private static string? Parameter(List<string> words, string key) =>
        words.Select(w => w.Split('=', 2)).FirstOrDefault(p => p.Length == 2 && p[0].Equals(key, StringComparison.OrdinalIgnoreCase))?[1];

    // Keywords that may follow a device's model name (ngspice: off, thermal for the self-heating models).
    private static readonly HashSet<string> DeviceKeywords = new(StringComparer.OrdinalIgnoreCase) { "off", "thermal" };

    private void Semiconductor(PartKind kind, ElementLine e, string[] pinNames, int minNodes, int maxNodes, string order)
    {
        var args = e.Args;
        if (args.Count < minNodes + 1)
            throw e.Bad($"missing nodes: expected {order} and a model name; found {SpiceReader.Plural(args.Count, "word")}.");
        var at = ModelIndex(args, minNodes, maxNodes);
        var model = args[at];
        var nodes = args.Take(at).ToList();
        var pins = new List<NetlistPin>();
        var recorded = new List<(string? Pin, string Node)>();
        var thermal = kind == PartKind.Mosfet && nodes.Count == 5 ? 3 : kind == PartKind.Bjt && nodes.Count == 5 ? 4 : nodes.Count;
        for (var i = 0; i < nodes.Count; i++)
        {
            var pin = i < pinNames.Length ? pinNames[i] : $"N{i + 1}";
            if (i < minNodes) { pins.Add(new NetlistPin(pin, Net(nodes[i]))); recorded.Add((pin, nodes[i])); continue; }
            if (i >= thermal || i >= pinNames.Length || pin == "TJ")
            {
                recorded.Add((null, nodes[i]));
                continue;
            }
            // Discrete packages have no bulk or substrate lead: a MOSFET's bulk is tied to the source inside, whatever net
            // the deck puts it on, so the export ties it to lead S; a BJT's substrate is the case or nothing.
            var tiedTo = kind == PartKind.Mosfet ? Net(nodes[2]) : NetNames.Ground;
            var same = string.Equals(Net(nodes[i]), tiedTo, StringComparison.OrdinalIgnoreCase);
            recorded.Add((kind == PartKind.Mosfet ? "S" : null, nodes[i]));
            if (!same)
                notes.Add(new ImportNote(file, e.Line, kind == PartKind.Mosfet
                    ? $"{NetlistText.Echo(e.Name)}: the bulk node {NetlistText.Echo(nodes[i])} is not on the source {NetlistText.Echo(nodes[2])}; a discrete MOSFET has no bulk lead and ties the bulk to its source inside the package, so the board and the exported deck tie it to lead S. Check the circuit: a deck that meant the bulk on {NetlistText.Echo(nodes[i])} simulates differently."
                    : $"{NetlistText.Echo(e.Name)}: the substrate node {NetlistText.Echo(nodes[i])} has no lead on a discrete part and is left out; it is not on {tiedTo} as usual, so check the circuit."));
        }
        if (thermal < nodes.Count)
            notes.Add(new ImportNote(file, e.Line, $"{NetlistText.Echo(e.Name)}: nodes {NetlistText.Echo(string.Join(" ", nodes.Skip(thermal)))} are thermal nodes (junction and case temperature) of the model, not leads; they stay in the simulation only."));
        var modelType = scan.Models.GetValueOrDefault(model, "");
        // Only a VDMOS model takes three nodes in ngspice; an NMOS or PMOS model wants the bulk as a fourth (ngspice refuses
        // the line with "not enough nodes"). A discrete MOSFET ties its bulk to the source inside the package, so the deck does.
        if (kind == PartKind.Mosfet && nodes.Count == 3 && modelType is "nmos" or "pmos")
        {
            recorded.Add(("S", nodes[2]));
            notes.Add(new ImportNote(file, e.Line, $"{NetlistText.Echo(e.Name)}: three nodes with the {modelType.ToUpperInvariant()} model {NetlistText.Echo(model)}, but ngspice wants the bulk as a fourth node for it (only a VDMOS model takes three); the simulation and the exported deck tie the bulk to the source, as a discrete MOSFET does inside its package."));
        }
        var isLed = kind == PartKind.Diode && (model.Contains("led", StringComparison.OrdinalIgnoreCase) || e.Name.StartsWith("DLED", StringComparison.OrdinalIgnoreCase));
        Add(new NetlistPart(e.Name, isLed ? PartKind.Led : kind, ModelText(model, modelType), null, model, null, null, pins.ToValueList(), Positional: false, e.Line));
        Record(e.Name, e.Name, recorded, e.TailFrom(at));
    }

    // The model name: the first known model after the least number of nodes, else the last word that is neither a number (area) nor a keyword.
    private int ModelIndex(List<string> args, int minNodes, int maxNodes)
    {
        var last = Math.Min(maxNodes, args.Count - 1);
        for (var i = minNodes; i <= last; i++)
            if (scan.Models.ContainsKey(args[i])) return i;
        for (var i = last; i > minNodes; i--)
            if (!SpiceValues.LooksLikeNumber(args[i]) && !DeviceKeywords.Contains(args[i])) return i;
        return minNodes;
    }

    private static string ModelText(string model, string type) => type switch
    {
        "npn" or "pnp" => $"{model} ({type.ToUpperInvariant()})",
        "njf" or "pjf" => $"{model} ({(type == "njf" ? "N" : "P")}-JFET)",
        "nmos" or "pmos" => $"{model} ({(type == "nmos" ? "N" : "P")}-MOSFET)",
        "vdmos" => $"{model} (power MOSFET)",
        _ => model,
    };

    private void Subcircuit(ElementLine e)
    {
        var plain = e.Args;
        if (plain.Count < 2) throw e.Bad($"missing nodes: a subcircuit call is {NetlistText.Echo(e.Name)} NODE... SUBCIRCUIT-NAME.");
        var sub = plain[^1];
        var nodes = plain.Take(plain.Count - 1).ToList();
        List<string> pinNames;
        if (scan.Subckts.TryGetValue(sub, out var def))
        {
            if (def.Ports.Count != nodes.Count)
                throw e.Bad($"calls {NetlistText.Echo(sub)} with {nodes.Count} nodes, but .subckt {NetlistText.Echo(sub)} (line {def.Line}) has {SpiceReader.Plural(def.Ports.Count, "pin")}: {NetlistText.Echo(string.Join(" ", def.Ports))}.");
            pinNames = UniqueNames(def.Ports);
        }
        else pinNames = nodes.Select((_, i) => (i + 1).ToString(CultureInfo.InvariantCulture)).ToList();
        var pins = nodes.Select((n, i) => new NetlistPin(pinNames[i], Net(n))).ToValueList();
        var part = new NetlistPart(e.Name, PartKind.Subcircuit, sub, null, sub, null, null, pins, Positional: true, e.Line);
        // A body that puts a node on global ground (0) reaches the ground plane though no port does: the part needs a
        // ground lead. A recognised pinout (an op-amp macromodel's 0 is only its reference) already says where its leads are.
        if (def is { UsesGround: true } && !nodes.Any(NetNames.IsGround) && StandardPinouts.Find(part) is null && OpAmpPinout.FromNames(pinNames) is null)
        {
            var ground = UniqueNames([.. pinNames, "GND"])[^1];
            part = part with { Pins = pins.Add(new NetlistPin(ground, NetNames.Ground)) };
            notes.Add(new ImportNote(file, e.Line, $"{NetlistText.Echo(e.Name)}: subcircuit {NetlistText.Echo(sub)} puts a node on ground (0) inside, so the part gets a ground lead ({ground}) after its ports. Check the data sheet; a parts map can say otherwise."));
        }
        Add(part);
        Record(e.Name, e.Name, nodes.Select((n, i) => ((string?)pinNames[i], n)), e.TailFrom(nodes.Count));
    }

    private static List<string> UniqueNames(List<string> names)
    {
        var seen = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        return names.Select((n, i) => seen.Add(n) ? n : $"{n}#{i + 1}").ToList();
    }

    private void Coupling(ElementLine e)
    {
        var args = e.Args;
        var inductors = args.TakeWhile(a => char.ToUpperInvariant(a[0]) == 'L').ToList();
        if (inductors.Count < 2 || args.Count != inductors.Count + 1)
            throw e.Bad($"missing nodes: a coupling line is {NetlistText.Echo(e.Name)} L1 L2 COEFFICIENT (two or more inductor names, then k).");
        var k = SpiceValues.Number(args[^1], scan.Parameters);
        if (k is not (> 0 and <= 1))
            throw e.Bad($"bad value. The coupling coefficient \"{NetlistText.Echo(args[^1])}\" must be a number above 0 and at most 1.");
        _couplings.Add(new WindingCoupling(e.Name, inductors.ToValueList(), k.Value, e.Line));
        _elements.Add(new SpiceElement(e.Name, null, ValueList<SpiceNode>.Empty, e.TailFrom(0)));
    }

    // Windings joined by K lines become one part later, so the exact count is checked after reading; this stops a runaway deck early.
    private void Add(NetlistPart part)
    {
        NetlistLimits.CheckParts(_parts.Count + 1, file, part.Line, 2 * ProjectFiles.Limits.InputLimits.MaxParts);
        _parts.Add(part);
    }

    private void Fact(NetFacts facts) =>
        _facts[facts.Name] = _facts.TryGetValue(facts.Name, out var had) ? had.Merge(facts) : facts;

    [GeneratedRegex(@"heat|htr|fil", RegexOptions.IgnoreCase)]
    private static partial Regex HeaterName();
}
