using PadPlan.Model;

namespace PadPlan.Materials;

/// <summary>
/// Finds, from the netlist, the net pairs that read low on a continuity tester through parts: inductor and
/// transformer windings, ferrite beads and fuses (about 0 Ω), resistor networks whose resistance between two nets is
/// below the threshold, and diode or transistor junctions (one direction). Resistances between nets are the exact
/// effective resistances of the resistor network (nodal analysis: pseudo-inverse of the conductance matrix),
/// so parallel and series resistors are counted as a meter sees them. Ground nets are one node: the plane.
/// </summary>
public sealed class DcPaths
{
    /// <summary>Below this a continuity beeper is taken to sound. Many beepers sound below roughly 30-50 Ω; meters differ. Common practice, no source.</summary>
    public const double DefaultThreshold = 50;

    /// <summary>The name used for all ground nets together.</summary>
    public const string Plane = "plane";

    private readonly Dictionary<(string, string), DcPath> _pairs = new();

    private DcPaths(double threshold) => Threshold = threshold;

    public double Threshold { get; }

    /// <summary>Every pair that does not read open, in a stable order.</summary>
    public IReadOnlyList<DcPath> Paths => _pairs.Values.OrderBy(p => p.NetA == Plane ? 0 : 1).ThenBy(p => p.NetA, StringComparer.Ordinal).ThenBy(p => p.NetB, StringComparer.Ordinal).ToList();

    /// <summary>What the tester shows between two nets (ground nets and "plane" mean the plane); Open when no part joins them.</summary>
    public DcPath Between(string netA, string netB)
    {
        var key = Key(netA, netB);
        return _pairs.TryGetValue(key, out var path) ? path : new DcPath(key.Item1, key.Item2, DcReading.Open, null, "", "");
    }

    public static DcPaths Find(Project project, double threshold = DefaultThreshold)
    {
        var result = new DcPaths(threshold);
        result.Analyse(project);
        return result;
    }

    private HashSet<string> _ground = [];

    private string Node(string net) => _ground.Contains(net) ? Plane : net;

    // Plane first, then by name, so each pair has one key.
    private (string, string) Key(string a, string b)
    {
        var (x, y) = (Node(a), Node(b));
        if (y == Plane || (x != Plane && string.CompareOrdinal(x, y) > 0)) (x, y) = (y, x);
        return (x, y);
    }

    private void Analyse(Project project)
    {
        _ground = project.Nets.Where(n => n.Ground).Select(n => n.Name).ToHashSet(StringComparer.Ordinal);
        var nodes = project.Nets.Select(n => Node(n.Name)).Concat(project.Parts.SelectMany(p => p.Pins.Select(x => Node(x.Net)))).Distinct().Order(StringComparer.Ordinal).ToList();
        var index = nodes.Select((n, i) => (n, i)).ToDictionary(x => x.n, x => x.i, StringComparer.Ordinal);
        var edges = new List<(int A, int B, double Ohms, string Part)>();
        var junctions = new List<(string Anode, string Cathode, string Part, bool Known, JunctionKind Kind, string What)>();
        var maybes = new List<(string A, string B, string Part, string Note)>();
        var channels = new List<(string A, string B, string Part, string Note)>();

        foreach (var part in project.Parts.OrderBy(p => p.Ref, NaturalOrder.Comparer))
        {
            var kind = PartKinds.Of(part, project.FindFootprint(part.Footprint));
            var pins = part.Pins.Select(p => (Pin: p.Pin, Net: Node(p.Net))).ToList();
            switch (kind)
            {
                case PartKind.Inductor or PartKind.FerriteBead or PartKind.Fuse when pins.Count == 2:
                    edges.Add((index[pins[0].Net], index[pins[1].Net], 0, part.Ref));
                    break;
                case PartKind.Resistor when pins.Count == 2 && PartValue.Ohms(part, kind) is { } ohms:
                    edges.Add((index[pins[0].Net], index[pins[1].Net], ohms, part.Ref));
                    break;
                case PartKind.Transformer or PartKind.Inductor:
                    foreach (var (a, b) in PinPairs(pins))
                        maybes.Add((a.Net, b.Net, part.Ref, $"reads about 0 Ω if {a.Pin} and {b.Pin} are on the same winding; check the part's data"));
                    break;
                case PartKind.Trimmer when pins.Count >= 2:
                    foreach (var (a, b) in PinPairs(pins))
                        maybes.Add((a.Net, b.Net, part.Ref, "a potentiometer reads low at some settings"));
                    break;
                case PartKind.Diode or PartKind.Led when pins.Count == 2:
                    var anode = pins.FindIndex(p => p.Pin.Equals("A", StringComparison.OrdinalIgnoreCase) || p.Pin.Equals("anode", StringComparison.OrdinalIgnoreCase));
                    var diode = DiodeKind(part, kind);
                    var what = kind == PartKind.Led ? "LED" : $"{JunctionKinds.Name(diode)} diode";
                    junctions.Add(anode >= 0 ? (pins[anode].Net, pins[1 - anode].Net, part.Ref, true, diode, what) : (pins[0].Net, pins[1].Net, part.Ref, false, diode, what));
                    break;
                case PartKind.Bjt or PartKind.Jfet or PartKind.Mosfet:
                    junctions.AddRange(TransistorJunctions(part, kind, pins));
                    if (kind == PartKind.Jfet && Pin(pins, "D") is { Pin: not null } d && Pin(pins, "S") is { Pin: not null } src)
                        channels.Add((d.Net, src.Net, part.Ref, "a JFET's channel conducts with no bias: it reads as a resistor, tens to hundreds of ohms, both ways (it hides any junction in parallel); a low-resistance part may beep"));
                    break;
            }
        }

        var ohmsBetween = EffectiveResistance(nodes.Count, edges);
        for (var i = 0; i < nodes.Count; i++)
            for (var j = i + 1; j < nodes.Count; j++)
                if (ohmsBetween(i, j) is { } r && r < Threshold)
                    Set(nodes[i], nodes[j], DcReading.Low, r, Route(nodes, edges, i, j),
                        r < 1e-6 ? "about 0 Ω through windings, beads or fuses (their own few ohms at most)" : "through resistors");

        // A JFET channel (a resistor of unknown value) joins everything that reads low to either end; it comes before the
        // junctions, since a junction in parallel with it never shows its drop.
        foreach (var (a0, b0, part, note) in channels)
            foreach (var a in LowGroup(nodes, ohmsBetween, index[a0]))
                foreach (var b in LowGroup(nodes, ohmsBetween, index[b0]))
                    if (a != b && Between(nodes[a], nodes[b]).Reading == DcReading.Open) Set(nodes[a], nodes[b], DcReading.Maybe, null, part, note);

        // A junction between two nets also joins everything that reads low to either end, or that a JFET channel joins
        // to it (a channel of a few hundred ohms still lets a meter's diode test show the junction behind it).
        var channelEnds = channels.SelectMany(c => new[] { (index[c.A], index[c.B]), (index[c.B], index[c.A]) }).ToLookup(x => x.Item1, x => x.Item2);
        IEnumerable<int> Reached(int start)
        {
            var seen = new HashSet<int> { start };
            var queue = new Queue<int>([start]);
            while (queue.Count > 0)
            {
                var n = queue.Dequeue();
                foreach (var m in LowGroup(nodes, ohmsBetween, n).Concat(channelEnds[n]))
                    if (seen.Add(m)) queue.Enqueue(m);
            }
            return seen.Order();
        }
        foreach (var (anode, cathode, part, known, junction, what) in junctions)
            foreach (var a in Reached(index[anode]))
                foreach (var c in Reached(index[cathode]))
                {
                    if (a == c || Between(nodes[a], nodes[c]).Reading == DcReading.Low) continue;
                    var (low, high) = JunctionKinds.Range(junction);
                    var range = string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{low:0.0#}-{high:0.0#} V");
                    var note = known
                        ? $"{what}: diode mode reads {range} with + (red) on the {nodes[a]} side, open the other way; a beeper may sound one way only"
                        : $"{what}: diode mode reads {range} one way round and open the other";
                    Set(nodes[a], nodes[c], DcReading.OneWay, null, part, note, known ? new DcJunction(nodes[a], nodes[c], junction) : null);
                }
        foreach (var (a, b, part, note) in maybes)
            if (a != b && Between(a, b).Reading == DcReading.Open) Set(a, b, DcReading.Maybe, null, part, note);
    }

    private void Set(string a, string b, DcReading reading, double? ohms, string through, string note, DcJunction? junction = null)
    {
        var key = Key(a, b);
        if (_pairs.TryGetValue(key, out var old) && old.Reading != DcReading.Open)
        {
            // Several junctions or windings between one pair: list them all on one line. Two junctions the opposite way
            // round (a clamp diode across a gate junction) read as a diode both ways.
            if (old.Reading == reading && !old.Through.Split(", ").Contains(through))
            {
                var both = old.Junction is { } j && junction is { } k && j.Anode == k.Cathode && !j.BothWays;
                _pairs[key] = old with
                {
                    Through = old.Through + ", " + through,
                    Junction = both ? old.Junction! with { BothWays = true } : old.Junction,
                    Note = both ? $"junctions both ways round ({old.Through}, {through}): diode mode reads about {Range(old.Junction!)} either way" : old.Note,
                };
            }
            return;
        }
        _pairs[key] = new DcPath(key.Item1, key.Item2, reading, ohms, through, note, junction);
    }

    private static IEnumerable<((string Pin, string Net) A, (string Pin, string Net) B)> PinPairs(List<(string Pin, string Net)> pins)
    {
        for (var i = 0; i < pins.Count; i++)
            for (var j = i + 1; j < pins.Count; j++)
                yield return (pins[i], pins[j]);
    }

    private static string Range(DcJunction j) => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{j.Range.Low:0.0#}-{j.Range.High:0.0#} V");

    private static (string Pin, string Net) Pin(List<(string Pin, string Net)> pins, string name) =>
        pins.FirstOrDefault(p => p.Pin.Equals(name, StringComparison.OrdinalIgnoreCase));

    private static JunctionKind DiodeKind(Part part, PartKind kind)
    {
        bool Says(string w) => part.Value.Contains(w, StringComparison.OrdinalIgnoreCase);
        if (kind == PartKind.Led) return Says("blue") || Says("white") || Says("UV") ? JunctionKind.BlueLed : JunctionKind.RedLed;
        if (Says("schottky") || Says("BAT") || Says("1N58")) return JunctionKind.Schottky;
        if (Says("germanium") || Says("OA9") || Says("1N34")) return JunctionKind.Germanium;
        return JunctionKind.Silicon;
    }

    // The junctions a meter finds in a transistor: a BJT reads as two diodes from the base (B-E, B-C; NPN with the base
    // as anode, PNP as cathode); a JFET's gate as a diode to both source and drain (N-channel: gate as anode); a
    // MOSFET's gate is insulated and its body diode runs source to drain (N-channel: source as anode). Common practice, no source.
    private static IEnumerable<(string Anode, string Cathode, string Part, bool Known, JunctionKind Kind, string What)> TransistorJunctions(Part part, PartKind kind, List<(string Pin, string Net)> pins)
    {
        bool Says(string w) => part.Value.Contains(w, StringComparison.OrdinalIgnoreCase);
        var material = Says("germanium") || Says("AC12") || Says("OC7") ? JunctionKind.Germanium : JunctionKind.Silicon;
        if (kind == PartKind.Bjt)
        {
            var b = Pin(pins, "B");
            if (b.Pin is null) yield break;
            var pnp = Says("PNP");
            var known = pnp || Says("NPN");
            foreach (var other in pins.Where(p => p.Pin.Equals("E", StringComparison.OrdinalIgnoreCase) || p.Pin.Equals("C", StringComparison.OrdinalIgnoreCase)))
            {
                var what = $"{part.Ref} base-{(other.Pin.Equals("E", StringComparison.OrdinalIgnoreCase) ? "emitter" : "collector")} junction";
                yield return pnp ? (other.Net, b.Net, part.Ref, known, material, what) : (b.Net, other.Net, part.Ref, known, material, what);
            }
            yield break;
        }
        var pChannel = Says("P-") || Says("PJF") || Says("PMOS") || Says("P channel") || Says("P-channel");
        if (kind == PartKind.Jfet)
        {
            var g = Pin(pins, "G");
            if (g.Pin is null) yield break;
            foreach (var other in pins.Where(p => p.Pin.Equals("S", StringComparison.OrdinalIgnoreCase) || p.Pin.Equals("D", StringComparison.OrdinalIgnoreCase)))
            {
                var what = $"{part.Ref} gate-{(other.Pin.Equals("S", StringComparison.OrdinalIgnoreCase) ? "source" : "drain")} junction";
                yield return pChannel ? (other.Net, g.Net, part.Ref, true, JunctionKind.Silicon, what) : (g.Net, other.Net, part.Ref, true, JunctionKind.Silicon, what);
            }
            yield break;
        }
        var s = Pin(pins, "S");
        var d = Pin(pins, "D");
        if (s.Pin is null || d.Pin is null) yield break;
        yield return pChannel ? (d.Net, s.Net, part.Ref, true, JunctionKind.Silicon, $"{part.Ref} body diode") : (s.Net, d.Net, part.Ref, true, JunctionKind.Silicon, $"{part.Ref} body diode");
    }

    private IEnumerable<int> LowGroup(List<string> nodes, Func<int, int, double?> ohms, int node) =>
        Enumerable.Range(0, nodes.Count).Where(k => k == node || ohms(node, k) is { } r && r < Threshold);

    /// <summary>
    /// Effective resistance between any two nodes of a resistor network: zero-ohm parts first merge their nodes, then
    /// for each connected part of the network R(i, j) = M(i,i) + M(j,j) - 2 M(i,j), M the inverse of the conductance
    /// matrix with one node of that part held at 0 V. Null when no resistive path joins the two.
    /// </summary>
    public static Func<int, int, double?> EffectiveResistance(int count, IReadOnlyList<(int A, int B, double Ohms, string Part)> edges)
    {
        var parent = Enumerable.Range(0, count).ToArray();
        int Find(int x) => parent[x] == x ? x : parent[x] = Find(parent[x]);
        foreach (var e in edges.Where(e => e.Ohms <= 0)) parent[Find(e.A)] = Find(e.B);
        var component = Enumerable.Range(0, count).ToArray();
        int Comp(int x) => component[x] == x ? x : component[x] = Comp(component[x]);
        foreach (var e in edges) component[Comp(Find(e.A))] = Comp(Find(e.B));

        var groups = Enumerable.Range(0, count).Select(Find).Distinct().ToList();
        var potential = new Dictionary<(int, int), double>();
        foreach (var members in groups.GroupBy(g => Comp(g)).Select(g => g.ToList()).Where(g => g.Count > 1))
        {
            var at = members.Select((g, i) => (g, i)).ToDictionary(x => x.g, x => x.i);
            var n = members.Count - 1; // member 0 is held at 0 V
            var g = new double[n, n];
            foreach (var e in edges.Where(e => e.Ohms > 0 && at.ContainsKey(Find(e.A))))
            {
                int a = at[Find(e.A)] - 1, b = at[Find(e.B)] - 1;
                if (a == b) continue;
                var y = 1 / e.Ohms;
                if (a >= 0) g[a, a] += y;
                if (b >= 0) g[b, b] += y;
                if (a >= 0 && b >= 0) { g[a, b] -= y; g[b, a] -= y; }
            }
            var m = Invert(g);
            for (var i = 0; i < members.Count; i++)
                for (var j = 0; j < members.Count; j++)
                    potential[(members[i], members[j])] = i == 0 || j == 0 ? 0 : m[i - 1, j - 1];
        }
        return (i, j) =>
        {
            int a = Find(i), b = Find(j);
            if (a == b) return 0;
            if (Comp(a) != Comp(b)) return null;
            return potential[(a, a)] + potential[(b, b)] - 2 * potential[(a, b)];
        };
    }

    // Gauss-Jordan with partial pivoting; the reduced conductance matrix of a connected network is positive definite.
    private static double[,] Invert(double[,] a)
    {
        var n = a.GetLength(0);
        var m = new double[n, 2 * n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++) m[i, j] = a[i, j];
            m[i, n + i] = 1;
        }
        for (var c = 0; c < n; c++)
        {
            var pivot = c;
            for (var r = c + 1; r < n; r++) if (Math.Abs(m[r, c]) > Math.Abs(m[pivot, c])) pivot = r;
            for (var k = 0; k < 2 * n; k++) (m[c, k], m[pivot, k]) = (m[pivot, k], m[c, k]);
            var p = m[c, c];
            for (var k = 0; k < 2 * n; k++) m[c, k] /= p;
            for (var r = 0; r < n; r++)
            {
                if (r == c || m[r, c] == 0) continue;
                var f = m[r, c];
                for (var k = 0; k < 2 * n; k++) m[r, k] -= f * m[c, k];
            }
        }
        var inv = new double[n, n];
        for (var i = 0; i < n; i++)
            for (var j = 0; j < n; j++) inv[i, j] = m[i, n + j];
        return inv;
    }

    // The parts along the lowest-resistance route between two nodes (Dijkstra), to tell the builder where the path runs.
    private static string Route(List<string> nodes, List<(int A, int B, double Ohms, string Part)> edges, int from, int to)
    {
        var dist = Enumerable.Repeat(double.PositiveInfinity, nodes.Count).ToArray();
        var via = new (int Prev, string Part)[nodes.Count];
        var done = new bool[nodes.Count];
        dist[from] = 0;
        while (true)
        {
            var u = -1;
            for (var k = 0; k < nodes.Count; k++) if (!done[k] && !double.IsInfinity(dist[k]) && (u < 0 || dist[k] < dist[u])) u = k;
            if (u < 0 || u == to) break;
            done[u] = true;
            foreach (var e in edges)
            {
                var v = e.A == u ? e.B : e.B == u ? e.A : -1;
                if (v < 0 || dist[u] + e.Ohms >= dist[v]) continue;
                dist[v] = dist[u] + e.Ohms;
                via[v] = (u, e.Part);
            }
        }
        var parts = new List<string>();
        for (var k = to; k != from && via[k].Part is not null; k = via[k].Prev) parts.Add(via[k].Part);
        parts.Reverse();
        return string.Join(", ", parts);
    }
}
