using System.Globalization;
using System.Text.RegularExpressions;
using PadPlan.IO;
using PadPlan.Model;
using PadPlan.Model.Values;

namespace PadPlan.Import;

/// <summary>Reads a SPICE netlist: the elements that are parts, the sources that become wire landings, and the facts about nets that sources give.</summary>
public static partial class SpiceReader
{
    public static readonly string[] Extensions = [".cir", ".sp", ".net", ".spice", ".ckt"];

    private const string Separators = ",()";

    public static Netlist Read(string[] physical, string file)
    {
        var (title, lines) = SpiceLines.Join(physical, file);
        var notes = new List<ImportNote>();
        if (ElementLike().IsMatch(title))
            notes.Add(new ImportNote(file, 1, $"the first line \"{title}\" is read as the title, as SPICE does; if it is a part, put a title line above it."));
        var scan = Scan(lines, file, notes);
        var state = new State(file, scan, notes);
        foreach (var line in scan.TopLevel) state.Element(line);
        return state.Finish(title, OpenEndDirective.Find(physical, file).Select(d => d.Node));
    }

    /// <summary>The first pass: subcircuit pin names, model names and the top-level element lines.</summary>
    private sealed record ScanResult(Dictionary<string, (List<string> Pins, int Line)> Subckts, Dictionary<string, string> Models, List<SpiceLine> TopLevel);

    private static ScanResult Scan(List<SpiceLine> lines, string file, List<ImportNote> notes)
    {
        var subckts = new Dictionary<string, (List<string>, int)>(StringComparer.OrdinalIgnoreCase);
        var models = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        var top = new List<SpiceLine>();
        var depth = 0;
        var inControl = false;
        foreach (var line in lines)
        {
            var words = Words(line.Text, file, line.Line);
            if (words.Count == 0) continue; // only separators, e.g. a lone ")"
            var head = words[0].ToLowerInvariant();
            if (inControl) { if (head == ".endc") inControl = false; continue; }
            if (head == ".control") { inControl = true; continue; }
            if (head == ".end") break;
            if (head == ".subckt")
            {
                if (words.Count < 2) throw new InputException(file, ".subckt needs a name and its pins.", line.Line);
                if (depth == 0)
                    subckts[words[1]] = (words.Skip(2).TakeWhile(w => !w.Contains('=') && !w.Equals("params:", StringComparison.OrdinalIgnoreCase)).ToList(), line.Line);
                depth++;
                continue;
            }
            if (head == ".ends") { depth = Math.Max(0, depth - 1); continue; }
            if (head == ".model" && words.Count >= 2) models[words[1]] = words.Count >= 3 ? words[2].ToLowerInvariant() : "";
            if (depth > 0) continue;
            if (head is ".include" or ".inc" or ".lib")
                notes.Add(new ImportNote(file, line.Line, $"{words[0]} {string.Join(" ", words.Skip(1))}: not followed. Parts and subcircuits in that file are not imported; models named from it still work."));
            else if (head.StartsWith('.')) continue; // .model, .param, analyses, .options, .print...: nothing for the board
            else top.Add(line);
        }
        return new ScanResult(subckts, models, top);
    }

    private static List<string> Words(string text, string file, int line)
    {
        var tokens = LineTokenizer.Split(EqualsSpaces().Replace(text, "="), Separators, out var open);
        if (open is not null) throw new InputException(file, open, line);
        return tokens.Select(t => t.Text).ToList();
    }

    private sealed class State(string file, ScanResult scan, List<ImportNote> notes)
    {
        private readonly List<NetlistPart> _parts = [];
        private readonly List<(string Ref, SpiceSource Source, string Plus, string Minus, bool Current, int Line)> _sources = [];
        private readonly List<WindingCoupling> _couplings = [];
        private readonly Dictionary<string, NetFacts> _facts = new(StringComparer.Ordinal);
        private readonly SpiceNodes _nodes = new();

        public void Element(SpiceLine line)
        {
            var words = Words(line.Text, file, line.Line);
            var name = words[0];
            var args = words.Skip(1).Where(w => !w.Contains('=')).ToList();
            var parameters = words.Skip(1).Where(w => w.Contains('=')).ToList();
            InputException Bad(string message) => new(file, $"{name}: {message}", line.Line);
            var letter = char.ToUpperInvariant(name[0]);
            switch (letter)
            {
                case 'R': TwoTerminal(PartKind.Resistor, name, args, parameters, line.Line, Bad); break;
                case 'C': TwoTerminal(PartKind.Capacitor, name, args, parameters, line.Line, Bad); break;
                case 'L': TwoTerminal(PartKind.Inductor, name, args, parameters, line.Line, Bad); break;
                case 'D': Semiconductor(PartKind.Diode, name, args, ["A", "K"], "anode, cathode", line.Line, Bad); break;
                case 'Q': Transistor(name, args, line.Line, Bad); break;
                case 'J': Semiconductor(PartKind.Jfet, name, args, ["D", "G", "S"], "drain, gate, source", line.Line, Bad); break;
                case 'M': Semiconductor(PartKind.Mosfet, name, args, ["D", "G", "S", "B"], "drain, gate, source, bulk", line.Line, Bad); break;
                case 'X': Subcircuit(name, words.Skip(1).ToList(), line.Line, Bad); break;
                case 'K': Coupling(name, args, line.Line, Bad); break;
                case 'V' or 'I': Source(name, words.Skip(1).ToList(), letter == 'I', line.Line, Bad); break;
                case 'E' or 'F' or 'G' or 'H' or 'B':
                    throw Bad("a controlled or behavioural source is a simulation model, not a part you can solder. Replace it with the real circuit (e.g. an op-amp subcircuit call, X...) before importing.");
                case 'T' or 'O' or 'U' or 'W' or 'S' or 'A' or 'N' or 'P' or 'Y' or 'Z':
                    throw Bad($"SPICE element '{letter}' (line, switch or code model) has no part PadPlan can place. Replace it with a subcircuit call (X...) and a parts-map entry.");
                default:
                    throw Bad($"unknown element letter '{name[0]}'. Element lines start with R, C, L, D, Q, J, M, X, K, V or I; comments start with * or ;.");
            }
        }

        private string Net(string node) => _nodes.Name(node);

        private void TwoTerminal(PartKind kind, string name, List<string> args, List<string> parameters, int line, Func<string, InputException> bad)
        {
            var what = kind.ToString().ToLowerInvariant();
            if (args.Count < 2) throw bad($"missing nodes: a {what} line is {name} NODE1 NODE2 VALUE.");
            var valueText = args.Count >= 3 ? args[2] : parameters.Select(p => p.Split('=')).FirstOrDefault(p => p[0].ToLowerInvariant() is "r" or "c" or "l" or "resistance" or "capacitance" or "inductance")?[1];
            if (valueText is null) throw bad($"missing value: a {what} line is {name} NODE1 NODE2 VALUE.");
            ComponentValue? number = null;
            var display = valueText;
            if (valueText.Contains('{'))
                notes.Add(new ImportNote(file, line, $"{name}: value {valueText} is a parameter expression; PadPlan does not evaluate expressions, so the part keeps that text and a default footprint. Set the value in the netlist or pick the footprint in a parts map."));
            else if (PartValues.TryRead(kind, valueText, ValueSyntax.Spice, out var v, out display, out var error)) number = v;
            else throw bad($"bad value. {error}");
            Add(new NetlistPart(name, kind, display, number, null, null, null, ValueList.Of(new NetlistPin("1", Net(args[0])), new NetlistPin("2", Net(args[1]))), Positional: true, line));
        }

        private void Semiconductor(PartKind kind, string name, List<string> args, string[] pins, string order, int line, Func<string, InputException> bad)
        {
            if (args.Count < pins.Length + 1)
                throw bad($"missing nodes: expected {order} and a model name; found {args.Count} word{(args.Count == 1 ? "" : "s")}.");
            AddSemiconductor(kind, name, args.Take(pins.Length).ToList(), pins, args[pins.Length], line);
        }

        private void Transistor(string name, List<string> args, int line, Func<string, InputException> bad)
        {
            if (args.Count < 4) throw bad($"missing nodes: expected collector, base, emitter [substrate] and a model name; found {args.Count} word{(args.Count == 1 ? "" : "s")}.");
            // A fourth node is the substrate when the fourth word is not a known model and a fifth word is one (or is not a number, i.e. not an area factor).
            var substrate = args.Count >= 5 && !scan.Models.ContainsKey(args[3])
                && (scan.Models.ContainsKey(args[4]) || !ComponentValue.TryParse(args[4], ValueSyntax.Spice, out _, out _));
            var nodes = substrate ? 4 : 3;
            AddSemiconductor(PartKind.Bjt, name, args.Take(nodes).ToList(), ["C", "B", "E", "S"], args[nodes], line);
        }

        private void AddSemiconductor(PartKind kind, string name, List<string> nodes, string[] pinNames, string model, int line)
        {
            var pins = nodes.Select((n, i) => new NetlistPin(pinNames[i], Net(n))).ToList();
            // Discrete packages have no bulk or substrate lead: the bulk is tied to the source inside, the substrate is the case or nothing.
            var extra = kind switch { PartKind.Mosfet => "B", PartKind.Bjt => "S", _ => null };
            var extraPin = pins.FirstOrDefault(p => p.Name == extra);
            if (extraPin is not null)
            {
                pins.Remove(extraPin);
                var tiedTo = kind == PartKind.Mosfet ? pins.First(p => p.Name == "S").Net : NetNames.Ground;
                if (!string.Equals(extraPin.Net, tiedTo, StringComparison.OrdinalIgnoreCase))
                    notes.Add(new ImportNote(file, line, $"{name}: the {(kind == PartKind.Mosfet ? "bulk" : "substrate")} node {extraPin.Net} has no lead on a discrete part and is left out; it is not on {tiedTo} as usual, so check the circuit."));
            }
            var modelType = scan.Models.GetValueOrDefault(model, "");
            var isLed = kind == PartKind.Diode && (model.Contains("led", StringComparison.OrdinalIgnoreCase) || name.StartsWith("DLED", StringComparison.OrdinalIgnoreCase));
            Add(new NetlistPart(name, isLed ? PartKind.Led : kind, ModelText(model, modelType), null, model, null, null, pins.ToValueList(), Positional: false, line));
        }

        private static string ModelText(string model, string type) => type switch
        {
            "npn" or "pnp" => $"{model} ({type.ToUpperInvariant()})",
            "njf" or "pjf" => $"{model} ({(type == "njf" ? "N" : "P")}-JFET)",
            "nmos" or "pmos" => $"{model} ({(type == "nmos" ? "N" : "P")}-MOSFET)",
            _ => model,
        };

        private void Subcircuit(string name, List<string> words, int line, Func<string, InputException> bad)
        {
            var plain = words.TakeWhile(w => !w.Equals("params:", StringComparison.OrdinalIgnoreCase)).Where(w => !w.Contains('=')).ToList();
            if (plain.Count < 2) throw bad($"missing nodes: a subcircuit call is {name} NODE... SUBCIRCUIT-NAME.");
            var sub = plain[^1];
            var nodes = plain.Take(plain.Count - 1).ToList();
            List<string> pinNames;
            if (scan.Subckts.TryGetValue(sub, out var def))
            {
                if (def.Pins.Count != nodes.Count)
                    throw bad($"calls {sub} with {nodes.Count} nodes, but .subckt {sub} (line {def.Line}) has {def.Pins.Count} pins: {string.Join(" ", def.Pins)}.");
                pinNames = UniqueNames(def.Pins);
            }
            else pinNames = nodes.Select((_, i) => (i + 1).ToString(CultureInfo.InvariantCulture)).ToList();
            var pins = nodes.Select((n, i) => new NetlistPin(pinNames[i], Net(n))).ToValueList();
            Add(new NetlistPart(name, PartKind.Subcircuit, sub, null, sub, null, null, pins, Positional: true, line));
        }

        private static List<string> UniqueNames(List<string> names)
        {
            var seen = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
            return names.Select((n, i) => seen.Add(n) ? n : $"{n}#{i + 1}").ToList();
        }

        private void Coupling(string name, List<string> args, int line, Func<string, InputException> bad)
        {
            var inductors = args.TakeWhile(a => char.ToUpperInvariant(a[0]) == 'L').ToList();
            if (inductors.Count < 2 || args.Count != inductors.Count + 1)
                throw bad($"missing nodes: a coupling line is {name} L1 L2 COEFFICIENT (two or more inductor names, then k).");
            if (!ComponentValue.TryParse(args[^1], ValueSyntax.Spice, out var k, out _) || !(k.Number > 0) || k.Number > 1)
                throw bad($"bad value. The coupling coefficient \"{args[^1]}\" must be a number above 0 and at most 1.");
            _couplings.Add(new WindingCoupling(name, inductors.ToValueList(), k.Number, line));
        }

        private void Source(string name, List<string> words, bool current, int line, Func<string, InputException> bad)
        {
            if (words.Count < 2) throw bad("missing nodes: a source line is NAME PLUS-NODE MINUS-NODE [DC value] [AC ...] [SIN(...)].");
            var spec = SpiceSource.Parse(words.Skip(2).ToList());
            if (spec.Expression)
                notes.Add(new ImportNote(file, line, $"{name}: a parameter expression in braces is not evaluated; the source's voltage is left unknown."));
            if (!current && spec.IsWire)
            {
                // SPICE's 0 V ammeter: on the board it is a plain connection.
                _nodes.Join(Net(words[0]), Net(words[1]));
                notes.Add(new ImportNote(file, line, $"{name}: a 0 V source is a current probe in SPICE; its nodes {words[0]} and {words[1]} are joined as one net."));
                return;
            }
            _sources.Add((name, spec, Net(words[0]), Net(words[1]), current, line));
        }

        private void Add(NetlistPart part) => _parts.Add(part);

        public Netlist Finish(string title, IEnumerable<string> openEnded)
        {
            var parts = _parts.Select(p => p with { Pins = p.Pins.Select(x => x with { Net = _nodes.Resolve(x.Net) }).ToValueList() }).ToList();
            // "XU2A" names part U2A: drop the X that SPICE needs when a letter follows and no other part has that name.
            var names = new HashSet<string>(parts.Select(p => p.Ref), StringComparer.OrdinalIgnoreCase);
            parts = parts.Select(p => p.Kind == PartKind.Subcircuit && p.Ref.Length > 2 && char.IsLetter(p.Ref[1]) && !names.Contains(p.Ref[1..]) ? p with { Ref = p.Ref[1..] } : p).ToList();
            var used = new HashSet<string>(parts.Select(p => p.Ref), StringComparer.OrdinalIgnoreCase);
            var next = 1;
            foreach (var (reference, spec, plusNode, minusNode, current, line) in _sources)
            {
                var (plus, minus) = (_nodes.Resolve(plusNode), _nodes.Resolve(minusNode));
                while (used.Contains($"W{next}")) next++;
                var landing = $"W{next}";
                used.Add(landing);
                var heater = new[] { reference, plus, minus }.Any(s => HeaterName().IsMatch(s));
                // A current source of 0 A drives nothing: SPICE users put one on a node only to mark a port (an output).
                var port = current && !spec.IsSignal && spec.Dc is null or 0;
                var role = heater ? "heater" : port ? "output" : current ? "current source" : spec.IsSignal ? "input" : "supply";
                var unit = current ? "A" : "V";
                var size = port ? ""
                    : spec.IsSignal
                    ? spec.Largest is { } peak ? $", {new ComponentValue(peak, unit).ToDisplay()} peak" : ""
                    : spec.Dc is { } dcValue ? $", {new ComponentValue(dcValue, unit).ToDisplay()} DC" : "";
                parts.Add(new NetlistPart(landing, PartKind.Landing, $"{role} wires ({reference}{size})", null, null, null, null,
                    ValueList.Of(new NetlistPin("1", plus), new NetlistPin("2", minus)), Positional: true, line));
                var hot = minus == NetNames.Ground ? plus : plus == NetNames.Ground ? minus : plus;
                if (plus != NetNames.Ground && minus != NetNames.Ground)
                    notes.Add(new ImportNote(file, line, $"{reference}: neither node is ground, so its voltage is not given to a net."));
                else if (current) { if (spec.Largest is { } amps) Fact(new NetFacts(hot, Current: amps)); }
                else if (spec.IsSignal) Fact(new NetFacts(hot, Voltage: spec.Largest, Role: heater ? null : SignalRole.Input));
                else if (spec.Dc is { } dc) Fact(new NetFacts(hot, Voltage: hot == plus ? dc : -dc, Supply: true));
            }
            foreach (var node in openEnded) Fact(new NetFacts(_nodes.Resolve(Net(node)), OpenEnded: true));
            return new Netlist(file, title, parts.ToValueList(), _facts.Values.ToValueList(), _couplings.ToValueList(), notes.ToValueList());
        }

        private void Fact(NetFacts facts) =>
            _facts[facts.Name] = _facts.TryGetValue(facts.Name, out var had) ? had.Merge(facts) : facts;
    }

    [GeneratedRegex(@"\s*=\s*")]
    private static partial Regex EqualsSpaces();

    [GeneratedRegex(@"^[RCLDQJMXKVI][A-Za-z_]*\d\w*\s+\S+\s+\S+", RegexOptions.IgnoreCase)]
    private static partial Regex ElementLike();

    [GeneratedRegex(@"heat|htr|fil", RegexOptions.IgnoreCase)]
    private static partial Regex HeaterName();
}
