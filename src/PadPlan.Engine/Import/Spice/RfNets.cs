using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>
/// The nets of a SPICE deck that carry radio frequency, and why: named on a "*padplan rf" line; driven by a source at
/// 1 MHz or more; on a crystal; or shared by an inductor and a capacitor that resonate at 1 MHz or more.
/// </summary>
internal static class RfNets
{
    /// <summary>The lowest frequency PadPlan calls radio frequency: the bottom of the medium-wave broadcast band is 0.53 MHz, and HF work starts near 1.8 MHz (common practice, no source).</summary>
    public const double MinHz = 1e6;

    /// <summary>Resonant frequency of an inductance and a capacitance, f = 1/(2 pi sqrt(LC)) (Thomson's formula, as in Terman, "Radio Engineers' Handbook", resonant circuits).</summary>
    public static double Resonance(double henries, double farads) => 1 / (2 * Math.PI * Math.Sqrt(henries * farads));

    /// <summary>The frequency a source's transient function repeats at (Hz): SIN and SFFM their (carrier) frequency, AM its carrier, PULSE one over its period; null when it says none.</summary>
    public static double? Frequency(SpiceSource source) => source.Function switch
    {
        SourceFunction.Sin or SourceFunction.Sffm when source.Args.Count > 2 && source.Args[2] > 0 => source.Args[2],
        SourceFunction.Am when source.Args.Count > 3 && source.Args[3] > 0 => source.Args[3],
        SourceFunction.Pulse when source.Args.Count > 6 && source.Args[6] > 0 => 1 / source.Args[6],
        _ => null,
    };

    /// <summary>Each RF net (never ground) with the first reason found for it, in the order found.</summary>
    public static List<(string Net, string Why)> Find(IReadOnlyList<NetlistPart> parts, IEnumerable<(string Net, string Why)> marked,
        IEnumerable<(string Name, SpiceSource Spec, string Plus, string Minus)> sources)
    {
        var found = new List<(string Net, string Why)>();
        void Add(string net, string why)
        {
            if (!NetNames.IsGround(net) && net != NetNames.Ground && !found.Any(f => string.Equals(f.Net, net, StringComparison.OrdinalIgnoreCase))) found.Add((net, why));
        }
        foreach (var (net, why) in marked) Add(net, why);
        foreach (var (name, spec, plus, minus) in sources)
            if (Frequency(spec) is { } hz && hz >= MinHz)
                foreach (var net in new[] { plus, minus }) Add(net, $"source {NetlistText.Echo(name)} at {Mhz(hz)}");
        foreach (var p in parts.Where(p => p.Kind == PartKind.Crystal || (p.Kind == PartKind.Subcircuit && p.Model is not null && DefaultFootprints.Crystal(p.Model))))
            foreach (var pin in p.Pins) Add(pin.Net, $"crystal {NetlistText.Echo(p.Ref)}");
        var inductors = parts.Where(p => p.Kind == PartKind.Inductor && p.Number is { Number: > 0 }).ToList();
        var capacitors = parts.Where(p => p.Kind == PartKind.Capacitor && p.Number is { Number: > 0 }).ToList();
        foreach (var l in inductors)
            foreach (var c in capacitors)
                foreach (var net in l.Pins.Select(x => x.Net).Intersect(c.Pins.Select(x => x.Net), StringComparer.OrdinalIgnoreCase))
                {
                    var hz = Resonance(l.Number!.Value.Number, c.Number!.Value.Number);
                    if (hz >= MinHz) Add(net, $"{NetlistText.Echo(l.Ref)} and {NetlistText.Echo(c.Ref)} resonate at {Mhz(hz)}");
                }
        return found;
    }

    private static string Mhz(double hz) => FormattableString.Invariant($"{hz / 1e6:0.###} MHz");
}
