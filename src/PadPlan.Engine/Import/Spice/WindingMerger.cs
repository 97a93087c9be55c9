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
        var group = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        var groups = new List<(List<string> Windings, List<WindingCoupling> Lines)>();
        foreach (var k in couplings)
        {
            foreach (var l in k.Inductors)
                if (!byRef.TryGetValue(l, out var part) || part.Kind != PartKind.Inductor)
                    throw new InputException(file, $"{k.Ref}: couples {l}, which is not an inductor in this netlist.", k.Line);
            var existing = k.Inductors.Where(group.ContainsKey).Select(l => group[l]).Distinct().Order().ToList();
            var target = existing.Count > 0 ? existing[0] : groups.Count;
            if (existing.Count == 0) groups.Add(([], []));
            foreach (var other in existing.Skip(1))
            {
                // a later K line joined two cores' worth of windings: one core after all
                foreach (var l in groups[other].Windings) group[l] = target;
                groups[target].Windings.AddRange(groups[other].Windings);
                groups[target].Lines.AddRange(groups[other].Lines);
                groups[other] = ([], []);
            }
            foreach (var l in k.Inductors.Where(l => !group.ContainsKey(l)))
            {
                group[l] = target;
                groups[target].Windings.Add(l);
            }
            groups[target].Lines.Add(k);
        }

        var used = new HashSet<string>(parts.Select(p => p.Ref), StringComparer.OrdinalIgnoreCase);
        var merged = new Dictionary<int, NetlistPart>();
        var next = 1;
        foreach (var (windings, lines, index) in groups.Select((g, i) => (g.Windings, g.Lines, i)).Where(g => g.Windings.Count > 0))
        {
            while (used.Contains($"T{next}")) next++;
            var reference = $"T{next}";
            used.Add(reference);
            var sorted = windings.OrderBy(l => parts.ToList().FindIndex(p => string.Equals(p.Ref, l, StringComparison.OrdinalIgnoreCase))).ToList();
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
