using System.Globalization;
using System.Text.RegularExpressions;
using PadPlan.Model;
namespace PadPlan.Import;

/// <summary>The footprint a part gets when neither the netlist nor a parts map names one. The value bands are common practice, no source.</summary>
public static partial class DefaultFootprints
{
    /// <summary>The default footprint name, and whether it is only a guess the builder must confirm; null when no default fits.</summary>
    public static (string Name, bool Assumed)? For(NetlistPart part)
    {
        var value = part.Number?.Number;
        var model = part.Model ?? part.Value;
        return part.Kind switch
        {
            PartKind.Resistor => ("res-axial-250mw", false),
            PartKind.Capacitor => (Capacitor(value), value is null),
            PartKind.Inductor => (value is > 1e-3 ? "choke-radial" : "choke-axial", value is null),
            PartKind.Diode => Diode(model),
            PartKind.Led => ("led-5mm", false),
            PartKind.Bjt or PartKind.Jfet or PartKind.Mosfet => ("to92", false),
            PartKind.Crystal => ("hc49-u", false),
            PartKind.Trimmer => ("trimmer-pot", false),
            PartKind.TrimmerCap => ("trimmer-cap", false),
            PartKind.Transformer => part.Pins.Count is >= 2 and <= 6 ? ($"toroid-13mm-{part.Pins.Count}", true) : null,
            PartKind.Landing => part.Pins.Count <= 8 ? ($"landing-{part.Pins.Count}", false) : null,
            PartKind.Subcircuit when Crystal(model) && part.Pins.Count == 2 => ("hc49-u", false),
            // a two- or three-port part (a regulator, a reference, a sensor) on a generic single row, not a DIP
            PartKind.Subcircuit when part.Positional && part.Pins.Count is 2 or 3 => ($"sip-{part.Pins.Count}", true),
            PartKind.Subcircuit => GenericDip(PinsNeeded(part)) is { } dip ? (dip, true) : null,
            _ => null,
        };
    }

    /// <summary>Leads a part needs: its pin count, or its highest pin number when pins are named by lead number (own-format ICs).</summary>
    public static int PinsNeeded(NetlistPart part) =>
        part.Positional ? part.Pins.Count
        : Math.Max(part.Pins.Count, part.Pins.Select(p => int.TryParse(p.Name, NumberStyles.None, CultureInfo.InvariantCulture, out var n) ? n : 0).DefaultIfEmpty(0).Max());

    /// <summary>The smallest DIP in the library with at least this many pins, for an IC whose package is unknown.</summary>
    public static string? GenericDip(int pins) => pins <= 8 ? "dip-8" : pins <= 14 ? "dip-14" : pins <= 16 ? "dip-16" : null;

    // Ceramic discs up to 100 nF, film boxes up to 1 uF, electrolytics above, can size rising with capacitance (low-voltage cans).
    private static string Capacitor(double? farads) => farads switch
    {
        null => "cap-disc-5mm",
        <= 1e-9 * 1.0001 => "cap-disc-2.5mm",
        <= 100e-9 * 1.0001 => "cap-disc-5mm",
        <= 220e-9 * 1.0001 => "cap-film-5mm",
        <= 470e-9 * 1.0001 => "cap-film-7.5mm",
        < 1e-6 * 0.9999 => "cap-film-10mm",
        <= 4.7e-6 * 1.0001 => "cap-elec-5mm",
        <= 22e-6 * 1.0001 => "cap-elec-6.3mm",
        <= 100e-6 * 1.0001 => "cap-elec-8mm",
        <= 470e-6 * 1.0001 => "cap-elec-10mm",
        _ => "cap-elec-12.5mm",
    };

    /// <summary>
    /// A diode's package from its type number in the model name (D1N4001, 1n5819, BZX85C6V8): 1N4001-1N4007 and 1N5817-1N5819
    /// on DO-41 (1 A), 1N5400-1N5408 and 1N5820-1N5822 on DO-201AD (3 A), the 1 W zeners 1N4728-1N4764 and the BZX85 on DO-41,
    /// the small-signal 1N914, 1N916, 1N4148, 1N4150 and 1N4448, the 0.5 W zeners 1N5221-1N5281 and the BZX55 and BZX79 on
    /// DO-35 (the makers' data sheets, from memory). A name that says rectifier or power goes on DO-41; any other diode on the
    /// small-signal DO-35, marked as assumed, since a rectifier put there would be judged at a fifth of its current.
    /// </summary>
    private static (string Name, bool Assumed) Diode(string model)
    {
        const string Small = "diode-glass-do35", OneAmp = "diode-plastic-do41", ThreeAmp = "diode-plastic-do201";
        var name = model.ToUpperInvariant();
        if (Bzx().Match(name) is { Success: true } bzx)
            return (bzx.Groups[1].Value == "85" ? OneAmp : Small, false);
        if (Jedec().Match(name) is { Success: true } jedec)
        {
            var n = int.Parse(jedec.Groups[1].Value, CultureInfo.InvariantCulture);
            string? known = n switch
            {
                >= 4001 and <= 4007 or >= 5817 and <= 5819 or >= 4728 and <= 4764 => OneAmp,
                >= 5400 and <= 5408 or >= 5820 and <= 5822 => ThreeAmp,
                914 or 916 or 4148 or 4150 or 4448 or >= 5221 and <= 5281 => Small,
                _ => null,
            };
            if (known is not null) return (known, false);
        }
        return PowerDiode(model) ? (OneAmp, false) : (Small, true);
    }

    [GeneratedRegex(@"BZX(55|79|85)")]
    private static partial Regex Bzx();

    [GeneratedRegex(@"1N(\d{3,4})(?!\d)")]
    private static partial Regex Jedec();

    private static bool PowerDiode(string model) =>
        model.Contains("rect", StringComparison.OrdinalIgnoreCase) || model.Contains("power", StringComparison.OrdinalIgnoreCase) || model.Contains("pwr", StringComparison.OrdinalIgnoreCase);

    /// <summary>A model or subcircuit name that says crystal (xtal, crystal, quartz).</summary>
    public static bool Crystal(string model) =>
        model.Contains("xtal", StringComparison.OrdinalIgnoreCase) || model.Contains("crystal", StringComparison.OrdinalIgnoreCase) || model.Contains("quartz", StringComparison.OrdinalIgnoreCase);
}
