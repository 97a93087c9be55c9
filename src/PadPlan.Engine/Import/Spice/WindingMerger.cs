using System.Globalization;
using PadPlan.IO;
using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>Turns inductors coupled by K lines into one physical part, a toroid or transformer, with a lead for each winding end: winding n has leads 2n-1 (its first node) and 2n.</summary>
public static class WindingMerger
{
    /// <param name="mergedPins">Filled with (inductor, its pin) to (merged part, its pin), so elements can still find their leads.</param>
    public static List<NetlistPart> Merge(IReadOnlyList<NetlistPart> parts, IReadOnlyList<WindingCoupling> couplings, string file, Dictionary<(string Ref, string Pin), (string Ref, string Pin)>? mergedPins = null)
    {
        if (couplings.Count == 0) return [.. parts];
        var byRef = parts.ToDictionary(p => p.Ref, StringComparer.OrdinalIgnoreCase);
        var order = parts.Select((p, i) => (p.Ref, i)).ToDictionary(x => x.Ref, x => x.i, StringComparer.OrdinalIgnoreCase);
        // Windings on one core form a connected group of K lines: union-find over the K lines (the earliest line of a
        // group is its root), so thousands of chained K lines merge in near-linear time.
        var root = Enumerable.Range(0, couplings.Count).ToArray();
        int Find(int x)
        {
            while (root[x] != x) x = root[x] = root[root[x]];
            return x;
        }
        var firstLine = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        for (var n = 0; n < couplings.Count; n++)
        {
            var k = couplings[n];
            foreach (var l in k.Inductors)
            {
                if (!byRef.TryGetValue(l, out var part) || part.Kind != PartKind.Inductor)
                    throw new InputException(file, $"{k.Ref}: couples {l}, which is not an inductor in this netlist.", k.Line);
                if (!firstLine.TryAdd(l, n))
                {
                    var (a, b) = (Find(n), Find(firstLine[l]));
                    if (a != b) root[Math.Max(a, b)] = Math.Min(a, b);
                }
            }
        }
        var group = firstLine.ToDictionary(e => e.Key, e => Find(e.Value), StringComparer.OrdinalIgnoreCase);
        var groups = new SortedDictionary<int, (List<string> Windings, List<WindingCoupling> Lines)>();
        for (var n = 0; n < couplings.Count; n++)
        {
            var g = Find(n);
            if (!groups.TryGetValue(g, out var entry)) groups[g] = entry = ([], []);
            entry.Lines.Add(couplings[n]);
        }
        foreach (var (l, g) in group) groups[g].Windings.Add(l);

        var used = new HashSet<string>(parts.Select(p => p.Ref), StringComparer.OrdinalIgnoreCase);
        var merged = new Dictionary<int, NetlistPart>();
        var next = 1;
        foreach (var (index, (windings, lines)) in groups)
        {
            while (used.Contains($"T{next}")) next++;
            var reference = $"T{next}";
            used.Add(reference);
            var sorted = windings.OrderBy(l => order[l]).ToList();
            var pins = sorted.SelectMany((l, i) => new[]
            {
                new NetlistPin((2 * i + 1).ToString(CultureInfo.InvariantCulture), byRef[l].Pins[0].Net),
                new NetlistPin((2 * i + 2).ToString(CultureInfo.InvariantCulture), byRef[l].Pins[1].Net),
            }).ToValueList();
            for (var i = 0; i < sorted.Count; i++)
                for (var end = 0; end < 2; end++)
                    if (mergedPins is not null) mergedPins[(byRef[sorted[i]].Ref, byRef[sorted[i]].Pins[end].Name)] = (reference, (2 * i + end + 1).ToString(CultureInfo.InvariantCulture));
            var k = lines.Max(c => c.Coefficient);
            var value = "windings " + string.Join(", ", sorted.Select((l, i) => $"{2 * i + 1}-{2 * i + 2} {byRef[l].Ref} {byRef[l].Value}")) + $" (k {k.ToString("0.###", CultureInfo.InvariantCulture)})";
            merged[index] = new NetlistPart(reference, PartKind.Transformer, value, null, lines[0].Ref, null, null, pins, Positional: true, lines[0].Line);
        }
        // the new part takes the place of its first winding, so the part order still follows the netlist
        var result = new List<NetlistPart>();
        var placed = new HashSet<int>();
        foreach (var p in parts)
        {
            if (!group.TryGetValue(p.Ref, out var g)) { result.Add(p); continue; }
            if (placed.Add(g)) result.Add(merged[g]);
        }
        return result;
    }
}
