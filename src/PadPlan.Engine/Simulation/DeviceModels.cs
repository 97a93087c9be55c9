using System.Globalization;
using System.Text.RegularExpressions;
using PadPlan.Model;

namespace PadPlan.Simulation;

/// <summary>
/// Generic device models for parts that come with no SPICE line (a PadPlan text netlist names a part "NPN small-signal"
/// or "8.2 V zener", not a model). The parameters are round textbook values recalled from memory, not a maker's data:
/// they give voltages to about a tenth of a volt in a biased stage, which is what a builder checks at the bench.
/// </summary>
public static partial class DeviceModels
{
    /// <summary>A model line for a kind of part, its name, and what it stands for (printed in the deck).</summary>
    public sealed record Model(string Name, string Line, string Note);

    public static readonly Model Silicon = new("pp_si", ".model pp_si D(IS=2.5n N=1.75 RS=0.6)", "small-signal silicon diode (from memory)");
    public static readonly Model Germanium = new("pp_ge", ".model pp_ge D(IS=2u N=1.3 RS=5)", "germanium point-contact diode (from memory)");
    public static readonly Model Schottky = new("pp_sch", ".model pp_sch D(IS=10n N=1.05 RS=1)", "small Schottky diode (from memory)");
    public static readonly Model Led = new("pp_led", ".model pp_led D(IS=1e-18 N=1.9 RS=3)", "red LED, about 1.8 V at 10 mA (from memory)");
    public static readonly Model Npn = new("pp_npn", ".model pp_npn NPN(IS=1e-14 BF=200 BR=3 VAF=100)", "small-signal NPN, hFE 200 (from memory)");
    public static readonly Model Pnp = new("pp_pnp", ".model pp_pnp PNP(IS=1e-14 BF=200 BR=3 VAF=100)", "small-signal PNP, hFE 200 (from memory)");
    public static readonly Model NJfet = new("pp_njf", ".model pp_njf NJF(VTO=-2 BETA=1.5m LAMBDA=10m)", "N-channel JFET, Vp -2 V, IDSS 6 mA (from memory)");
    public static readonly Model PJfet = new("pp_pjf", ".model pp_pjf PJF(VTO=2 BETA=1.5m LAMBDA=10m)", "P-channel JFET, Vp 2 V (from memory)");
    public static readonly Model NMos = new("pp_nmos", ".model pp_nmos NMOS(LEVEL=1 VTO=2 KP=0.2)", "N-channel enhancement MOSFET, threshold 2 V (from memory)");
    public static readonly Model PMos = new("pp_pmos", ".model pp_pmos PMOS(LEVEL=1 VTO=-2 KP=0.2)", "P-channel enhancement MOSFET, threshold -2 V (from memory)");

    /// <summary>A zener diode of the given breakdown voltage: silicon forward, breaking down at BV with 1 mA.</summary>
    public static Model Zener(double volts)
    {
        var v = volts.ToString("0.###", CultureInfo.InvariantCulture);
        var name = "pp_z" + v.Replace('.', 'v');
        return new(name, $".model {name} D(IS=2.5n N=1.75 RS=0.6 BV={v} IBV=1m)", $"{v} V zener (breakdown at 1 mA)");
    }

    /// <summary>The model a diode-like part gets from its kind and value words; null when the part is not one.</summary>
    public static Model? ForDiode(Part part, PartKind kind)
    {
        if (kind == PartKind.Led) return Led;
        if (kind != PartKind.Diode) return null;
        var value = part.Value;
        if (Says(value, "zener") || part.Ref.StartsWith("ZD", StringComparison.OrdinalIgnoreCase))
            return ZenerVolts(value) is { } bv ? Zener(bv) : null;
        if (Says(value, "LED")) return Led;
        if (Says(value, "schottky") || Says(value, "BAT") || Says(value, "1N58")) return Schottky;
        if (Says(value, "germanium") || Says(value, "Ge ") || Says(value, "OA9") || Says(value, "1N34")) return Germanium;
        return Silicon;
    }

    public static Model ForTransistor(Part part, PartKind kind) => kind switch
    {
        PartKind.Jfet => P(part) ? PJfet : NJfet,
        PartKind.Mosfet => P(part) ? PMos : NMos,
        _ => Says(part.Value, "PNP") ? Pnp : Npn,
    };

    /// <summary>The breakdown voltage a zener's value names ("8.2 V zener", "5V6", "BZX79-C6V2"), or null.</summary>
    public static double? ZenerVolts(string value)
    {
        var m = Volts().Match(value);
        if (!m.Success) return null;
        var text = m.Groups[2].Success && m.Groups[2].Value.Length > 0 ? $"{m.Groups[1].Value}.{m.Groups[2].Value}" : m.Groups[1].Value.Replace(',', '.');
        return double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var v) && v is > 0 and < 1000 ? v : null;
    }

    // P-channel: the value says P-channel, PJF, P-JFET, PMOS or "P-ch".
    private static bool P(Part part) => Says(part.Value, "P-") || Says(part.Value, "PJF") || Says(part.Value, "PMOS") || Says(part.Value, "P channel") || Says(part.Value, "P-channel");

    private static bool Says(string text, string word) => text.Contains(word, StringComparison.OrdinalIgnoreCase);

    [GeneratedRegex(@"(\d+(?:[.,]\d+)?)\s*[vV](\d*)")]
    private static partial Regex Volts();
}
