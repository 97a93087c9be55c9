using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>Gives nets with no stated voltage an estimated largest voltage: that of the stated nets they reach through resistors and inductors (a DC path, so the high-voltage rules see it). Ground stops the search.</summary>
public static class VoltageEstimator
{
    public static IReadOnlyDictionary<string, NetFacts> Estimate(IEnumerable<NetlistPart> parts, IReadOnlyDictionary<string, NetFacts> facts)
    {
        var links = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        foreach (var part in parts.Where(p => p.Kind is PartKind.Resistor or PartKind.Inductor or PartKind.Trimmer))
        {
            var nets = part.Pins.Select(p => p.Net).Distinct().ToList();
            foreach (var a in nets)
                foreach (var b in nets.Where(b => b != a))
                {
                    if (!links.TryGetValue(a, out var list)) links[a] = list = [];
                    list.Add(b);
                }
        }
        bool IsGround(string net) => facts.TryGetValue(net, out var f) && f.Ground == true || NetNames.IsGround(net);
        var estimate = new Dictionary<string, double>(StringComparer.Ordinal);
        var stated = facts.Values.Where(f => f.Voltage is not null && !f.VoltageEstimated && !IsGround(f.Name)).OrderBy(f => f.Name, StringComparer.Ordinal);
        foreach (var source in stated)
        {
            var volts = source.Voltage!.Value;
            var seen = new HashSet<string>(StringComparer.Ordinal) { source.Name };
            var queue = new Queue<string>([source.Name]);
            while (queue.Count > 0)
            {
                var net = queue.Dequeue();
                foreach (var next in links.GetValueOrDefault(net) ?? [])
                {
                    if (IsGround(next) || !seen.Add(next)) continue;
                    if (facts.TryGetValue(next, out var known) && known.Voltage is not null && !known.VoltageEstimated) continue;
                    if (!estimate.TryGetValue(next, out var had) || Math.Abs(volts) > Math.Abs(had)) estimate[next] = volts;
                    queue.Enqueue(next);
                }
            }
        }
        var result = new Dictionary<string, NetFacts>(facts, StringComparer.Ordinal);
        foreach (var (net, volts) in estimate)
        {
            var had = result.GetValueOrDefault(net) ?? new NetFacts(net);
            if (had.Voltage is null || Math.Abs(volts) > Math.Abs(had.Voltage.Value)) result[net] = had with { Voltage = volts, VoltageEstimated = true };
        }
        return result;
    }
}
