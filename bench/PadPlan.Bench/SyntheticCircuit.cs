using PadPlan.Model;

namespace PadPlan.Bench;

/// <summary>Makes invented circuits with a realistic mix: two-lead parts, transistors, ICs and wire landings; nets of 2 to 6 leads drawn from nearby parts (circuits are local, like a signal chain); one ground net and one supply net.</summary>
internal static class SyntheticCircuit
{
    private static readonly int[] NetSizes = [2, 2, 2, 3, 3, 3, 4, 4, 5, 6];

    public static Project Make(int parts, int seed)
    {
        var rng = new Random(seed);
        var list = new List<(string Ref, Footprint Fp, string? Variant)>();
        for (var i = 1; i <= parts; i++)
        {
            var roll = rng.NextDouble();
            var landing = i == 1 || i == parts || roll > 0.97;
            list.Add(landing ? ($"J{i}", BenchFootprints.Landing, null)
                : roll < 0.38 ? ($"R{i}", BenchFootprints.Resistor, null)
                : roll < 0.58 ? ($"C{i}", BenchFootprints.DiscCap, null)
                : roll < 0.68 ? ($"C{i}", BenchFootprints.Electrolytic, null)
                : roll < 0.88 ? ($"Q{i}", BenchFootprints.To92, (string?)"EBC")
                : roll < 0.94 ? ($"U{i}", BenchFootprints.Dip8, null)
                : ($"U{i}", BenchFootprints.Dip14, null));
        }
        var pins = list.Select(p => new Dictionary<string, string>()).ToList();
        var slots = new List<(int Part, string Pin)>();
        for (var i = 0; i < list.Count; i++)
        {
            var fp = list[i].Fp;
            var names = fp.PinNames(list[i].Variant);
            for (var k = 0; k < names.Count; k++)
            {
                if (fp.Mount == MountStyle.Strip && k == names.Count / 2 - 1) { pins[i][names[k]] = "GND"; continue; }
                if (fp.Mount == MountStyle.Strip && k == names.Count - 1) { pins[i][names[k]] = "VCC"; continue; }
                if (fp.Mount == MountStyle.Strip && rng.Next(6) == 0) continue; // an unused IC pin
                if (fp.Mount != MountStyle.Landing && rng.Next(6) == 0) { pins[i][names[k]] = "GND"; continue; }
                slots.Add((i, names[k]));
            }
        }
        // Mix pins only within a short window so that nets join nearby parts.
        for (var start = 0; start < slots.Count; start += 8)
        {
            var end = Math.Min(slots.Count, start + 12);
            for (var k = end - 1; k > start; k--)
            {
                var j = start + rng.Next(k - start + 1);
                (slots[k], slots[j]) = (slots[j], slots[k]);
            }
        }
        var nets = new List<Net> { new("GND", Ground: true, Class: NetClass.Power), new("VCC", Class: NetClass.Power, Voltage: 12) };
        var at = 0;
        while (at < slots.Count)
        {
            var size = Math.Min(NetSizes[rng.Next(NetSizes.Length)], slots.Count - at);
            if (slots.Count - at - size == 1) size++;
            var name = $"N{nets.Count - 1}";
            var members = slots.Skip(at).Take(size).ToList();
            var isLanding = members.Any(m => list[m.Part].Fp.Mount == MountStyle.Landing);
            var role = isLanding && members.Any(m => m.Part == 0) ? SignalRole.Input : isLanding && members.Any(m => m.Part == list.Count - 1) ? SignalRole.Output : SignalRole.None;
            nets.Add(new Net(name, Class: rng.Next(20) == 0 ? NetClass.Rf : NetClass.General, Role: role));
            foreach (var (part, pin) in members) pins[part][pin] = name;
            at += size;
        }
        var partList = list.Select((p, i) => new Part(p.Ref, "", p.Fp.Name, pins[i].OrderBy(kv => kv.Key, StringComparer.Ordinal).Select(kv => new PinNet(kv.Key, kv.Value)).ToValueList(), p.Variant)).ToValueList();
        if (!partList.Any(p => p.Pins.Any(x => x.Net == "VCC"))) nets.RemoveAt(1);
        return new Project($"synthetic-{parts}", Board.Auto, Toolkit.Default, RuleSettings.Default, nets.ToValueList(), partList, BenchFootprints.All);
    }
}
